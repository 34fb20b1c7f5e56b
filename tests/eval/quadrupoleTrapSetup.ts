/** An invented quadrupole trap for the trap tests: ⁸⁷Rb's ground level in an opposed pair, 4 cm radius, 8 cm apart, 100 turns at 20 A; `extra` lines go at the end of the trap block. */
export function quadrupoleTrapSetup(extra = ''): string {
  return `species Rb87
  level ground: 5s 2S1/2
coil quad
  radius  = 4 cm
  turns   = 100
  current = 20 A
  spacing = 8 cm
  sense   = opposite
trap q
  sources = quad
  level   = ground
${extra}`;
}
