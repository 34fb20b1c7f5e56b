/**
 * Reading measured points and fit starts (invented numbers): a start in % is a fraction, a
 * profile point's "swapped columns" reading needs a length, and a CSV row out of range gets the
 * code a written point gets.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { memorySources } from '../../server/src/model/sources';

const LEVEL = 'species Rb87\n  level ground: 5s 2S1/2\n';
const SPECTRAL = `${LEVEL}data d\n  level = ground\n  lower = 1 0\n  upper = 2 0\n`;
const PROFILE = `${LEVEL}data p\n  kind = profile\n`;

function said(text: string, code: string): string[] {
  return analyze(text).problems.filter((p) => p.code === code).map((p) => p.message);
}

describe('fit starts', () => {
  it('start = background 5 % is the fraction 0.05 (units.ts reads % for a plain number), with no problem', () => {
    const a = analyze(`${SPECTRAL}  point = 6834.7 MHz at 1 G\nfit f\n  data  = d\n  free  = background\n  start = background 5 %, populations 20 %\n`);
    expect(a.problems.filter((p) => p.code === 'fit-start-malformed')).toEqual([]);
    const starts = a.model!.fits[0]!.starts.map((s) => [s.name, s.value]);
    expect(starts[0]).toEqual(['background', 0.05]);
    expect(starts[1]![0]).toBe('populations');
    expect(starts[1]![1]).toBeCloseTo(0.2, 15);
  });

  it('a plain-number start with another unit is still refused, naming the parameter', () => {
    expect(said(`${SPECTRAL}  point = 6834.7 MHz at 1 G\nfit f\n  data  = d\n  free  = g_J\n  start = g_J 2 MHz\n`, 'fit-start-malformed')).toEqual(['the start of g_J is a plain number or %, got 2 MHz.']);
  });
});

describe('profile points whose one quantity is not first or alone', () => {
  it('a length after the counts reads as swapped columns; a length alone as a position without counts', () => {
    expect(said(`${PROFILE}  point = 14 -120 um\n`, 'data-point-malformed')).toEqual(['the position goes first, then the counts: write point = -120 um 14.']);
    expect(said(`${PROFILE}  point = -120 um\n`, 'data-point-malformed')).toEqual(['this point gives a position but no counts: write point = -120 um <counts> [<error>].']);
  });

  it('a frequency or a field is no position: the point gets its shape, not "the position goes first"', () => {
    const shape = 'write point = <position> <counts> [<error>], e.g. point = -120 um 14 4.';
    expect(said(`${PROFILE}  point = 14 5 MHz\n`, 'data-point-malformed')).toEqual([shape]);
    expect(said(`${PROFILE}  point = 3 G\n`, 'data-point-malformed')).toEqual([shape]);
  });
});

describe('CSV rows out of range get the codes written points get', () => {
  const main = '/lab/main.sublevel';
  function csvProblems(block: string, csv: string): { code: string; message: string }[] {
    const a = analyze(`${LEVEL}${block}  file  = "rows.csv"\n`, memorySources(main, { '/lab/rows.csv': csv }));
    return a.problems.filter((p) => p.code !== 'data-incomplete' && p.severity !== 'info').map((p) => ({ code: p.code, message: p.message }));
  }

  it('a position beyond 1 km is value-beyond-apparatus, said as a rule', () => {
    const got = csvProblems('data p\n  kind  = profile\n', '# invented\nposition [um], counts\n-120, 14\n2e9, 3\n');
    expect(got).toEqual([{ code: 'value-beyond-apparatus', message: 'rows.csv line 4: positions must be within 1 km of the beam axis.' }]);
  });

  it('a field above 1e5 T is field-beyond-physical; a negative frequency stays data-point-malformed', () => {
    const got = csvProblems('data d\n  level = ground\n  lower = 1 0\n  upper = 2 0\n', '# invented\nfrequency [MHz], field [T]\n6834.7, 1e-4\n6834.7, 2e5\n-5, 1e-4\n');
    expect(got.map((p) => p.code)).toEqual(['field-beyond-physical', 'data-point-malformed']);
    expect(got[0]!.message).toContain('rows.csv line 4: fields must be at most 1e5 T');
    expect(got[1]!.message).toBe('rows.csv line 5: frequencies and uncertainties must be positive and fields not negative.');
  });
});
