/** `sublevel trap`: the three formats on the example, --trap, and a file without traps. */
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const FILE = 'examples/quadrupole-trap.sublevel';

describe('sublevel trap', () => {
  it('text: the summary, every sublevel, the RF cut and the cautions', () => {
    const r = cli('trap', FILE);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^Sublevel traps of examples\/quadrupole-trap\.sublevel/);
    expect(r.out).toContain('trap quadtrap — Rb87.ground; sources quad, lift');
    expect(r.out).toContain('temperature 300 µK; cut 3 mK');
    expect(r.out).toMatch(/\|F=2, m_F=\+2⟩ +trapped/);
    expect(r.out).toMatch(/\|F=2, m_F=-2⟩ +not low-field seeking/);
    expect(r.out).toMatch(/linear \(no harmonic frequency\)/);
    expect(r.out).toMatch(/RF cut [0-9.]+ MHz to \|F=2, m_F=\+1⟩/);
    expect(r.out).toContain('caution: Trap coils dissipate power');
    expect(r.out).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('json: the sublevel-trap document, version 1', () => {
    const doc = JSON.parse(cli('trap', FILE, '--format', 'json').out);
    expect(doc.format).toBe('sublevel-trap');
    expect(doc.version).toBe(1);
    expect(doc.traps.map((t: { name: string }) => t.name)).toEqual(['quadtrap']);
    expect(doc.traps[0].sublevels).toHaveLength(8);
  });

  it('csv: one row per trap and sublevel', () => {
    const rows = cli('trap', FILE, '--format', 'csv').out.split('\n');
    expect(rows[0]).toMatch(/^# sublevel trap: file=/);
    expect(rows[1]!.startsWith('trap,sublevel,two_m,low_field_seeking,trapped,levitation_T_per_m')).toBe(true);
    expect(rows).toHaveLength(2 + 8);
    expect(rows.find((l) => l.startsWith('quadtrap,"F=2, m_F=+2"') || l.startsWith('quadtrap,F=2 m_F=+2'))).toBeDefined();
  });

  it('--trap picks one, with did-you-mean; a file without traps is an error', () => {
    expect(cli('trap', FILE, '--trap', 'quadtrap').code).toBe(0);
    const r = cli('trap', FILE, '--trap', 'quadtrp');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/did you mean 'quadtrap'/);
    const none = cli('trap', 'examples/rubidium-bias.sublevel');
    expect(none.code).toBe(1);
    expect(none.err).toMatch(/the file has no trap/);
  });

  it('eval includes the traps', () => {
    const doc = JSON.parse(cli('eval', FILE, '--format', 'json').out);
    expect(doc.traps[0].name).toBe('quadtrap');
    expect(cli('eval', FILE).out).toContain('trap quadtrap');
  });
});
