/** A fit that could not run has no degrees of freedom: null in JSON, an empty cell in CSV — never points − parameters < 0. */
import { describe, expect, it } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { memorySources } from '../../server/src/model/sources';
import { fitCsv } from '../../server/src/render/fitCsv';

const text = 'species Rb87\n  level g: 5s 2S1/2\ndata d\n  level = g\n  lower = 1 0\n  upper = 2 0\n  file = "d.csv"\nfit f\n  data = d\n  free = field, A\n  start = field 2 G, A 3417 MHz\n';
const run = (csv: string) => analyze(text, memorySources('/lab/setup.sublevel', { '/lab/d.csv': csv }));

describe('dof of a fit that did not run', () => {
  it('0 usable points: dof null, CSV dof cell empty', () => {
    const r = run('# invented\nfrequency [MHz], uncertainty [kHz]\nabc, 1\n');
    const f = r.result!.fits![0]!;
    expect(f.status).toBe('failed');
    expect(f.dof).toBeNull();
    expect(JSON.parse(JSON.stringify(f)).dof).toBeNull();
    const dofRow = fitCsv([f], 'setup.sublevel').split('\n').find((l) => l.startsWith('f,statistic,dof'))!;
    expect(dofRow).toBe('f,statistic,dof,,,,,,,,');
  });

  it('a fit that ran keeps its dof: three points, two free parameters → 1', () => {
    const r = run('# invented\nfrequency [kHz], uncertainty [Hz]\n6834688.143926, 20\n6834688.153926, 20\n6834688.133926, 20\n');
    const f = r.result!.fits![0]!;
    expect(f.status).not.toBe('failed');
    expect(f.dof).toBe(1);
    expect(fitCsv([f], 'setup.sublevel')).toContain('f,statistic,dof,,,1,,,,,');
  });
});
