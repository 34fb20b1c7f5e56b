/** The outline: blocks, with a species' levels and every block's settings as children. */
import { type DocumentSymbol, SymbolKind } from 'vscode-languageserver-types';
import type { Analysis } from '../eval/analyze';
import type { BlockKind, BlockNode, LevelNode, SettingNode } from '../format/ast';

const KIND: Record<BlockKind, SymbolKind> = {
  species: SymbolKind.Namespace,
  field: SymbolKind.Constant,
  magnet: SymbolKind.Object,
  beam: SymbolKind.Struct,
  line: SymbolKind.Event,
  resonance: SymbolKind.Function,
  settings: SymbolKind.Module,
  data: SymbolKind.Array,
  fit: SymbolKind.Operator,
  coil: SymbolKind.Field,
  solenoid: SymbolKind.Field,
  wire: SymbolKind.Field,
  slab: SymbolKind.Field,
};

function settingSymbol(s: SettingNode): DocumentSymbol {
  return {
    name: s.key.text,
    kind: SymbolKind.Property,
    ...(s.valueText.text ? { detail: s.valueText.text } : {}),
    range: s.range,
    selectionRange: s.key.range,
  };
}

function levelSymbol(l: LevelNode): DocumentSymbol {
  return {
    name: l.name?.text || 'level',
    kind: SymbolKind.EnumMember,
    ...(l.designation ? { detail: l.designation.text } : {}),
    range: l.range,
    selectionRange: l.name?.range ?? l.keyword.range,
    children: l.settings.map(settingSymbol),
  };
}

function detailOf(b: BlockNode): string | undefined {
  if (b.kind === 'field') return b.headerSetting?.valueText.text || undefined;
  if (b.kind === 'line' && b.link) return `${b.link.from?.text ?? '?'} -> ${b.link.to?.text ?? '?'}`;
  return undefined;
}

export function documentSymbols(analysis: Analysis): DocumentSymbol[] {
  return analysis.doc.blocks.map((b) => {
    const detail = detailOf(b);
    const children = [...b.settings.map(settingSymbol), ...b.levels.map(levelSymbol)].sort(
      (x, y) => x.range.start.line - y.range.start.line || x.range.start.character - y.range.start.character,
    );
    return {
      name: b.name?.text || b.kind,
      kind: KIND[b.kind],
      ...(detail ? { detail } : {}),
      range: b.range,
      selectionRange: b.name?.range ?? b.keyword.range,
      children,
    };
  });
}
