/** CSV companions of the diagrams, in the one convention of docs/csv.md. */
import { describe, expect, it } from 'vitest';
import { levelsCsv, linesCsv, patternCsv } from '../../server/src/render';
import { csvCommentLine, sortedStates, stateTableCsv } from '../../server/src/render/csv';

describe('diagram CSV', () => {
  it('states the field in the comment line without binary noise (50 nT is 5e-8 T, not 5.0000000000000004e-8 T)', () => {
    const fieldT = 50 * 1e-9; // as the unit table converts `50 nT`
    expect(fieldT).not.toBe(5e-8);
    const levels = levelsCsv({ title: 't', fieldUnit: 'G', fieldsT: [0], curves: [], markerT: fieldT, markerLabel: 'field tiny' });
    expect(levels.split('\n')[0]).toBe('# sublevel levels: field=field tiny 5e-8 T');
    const lines = linesCsv({ title: 't', components: [], fieldT, fieldName: 'field tiny' });
    expect(lines.split('\n')[0]).toBe('# sublevel lines: field=field tiny 5e-8 T');
  });

  it('writes a comment line, SI column names, energies then moments, one row per field', () => {
    const csv = levelsCsv(
      {
        title: 't',
        fieldUnit: 'T',
        fieldsT: [0, 0.1],
        curves: [{ id: 'a', lowLabel: 'F=1, m=0', highLabel: 'x', energyHz: [1.5e9, 1.2345678901234e9], momentJT: [0, 9.27e-24] }],
        markerT: 0.1,
        markerLabel: 'field bias',
      },
      [['file', 'a.sublevel'], ['level', 'X.g']],
    );
    expect(csv).toBe(
      '# sublevel levels: file=a.sublevel; level=X.g; field=field bias 0.1 T\n' +
        'field_T,"energy_Hz[F=1, m=0 -> x]","moment_J_per_T[F=1, m=0 -> x]"\n0,1500000000,0\n0.1,1234567890.1234,9.27e-24\n',
    );
  });

  it('sorts states by energy at the first field, degenerate ones by energy at the last', () => {
    const s = (name: string, e: number[]) => ({ lowLabel: name, highLabel: name, energyHz: e });
    expect(sortedStates([s('c', [2, 5]), s('a', [1, 9]), s('b2', [2, 3]), s('bad', [NaN, 0])]).map((x) => x.lowLabel)).toEqual(['a', 'b2', 'c', 'bad']);
    const csv = stateTableCsv({ kind: 'sweep', about: [] }, [0, 1], [s('c', [2, 5]), s('a', [1, 9])]);
    expect(csv.split('\n')[1]).toBe('field_T,energy_Hz[a],energy_Hz[c]');
  });

  it('keeps the comment line on one line whatever the names hold', () => {
    expect(csvCommentLine({ kind: 'lines', about: [['file', 'a;b\nc.sublevel'], ['line', undefined], ['field', '']] })).toBe('# sublevel lines: file=a,b c.sublevel');
  });

  it('sorts line components by offset, says the field, quotes and defuses user text', () => {
    const csv = linesCsv(
      {
        title: 't',
        fieldT: 3.23e-4,
        fieldName: 'field trap',
        components: [
          { offsetHz: 5, strength: 1, polarization: 'pi', label: 'a → b' },
          { offsetHz: -1, strength: 0.5, polarization: 'sigma-', label: '=HYPERLINK("x")' },
        ],
      },
      [['line', 'D2']],
    ).split('\n');
    expect(csv[0]).toBe('# sublevel lines: line=D2; field=field trap 0.000323 T');
    expect(csv[1]).toBe('offset_Hz,strength,polarization,transition');
    expect(csv[2]).toBe('-1,0.5,sigma-,"\'=HYPERLINK(""x"")"');
    expect(csv[3]).toBe('5,1,pi,a -> b');
  });

  it('leaves empty cells for missing values', () => {
    const csv = patternCsv({ title: 't', positionsM: [0, 1e-3], total: [1, NaN], parts: [{ id: 'p', label: 'p', values: [1] }], peaks: [], verdict: { resolved: true, text: '' } });
    expect(csv).toBe('# sublevel pattern\nposition_m,total_per_m,share_per_m[p]\n0,1,1\n0.001,,\n');
  });
});
