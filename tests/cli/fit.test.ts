/** `sublevel fit`: the three formats on the example, and a file without fits. */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { cli } from './runCli';

const FILE = 'examples/fit-rubidium.sublevel';

describe('sublevel fit', () => {
  it('text: both calibration fields with u(B) = 5 Hz / |df/dB| and the fitted constants (SciPy reference values)', () => {
    const r = cli('fit', FILE);
    expect(r.code).toBe(0);
    expect(r.out).toContain('field = 2.1523(54) G');
    // The lowest root is the fit's value; the other is said to be resonant too.
    expect(r.out).toContain('also resonant at 4.3056(54) G');
    expect(r.out).toContain('g_J = 2.00233089(18)');
    expect(r.out).toContain('A   = 3417.341382(68) MHz');
    expect(r.out).not.toMatch(/NaN|Infinity/);
  });

  it('text: the residual table echoes the measured values in the unit the file wrote them (kHz), as written', () => {
    const r = cli('fit', FILE);
    expect(r.out).toMatch(/pi_lines line 23 +6834696\.976 kHz +-165\.6 Hz/);
    expect(r.out).toMatch(/sigma_lines line 35 +9651311\.13 kHz/);
    // Each row says where its point was taken, in the unit the file writes (`at 0.5 mT` … `at 150 mT`; was 500 µT).
    expect(r.out).toMatch(/pi_lines line 23 .*\(-0\.552 σ\)  at 0.5 mT$/m);
    expect(r.out).toMatch(/sigma_lines line 35 .*  at 150 mT$/m);
    expect(r.out).not.toMatch(/line \d+ +[\d.]+ GHz/);
  });

  it('text: a point written in another unit than the first reads back in its own unit (MHz, GHz), not the first point’s kHz', () => {
    // Invented, badly scaled data: units change from point to point.
    const dir = mkdtempSync(join(tmpdir(), 'sublevel-fit-'));
    const file = join(dir, 'mixed.sublevel');
    writeFileSync(
      file,
      ['species Rb87', '  level ground: 5s 2S1/2', 'data mixed', '  level = ground', '  lower = 1 0', '  upper = 2 0',
        '  point = 6834682.6(5) kHz at 2 µT', '  point = 6834.7(2) MHz at 100 G', '  point = 21.1(8) GHz at 1 T',
        'fit wild', '  data  = mixed', '  free  = g_J, A', '  start = g_J 2, A 3417 MHz', ''].join('\n'),
    );
    try {
      const r = cli('fit', file);
      expect(r.out).toMatch(/mixed line 7 +6834682\.6 kHz /);
      expect(r.out).toMatch(/mixed line 8 +6834\.7 MHz /);
      expect(r.out).toMatch(/mixed line 9 +21\.1 GHz /);
      const doc = JSON.parse(cli('fit', file, '--format', 'json').out);
      expect(doc.fits[0].points.map((p: { written_unit?: string }) => p.written_unit)).toEqual([undefined, 'MHz', 'GHz']);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
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
