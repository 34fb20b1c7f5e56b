/** Reads the `settings` block (file-wide choices); later blocks override earlier ones. */
import type { BlockNode } from '../format/ast';
import type { ProblemList } from './problems';
import { readSettingWord } from './settingReaders';
import type { SettingsModel } from './types';

export const DEFAULT_SETTINGS: SettingsModel = { gS: 'exact', reducedMass: false };

export function applySettings(node: BlockNode, into: SettingsModel, problems: ProblemList): void {
  for (const s of node.settings) {
    switch (s.key.text) {
      case 'g_s': {
        const w = readSettingWord(s, ['exact', '2'] as const, problems);
        if (w) into.gS = w === '2' ? 2 : 'exact';
        break;
      }
      case 'reduced_mass': {
        const w = readSettingWord(s, ['on', 'off'] as const, problems);
        if (w) into.reducedMass = w === 'on';
        break;
      }
      default:
        break;
    }
  }
}
