/** A `use` statement: the file it names and the species (with their levels) it brings in. */
import type { UsedFileModel } from '../../model/types';
import { md, mdTitle } from '../shared/markdown';

export function useSection(u: UsedFileModel): string {
  const title = `${mdTitle(`use ${md(u.node.path?.text ?? '')}`)} — species (and their levels) from another setup file`;
  if (!u.loaded) return `${title}  \nnot read: see the problem on this line`;
  if (u.species.length === 0) return `${title}  \nit brings no species`;
  const lines = u.species.map((s) => {
    const from = s.origin && s.origin.path !== u.node.path?.text ? ` (declared in ${md(s.origin.path)})` : '';
    const levels = s.levels.length > 0 ? `: ${s.levels.map((l) => md(l.name)).join(', ')}` : '';
    return `species ${md(s.name)}${from}${levels}`;
  });
  return [title, ...lines].join('  \n');
}
