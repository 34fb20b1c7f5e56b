/**
 * Minimal reader for the designations stored in this table ('5p 2P°3/2', '1s 2s 3S1',
 * '4f14 6s 6p 3P°1'). It exists to check the table's own strings; user-typed term symbols
 * are handled by the term-symbol module.
 */

/** Result of reading a stored designation. */
export interface DesignationParts {
  readonly configuration: string;
  readonly multiplicity: number;
  readonly L: number;
  readonly odd: boolean;
  readonly twoJ: number;
}

const L_LETTERS = 'SPDFGHIK';
/** Subshells like 5s, 2p, 3d5, 4f14, written together or separated by single spaces. */
const CONFIGURATION = String.raw`(?:\d+[spdfg]\d*)(?: ?\d+[spdfg]\d*)*`;
const TERM = String.raw`(\d+)([SPDFGHIK])(°?)(\d+(?:/2)?)`;
export const DESIGNATION_PATTERN = new RegExp(`^(${CONFIGURATION}) ${TERM}$`);

/** Reads a stored designation, or returns undefined if it does not have the expected shape. */
export function parseDesignation(text: string): DesignationParts | undefined {
  const m = DESIGNATION_PATTERN.exec(text);
  if (!m) return undefined;
  const [, configuration, mult, letter, parity, jText] = m as unknown as [string, string, string, string, string, string];
  const twoJ = jText.endsWith('/2') ? Number(jText.slice(0, -2)) : 2 * Number(jText);
  return {
    configuration,
    multiplicity: Number(mult),
    L: L_LETTERS.indexOf(letter),
    odd: parity === '°',
    twoJ,
  };
}
