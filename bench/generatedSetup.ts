/**
 * A plausible large setup: many species with levels, some fields and magnets, beams and lines.
 * Every 40 species get a field that names them and one magnet with a beam of one of them, so a
 * level is evaluated at one or two working fields whatever the length (docs/format.md).
 */
export function generateSetup(lines: number): string {
  const out: string[] = ['# Generated setup for the editor benchmark (invented numbers).', ''];
  for (let i = 0; out.length < lines; i++) {
    out.push(
      `species Demo${i}                       # hand-made species ${i}`,
      `  mass = ${(40 + (i % 150) + 0.913).toFixed(3)} u`,
      '  I    = 3/2',
      '  g_I  = -0.000995',
      `  level g${i}: 5s 2S1/2  A = ${(3417.34 + i).toFixed(2)} MHz`,
      `  level p${i}: 5p 2P°3/2  A = 84.72 MHz  B = 12.5 MHz`,
      `  level d${i}: 4d 2D5/2`,
    );
    // Each field acts on the 40 species before it (its `species` list), as a lab file would say which atoms sit in which field.
    if (i % 40 === 39) {
      const group = Array.from({ length: 40 }, (_, k) => `Demo${i - 39 + k}`);
      out.push(`field f${i - 39} = ${[0.5, 3, 10, 50][((i - 39) / 40) % 4]} G`, `  species = ${group.join(', ')}`);
    }
    if (i % 40 === 20) {
      out.push(`magnet m${i}`, '  field    = 0.4 T', '  gradient = 120 T/m', '  length   = 6 cm');
      out.push(`beam b${i}`, `  species  = Demo${i}`, `  level    = g${i}`, '  source   = oven 450 K', '  slits    = 80 um, 50 um apart 40 cm', `  magnet   = m${i}`, '  drift    = 30 cm', '  detector = 25 um');
    }
    out.push(`line L${i}: g${i} -> p${i}`, '');
  }
  return out.slice(0, lines).join('\n');
}
