/**
 * Built-in species after `species`: one item per species under its canonical name, with its
 * mass, nuclear spin and ground level as detail; the other spellings (`87Rb`, `rubidium-87`, …)
 * only help the editor's filter, so the list is not three names for every atom.
 */
import { type CompletionItem, CompletionItemKind, type Range } from 'vscode-languageserver-types';
import { halfText } from '../../eval/halves';
import { trimNumber } from '../../eval/quantityText';
import { BUILTIN_SPECIES, speciesSpellings, type BuiltinSpecies } from '../../physics/species';
import { item } from './items';

export function speciesDetail(s: BuiltinSpecies): string {
  const ground = s.levels.find((l) => l.key === 'ground') ?? s.levels[0];
  return `${trimNumber(s.massU.value, 8)} u · I = ${halfText(s.twoI.value)}${ground ? ` · ground ${ground.designation}` : ''}`;
}

export function builtinSpeciesItems(replace: Range): CompletionItem[] {
  return BUILTIN_SPECIES.map((s, i) => {
    const also = s.aliases.filter((a) => a !== s.id);
    return {
      ...item(s.id, CompletionItemKind.Module, replace, { detail: speciesDetail(s), order: i }),
      filterText: speciesSpellings(s).join(' '),
      ...(also.length > 0 ? { documentation: `Also written ${also.join(', ')}.` } : {}),
    };
  });
}
