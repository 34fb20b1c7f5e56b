/** Hover on a slower's name: the summary, the profile numbers and the cautions line. */
import { describe, expect, it } from 'vitest';
import { hover } from '../../server/src/features/hover';
import { atCursor, hoverText, plain } from './helpers';

const FILE = `species Na23
  level ground: 3s 2S1/2
  level p32:    3p 2P°3/2

line D2: ground -> p32

slower m|ain
  line       = D2
  capture    = 950 m/s
  final      = 30 m/s
  safety     = 0.55
  design     = spin_flip
  saturation = 2.5
`;

describe('slower hover', () => {
  it('shows the length, the field span, the detuning, the driven pair and the cautions', () => {
    const { analysis, position } = atCursor(FILE);
    const text = plain(hoverText(hover(analysis, position)));
    // The same numbers as the example file (tests/eval/slower.test.ts checks them against SciPy).
    expect(text).toContain('spin-flip (field through zero) slower, 90.42 cm long, B from 557.76 G to -557.76 G, laser -831.69 MHz from the line');
    expect(text).toContain('F=2, m_F=+2 → F=3, m_F=+3');
    expect(text).toContain('through zero at z = 66.43 cm');
    expect(text).toMatch(/Slowing laser at 589 nm · Slower coils for up to 558 G: follow your lab's safety rules/);
    expect(text).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('a slower that cannot be computed says so', () => {
    const { analysis, position } = atCursor('slower z|s\n  capture = 500 m/s\n');
    expect(plain(hoverText(hover(analysis, position)))).toContain('not computed');
  });
});
