/**
 * `trap-zero-field`: one finding per trap naming every sublevel at the zero of a quadrupole's field
 * (⁸⁷Rb |1,−1⟩, |2,+1⟩, |2,+2⟩ are the low-field seekers of the ground level; Breit–Rabi), and a
 * written but unusable temperature is pointed at rather than asked for.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';

const TRAP = (temperature: string | undefined) => `species Rb87
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
${temperature === undefined ? '' : `  temperature = ${temperature}\n`}`;

function zeroField(temperature: string | undefined) {
  return analyze(TRAP(temperature)).result!.diagnostics.filter((d) => d.code === 'trap-zero-field');
}

describe('trap-zero-field', () => {
  it('one finding per trap, naming the three sublevels at the zero', () => {
    const found = zeroField(undefined);
    expect(found).toHaveLength(1);
    expect(found[0]!.message).toBe(
      "trap 'q': |F=1, m_F=-1⟩, |F=2, m_F=+1⟩ and |F=2, m_F=+2⟩ sit at a zero of the field: the bias at the minimum is too small, Majorana spin flips lose atoms there; give the cloud temperature for a loss estimate.",
    );
    expect(found[0]!.severity).toBe('warning');
  });

  it.each(['3 m', '-1 uK', '0 K'])('a temperature written as %s: the finding points at it instead of asking for one', (t) => {
    const found = zeroField(t);
    expect(found).toHaveLength(1);
    expect(found[0]!.message).toContain('the cloud temperature written on line 12 is not usable (see its own problem there), so there is no loss estimate');
    expect(found[0]!.message).not.toContain('give the cloud temperature');
    // The editor and SARIF get the value's place as a related location (0-based line 11 = line 12).
    const problem = analyze(TRAP(t)).problems.find((p) => p.code === 'trap-zero-field')!;
    expect((problem.related ?? []).map((r) => [r.range.start.line, r.message])).toEqual([[11, 'the cloud temperature that could not be used']]);
  });

  it('a cold cloud: the rates of each sublevel in the one finding (Majorana rates grow as 1/T², docs/traps.md)', () => {
    const found = zeroField('1 nK');
    expect(found).toHaveLength(1);
    expect(found[0]!.message).toMatch(/about \d+ \/s for \|F=1, m_F=-1⟩, \d+ \/s for \|F=2, m_F=\+1⟩ and \d+ \/s for \|F=2, m_F=\+2⟩ at the cloud temperature/);
  });
});
