/** `sublevel fit`: the three formats on the example, and a file without fits. */
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const FILE = 'examples/fit-rubidium.sublevel';

describe('sublevel fit', () => {
  it('text: both calibration fields with u(B) = 5 Hz / |df/dB| and the fitted constants (SciPy reference values)', () => {
    const r = cli('fit', FILE);
    expect(r.code).toBe(0);
    expect(r.out).toContain('field = 2.1523(54) G');
    expect(r.out).toContain('field = 4.3056(54) G');
    expect(r.out).toContain('g_J = 2.00233089(18)');
    expect(r.out).toContain('A   = 3417.341382(68) MHz');
    expect(r.out).not.toMatch(/NaN|Infinity/);
  });

  it('text: the residual table echoes the measured values in the unit the file wrote them (kHz), as written', () => {
    const r = cli('fit', FILE);
    expect(r.out).toMatch(/pi_lines line 23 +6834696\.976 kHz +-165\.6 Hz/);
    expect(r.out).toMatch(/sigma_lines line 35 +9651311\.13 kHz/);
    expect(r.out).not.toMatch(/line \d+ +[\d.]+ GHz/);
  });

  it('json: the sublevel-fit document, version 1', () => {
    const doc = JSON.parse(cli('fit', FILE, '--format', 'json').out);
    expect(doc.format).toBe('sublevel-fit');
    expect(doc.version).toBe(1);
    expect(doc.fits.map((f: { name: string; kind: string }) => `${f.name}:${f.kind}`)).toEqual(['bias:calibration', 'constants:spectral']);
    expect(doc.fits[1].uncertainty_basis).toBe('data');
    expect(doc.fits[1].covariance[0][1]).toBeLessThan(0);
  });

  it('csv: one row per parameter, root, statistic and point', () => {
    const rows = cli('fit', FILE, '--format', 'csv').out.split('\n');
    expect(rows[0]).toMatch(/^# sublevel fit: file=/);
    expect(rows[1]).toBe('fit,item,name,x,x_unit,value,uncertainty,model,residual,unit,line');
    expect(rows.filter((l) => l.startsWith('bias,root,field,'))).toHaveLength(2);
    expect(rows.filter((l) => l.startsWith('constants,point,'))).toHaveLength(8);
  });

  it('a file without fits is an error that says what to write', () => {
    const r = cli('fit', 'examples/rubidium-bias.sublevel');
    expect(r.code).toBe(1);
    expect(r.err).toContain('the file has no fit');
  });
});
