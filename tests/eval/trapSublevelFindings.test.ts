/**
 * `trap-zero-field`, `trap-majorana-slow`, `trap-cut-outside`: one finding per trap naming every
 * sublevel concerned, each with its own figure (⁸⁷Rb |1,−1⟩, |2,+1⟩, |2,+2⟩ are the low-field
 * seekers of the ground level; Breit–Rabi), and a written but unusable temperature is pointed at
 * rather than asked for.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { quadrupoleTrapSetup } from './quadrupoleTrapSetup';

const TRAP = (temperature: string | undefined, cut?: string) =>
  quadrupoleTrapSetup(`${temperature === undefined ? '' : `  temperature = ${temperature}\n`}${cut === undefined ? '' : `  cut = ${cut}\n`}`);

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

describe('trap-majorana-slow: one note per trap', () => {
  it('a quadrupole at 300 µK: one note naming the three sublevels, each with its own rate and lifetime', () => {
    const r = analyze(TRAP('300 uK')).result!;
    const found = r.diagnostics.filter((d) => d.code === 'trap-majorana-slow');
    expect(found).toHaveLength(1);
    expect(found[0]!.severity).toBe('info');
    // Each rate is the one the trap's JSON gives that sublevel (the rate rides on the issue, no label matching).
    const rateOf = (label: string) => r.traps![0]!.sublevels.find((s) => s.label === label)!.majorana!.rate_per_s;
    for (const label of ['F=1, m_F=-1', 'F=2, m_F=+1', 'F=2, m_F=+2']) {
      const rate = rateOf(label);
      expect(rate).toBeLessThan(1 / 60);
      expect(found[0]!.message).toContain(`${Number(rate.toPrecision(2))} /s for |${label}⟩ (a lifetime of ${Number((1 / rate).toPrecision(2))} s)`);
    }
    expect(r.diagnostics.filter((d) => d.code === 'trap-zero-field')).toEqual([]);
  });
});

describe('trap-cut-outside: one note per trap, on the cut', () => {
  const depthsMK = (r: ReturnType<typeof analyze>['result']) => Object.fromEntries(r!.traps![0]!.sublevels.filter((s) => s.trapped).map((s) => [s.label, s.depth_K! * 1e3]));

  it('a 5 mK cut above two depths of three: one note naming those two with their depths in mK, placed on the cut', () => {
    const a = analyze(TRAP('300 uK', '5 mK'));
    const found = a.result!.diagnostics.filter((d) => d.code === 'trap-cut-outside');
    expect(found).toHaveLength(1);
    const d = depthsMK(a.result);
    expect(d['F=1, m_F=-1']!).toBeLessThan(5);
    expect(d['F=2, m_F=+1']!).toBeLessThan(5);
    expect(d['F=2, m_F=+2']!).toBeGreaterThan(5);
    expect(found[0]!.message).toBe(
      `trap 'q': the RF cut is above the trap's depth for |F=1, m_F=-1⟩ (depth ${Number(d['F=1, m_F=-1']!.toPrecision(5))} mK) and |F=2, m_F=+1⟩ (depth ${Number(d['F=2, m_F=+1']!.toPrecision(5))} mK): for them the knife cuts nothing the edge does not.`,
    );
    const problem = a.problems.find((p) => p.code === 'trap-cut-outside')!;
    expect(problem.range.start.line).toBe(12); // the `cut` line (0-based)
  });

  it('a cut written in MHz: the depths beside it in MHz (E = h ν)', () => {
    const a = analyze(TRAP('300 uK', '100 MHz'));
    const found = a.result!.diagnostics.filter((d) => d.code === 'trap-cut-outside');
    expect(found).toHaveLength(1);
    const depthMHz = a.result!.traps![0]!.sublevels.find((s) => s.label === 'F=1, m_F=-1')!.depth_Hz! / 1e6;
    expect(found[0]!.message).toContain(`|F=1, m_F=-1⟩ (depth ${Number(depthMHz.toPrecision(5))} MHz)`);
  });
});
