/**
 * README's "Cautions" section says which results repeat a safety reminder; the bundled examples
 * show each one in the `eval` report (text and JSON), and `trap`/`slower` print theirs.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { cli } from './runCli';

const README = readFileSync('README.md', 'utf8');

/** The `- ` reminder lines under each `cautions:` heading and the `caution:` lines of a text report. */
function cautionLines(report: string): string[] {
  return report.split('\n').filter((l) => /^\s+(- |caution: )/.test(l) && /lab|safety/.test(l)).map((l) => l.trim());
}

describe('the cautions appear where the README says', () => {
  it('the README names each kind of hardware whose result carries a reminder', () => {
    const section = README.split('## Cautions')[1]!.split('\n## ')[0]!.replace(/\s+/g, ' ');
    for (const words of ['**beam**', 'strong magnet', 'hot oven', 'cryogenic source', 'alkali metal', 'vacuum', '**coil, solenoid, wire or slab**', 'heating', 'permanent magnet', '**trap**', '**slower**', 'laser']) {
      expect(section, words).toContain(words);
    }
  });

  it('a beam: strong magnet, hot oven, alkali metal, vacuum (lithium-beam)', () => {
    const lines = cautionLines(cli('eval', 'examples/lithium-beam.sublevel').out);
    expect(lines.map((l) => /^- ([A-Z][a-z]+( [a-z]+)?)/.exec(l)?.[1])).toEqual(['Strong magnet', 'Hot oven', 'Alkali metal', 'Vacuum']);
  });

  it('field sources: coil heating, a field above the implant limit, a permanent magnet (coils-and-wires)', () => {
    const report = cli('eval', 'examples/coils-and-wires.sublevel').out;
    expect(report).toMatch(/- Coil heating \(181 W at 13\.26 A\/mm², 12\.07 V\)/);
    expect(report).toMatch(/- Field above the 5 G implant limit/);
    expect(report).toMatch(/- Permanent magnet \(μ0·M = 1\.2 T\)/);
    const json = JSON.parse(cli('eval', 'examples/coils-and-wires.sublevel', '--format', 'json').out) as { fieldSources: { cautions: string[] }[] };
    expect(json.fieldSources.every((s) => s.cautions.length > 0)).toBe(true);
  });

  it('a trap: coil heat and the switch-off voltage, in eval and in `sublevel trap`', () => {
    for (const argv of [['eval', 'examples/quadrupole-trap.sublevel'], ['trap', 'examples/quadrupole-trap.sublevel']]) {
      const lines = cautionLines(cli(...argv).out).filter((l) => l.startsWith('caution: '));
      expect(lines.map((l) => l.slice(9, 30)), argv[0]).toEqual(['Trap coils dissipate ', 'Switching a high coil']);
    }
  });

  it('a slower: its laser and its coils, in eval and in `sublevel slower`', () => {
    for (const argv of [['eval', 'examples/sodium-slower.sublevel'], ['slower', 'examples/sodium-slower.sublevel']]) {
      const report = cli(...argv).out;
      expect(report, argv[0]).toMatch(/- Slowing laser at 589 nm: .*eye hazard/);
      expect(report, argv[0]).toMatch(/- Slower coils for up to 558 G: /);
    }
  });
});
