/** `sublevel render` options for figures: field range and unit, the resonance view, PNG. */
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const RB = 'examples/rubidium-bias.sublevel';

describe('sublevel render options', () => {
  it('--from/--to/--unit set the levels range and axis unit; both ends appear in the CSV', () => {
    const r = cli('render', RB, '--from', '10 G', '--to', '150 G', '--unit', 'G');
    expect(r.code).toBe(0);
    expect(r.out).toContain('data-x-unit="G"');
    expect(r.out).toContain('data-x-domain="0.001,0.015"');
    const csv = cli('render', RB, '--from', '10 G', '--to', '150 G', '--format', 'csv').out.trim().split('\n');
    expect(Number(csv[2]!.split(',')[0])).toBeCloseTo(0.001, 15);
    expect(Number(csv[csv.length - 1]!.split(',')[0])).toBeCloseTo(0.015, 15);
    // Every named field inside the range is marked (trap 3.23 G is below 10 G: said, not drawn).
    expect(r.out.match(/data-kind="marker"/g)).toHaveLength(1);
    expect(r.out).toContain('outside the sweep: field trap');
  });

  it('the residuals view takes the first fit with residuals by default, as its help says', () => {
    // fit-rubidium: `bias` (a one-resonance calibration, no residuals) comes before `constants`.
    expect(cli('render', '--help').out).toContain('--fit NAME');
    expect(cli('render', '--help').out).toContain('default: the first fit with residuals (a one-resonance calibration has none)');
    const svg = cli('render', 'examples/fit-rubidium.sublevel', '--view', 'residuals').out;
    expect(svg).toContain('Fit constants: data, model and residuals');
  });

  it('the lines figure states its field in the unit the file wrote', () => {
    const svg = cli('render', RB, '--view', 'lines').out;
    expect(svg).toContain('at field trap, 3.23 G');
    expect(svg).toContain('(B = 3.23 G)');
  });

  it('without --unit the field axis follows the unit family the file wrote its field in', () => {
    // rubidium-bias writes gauss; marking the 120 G probe puts the range above 0.01 T, where the size alone chose mT.
    expect(cli('render', RB).out).toContain('data-x-unit="G"');
    expect(cli('render', RB, '--field', 'probe').out).toContain('data-x-unit="G"');
  });

  it.each([
    [['--unit', 'kG'], /--unit/],
    [['--from', '2 T', '--to', '1 T'], /--to must be a larger field/],
    [['--to', '3 m'], /--to/],
    [['--view', 'resonance', '--resonance', 'clok'], /did you mean 'clock'/],
    [['--format', 'png'], /--out FILE.png/],
    // An option of another view would be ignored without a word: the resonance view spans the block's own range.
    [['--view', 'resonance', '--from', '-5 G', '--to', '5 G'], /--from acts on the levels view; the resonance view spans the resonance block's own `range`/],
    [['--view', 'resonance', '--unit', 'mT'], /--unit acts on the levels and fieldmap views; the resonance view takes the unit of the resonance block's `range`/],
    [['--view', 'lines', '--to', '5 G'], /--to acts on the levels view; the lines view does not use it/],
    [['--view', 'levels', '--beam', 'b'], /--beam acts on the pattern view; the levels view does not use it/],
    [['--view', 'lines', '--level', 'ground'], /--level acts on the levels view; the lines view does not use it/],
  ])('rejects %j with a usage error', (opts, message) => {
    const r = cli('render', RB, ...opts);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(message);
  });

  it('draws the resonance view with the evaluation’s field-insensitive point', () => {
    const json = JSON.parse(cli('eval', RB, '--format', 'json').out);
    const fi = json.resonances.find((x: { name: string }) => x.name === 'clock').field_insensitive[0].field_T;
    const svg = cli('render', RB, '--view', 'resonance', '--resonance', 'clock').out;
    expect(svg).toContain(`data-kind="insensitive" data-field-t="${Number(fi.toPrecision(12))}"`);
    const csv = cli('render', RB, '--view', 'resonance', '--format', 'csv').out.split('\n');
    expect(csv[0]).toBe(`# sublevel resonance: file=${RB}; resonance=clock; transition=F=1, m_F=-1 -> F=2, m_F=+1`);
    expect(csv[1]).toBe('field_T,frequency_Hz,df_dB_Hz_per_T');
    // At zero field the pair's frequency is the ground splitting, 6 834 682 610.904 Hz (published measurement).
    expect(Number(csv[2]!.split(',')[1])).toBeCloseTo(6834682610.904, 2);
  });

  it('writes df/dB in the unit the reports use (Hz/G with a prefix), and places it on that axis', () => {
    const svg = cli('render', RB, '--view', 'resonance', '--resonance', 'clock').out;
    const report = cli('eval', RB).out;
    expect(report).toMatch(/Hz\/G/);
    expect(svg).toContain('df/dB (kHz/G)');
    expect(svg).not.toMatch(/Hz\/T/);
    // At zero field the pair's slope is about −3 kHz/G (the text report's df/dB at 0 G): the CSV's first slope, per gauss.
    const csv = cli('render', RB, '--view', 'resonance', '--format', 'csv').out.split('\n');
    const slopePerG = Number(csv[2]!.split(',')[2]) * 1e-4;
    expect(slopePerG).toBeLessThan(-2000);
    expect(slopePerG).toBeGreaterThan(-4000);
  });

  it.skipIf(!existsSync('/usr/bin/chromium'))('writes PNG at three pixels per SVG unit', () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'sublevel-png-test-'));
    try {
      const out = path.join(dir, 'levels.png');
      const r = cli('render', RB, '--format', 'png', '--out', out);
      expect(r.code).toBe(0);
      const png = readFileSync(out);
      expect(png.subarray(1, 4).toString('latin1')).toBe('PNG');
      const width = Number(/width="(\d+)"/.exec(cli('render', RB).out)![1]);
      expect(png.readUInt32BE(16)).toBe(3 * width);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);
});
