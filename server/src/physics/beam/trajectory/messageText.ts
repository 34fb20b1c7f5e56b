/** Short quantity texts for this folder's messages (physics has no access to the evaluation's formatter). */

export function cm(x: number): string {
  return `${Number((x * 100).toPrecision(3))} cm`;
}

export function um(x: number): string {
  return `${Number((x * 1e6).toPrecision(3))} µm`;
}

export function tesla(b: number): string {
  if (b >= 1e-3) return `${Number((b * 1e3).toPrecision(3))} mT`;
  return b >= 1e-7 ? `${Number((b * 1e4).toPrecision(3))} G` : 'below 1 mG';
}
