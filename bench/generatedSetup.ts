/** A plausible large setup: many species with levels, some fields and magnets, beams and lines. */
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
    if (i % 40 === 0) out.push(`field f${i} = ${[0.5, 3, 10, 50][(i / 40) % 4]} G`);
    if (i % 40 === 20) {
      out.push(`magnet m${i}`, '  field    = 0.4 T', '  gradient = 120 T/m', '  length   = 6 cm');
      out.push(`beam b${i}`, `  species  = Demo${i}`, `  level    = g${i}`, '  source   = oven 450 K', '  slits    = 80 um, 50 um apart 40 cm', `  magnet   = m${i}`, '  drift    = 30 cm', '  detector = 25 um');
    }
    out.push(`line L${i}: g${i} -> p${i}`, '');
  }
  return out.slice(0, lines).join('\n');
}
