/**
 * Working fields of equal value give the same components or transitions, so a hover shows one
 * table for them and names all the fields (two fields both at 500 G are one table, not two).
 */
export function sameFieldGroups<T extends { field_T: number; source: { kind: string; name: string } }>(atFields: readonly T[], size: (at: T) => number): T[][] {
  const groups: T[][] = [];
  for (const at of atFields) {
    if (size(at) === 0) continue;
    const g = groups.find((x) => x[0]!.field_T === at.field_T && size(x[0]!) === size(at));
    if (g) g.push(at);
    else groups.push([at]);
  }
  return groups;
}

/** "field f1 and field f2"; names are escaped by the caller's `md`. */
export function sourcesText<T extends { source: { kind: string; name: string } }>(group: readonly T[], md: (s: string) => string): string {
  return group.map((at) => `${md(at.source.kind)} ${md(at.source.name)}`).join(' and ');
}
