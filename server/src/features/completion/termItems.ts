/**
 * Term symbols a configuration allows (Pauli-allowed LS terms with every J), the Hund's-rules
 * ground level first; or, with no configuration written yet, the built-in levels of the species.
 */
import { type CompletionItem, CompletionItemKind, type Range } from 'vscode-languageserver-types';
import { halfText } from '../../eval/halves';
import { parseConfiguration } from '../../physics/configuration';
import { formatFraction, landeGJFraction } from '../../physics/gFactors';
import { hundGroundLevel } from '../../physics/hund';
import { termsOfConfiguration } from '../../physics/lsTerms';
import type { BuiltinSpecies } from '../../physics/species';
import { allowedJ, formatTermSymbol } from '../../physics/termSymbol';
import { item } from './items';

/** Most term items offered (a configuration with several open shells has hundreds). */
const MAX_TERMS = 120;

export function termItems(configurationText: string, replace: Range): CompletionItem[] {
  const { configuration } = parseConfiguration(configurationText);
  if (!configuration) return [];
  const parity = configuration.parity === 'odd' ? 'odd' : null;
  const hund = hundGroundLevel(configuration);
  const out: CompletionItem[] = [];
  for (const t of termsOfConfiguration(configuration)) {
    for (const twoJ of allowedJ(t.twoS, t.L)) {
      if (out.length >= MAX_TERMS) return out;
      const label = formatTermSymbol({ twoS: t.twoS, L: t.L, twoJ, parityMark: parity }, 'ascii').replace(/^(\d+[A-Z])o/, '$1°');
      const isGround = hund !== null && hund.twoS === t.twoS && hund.L === t.L && hund.twoJ === twoJ;
      const g = formatFraction(landeGJFraction(t.twoS, t.L, twoJ));
      out.push(
        item(label, CompletionItemKind.EnumMember, replace, {
          detail: `S = ${halfText(t.twoS)}, L = ${t.L}, J = ${halfText(twoJ)}, g_J = ${g} (g_s = 2)${isGround ? " — ground level by Hund's rules" : ''}${t.count > 1 ? ` — occurs ${t.count}×` : ''}`,
          order: isGround ? 0 : out.length + 1,
          ...(isGround ? { preselect: true } : {}),
        }),
      );
    }
  }
  return out;
}

export function builtinDesignationItems(species: BuiltinSpecies | undefined, replace: Range): CompletionItem[] {
  if (!species) return [];
  return species.levels.map((l, i) => item(l.designation, CompletionItemKind.EnumMember, replace, { detail: `built-in level '${l.key}' of ${species.id}`, order: i }));
}
