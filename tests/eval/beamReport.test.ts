import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { textReport } from '../../server/src/cli/textReport';
import { magnetAndBeam, speciesX } from '../fixtures/ovenBeam';

const SETUP = speciesX('52 u', '3S1') + magnetAndBeam('0.5 T/m');

describe('beam results say the same thing everywhere', () => {
  it('the resolving suggestions of the diagnostic, the JSON and the text report are one sentence', () => {
    const a = analyze(SETUP);
    const beam = a.result!.beams[0]!;
    const advice = beam.resolving_advice!;
    expect(advice).toMatch(/^Worst dip now 100 % \(resolved at ≤ 80 %\); computed on this setup: a gradient of [\d.]+ T\/m gives \d+ % and resolves every pair; a magnet of .+\.$/);
    const diag = a.result!.diagnostics.find((d) => d.code === 'beam-unresolved')!;
    expect(diag.message.endsWith(advice)).toBe(true);
    expect(textReport('x.sublevel', a.result!).join('\n')).toContain(advice);
  });

  it('the unresolved pair is named in words: its first sublevel and how many others share each peak', () => {
    // Four sublevels in each of two peaks (an invented lithium beam with too weak a gradient).
    const text = readFileSync('tests/fixtures/diff/beam-weak-gradient.sublevel', 'utf8');
    const diag = analyze(text).result!.diagnostics.find((d) => d.code === 'beam-unresolved')!;
    expect(diag.message).toContain('will not be resolved on the detector (F=2, m_F=-1 with 3 others and F=1, m_F=-1 with 3 others).');
    // A lone sublevel is named alone.
    expect(analyze(SETUP).result!.diagnostics.find((d) => d.code === 'beam-unresolved')!.message).toContain('(J=1, m_J=+1 and J=1, m_J=0; J=1, m_J=0 and J=1, m_J=-1)');
  });

  it('the strong-magnet caution quotes the magnet field as the magnets table does, in the unit the file wrote', () => {
    const lithium = readFileSync('examples/lithium-beam.sublevel', 'utf8');
    for (const [written, shown] of [['0.45 T', '0.45 T'], ['4500 G', '4500 G'], ['450 mT', '450 mT']] as const) {
      const a = analyze(lithium.replace('field    = 0.45 T', `field    = ${written}`));
      expect(a.result!.beams[0]!.cautions[0]).toMatch(new RegExp(`^Strong magnet \\(${shown} at the beam\\)`));
      expect(textReport('x.sublevel', a.result!).join('\n')).toContain(`selector  ${shown}`);
    }
    // A magnet built from sources: its computed field, as the table prints it (0.306934 T, not a second rounding 0.3069 T).
    const wires = analyze(readFileSync('examples/two-wire-magnet.sublevel', 'utf8')).result!;
    expect(wires.beams[0]!.cautions[0]).toMatch(/^Strong magnet \(0\.306934 T at the beam\)/);
    expect(textReport('x.sublevel', wires).join('\n')).toContain('selector  0.306934 T');
    // A field written with an uncertainty: value and uncertainty, as the table (the caution read `0.45 T`).
    const uncertain = analyze(readFileSync('tests/fixtures/uncertain.sublevel', 'utf8')).result!;
    expect(uncertain.beams[0]!.cautions[0]).toMatch(/^Strong magnet \(0\.4500\(50\) T at the beam\)/);
    expect(textReport('x.sublevel', uncertain).join('\n')).toMatch(/\b\w+ +0\.4500\(50\) T/);
    // A magnet built from sources whose current is uncertain (2400(20) A): the table's propagated uncertainty too (it read 0.306934 T).
    const uncertainWires = analyze(readFileSync('examples/two-wire-magnet.sublevel', 'utf8').replace('current   = 2400 A ', 'current   = 2400(20) A')).result!;
    expect(textReport('x.sublevel', uncertainWires).join('\n')).toContain('selector  0.3069(26) T');
    expect(uncertainWires.beams[0]!.cautions[0]).toMatch(/^Strong magnet \(0\.3069\(26\) T at the beam\)/);
  });

  it('an unpopulated sublevel has no peak (null), never NaN', () => {
    const a = analyze(SETUP.replace('gradient = 0.5 T/m', 'gradient = 100 T/m') + '  populations = 1 +1 1\n');
    const subs = a.result!.beams[0]!.sublevels;
    expect(subs.filter((s) => s.population === 0).map((s) => s.peak_m)).toEqual([null, null]);
    expect(JSON.stringify(a.result)).not.toMatch(/NaN|Infinity/);
  });
});
