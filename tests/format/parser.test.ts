/**
 * Table tests for the parser: source text → tree summary and problems (code + range as
 * line:col-line:col, 0-based). Covers every form in docs/format.md.
 */
import { describe, expect, it } from 'vitest';
import { parseSetup } from '../../server/src/format/parser';
import { formatRange } from '../../server/src/format/positions';
import { problemSummary, treeSummary } from './summary';

interface Case {
  name: string;
  text: string;
  tree?: string[];
  problems: string[];
}

const lines = (...l: string[]): string => l.join('\n');

const CASES: Case[] = [
  {
    name: 'the example at the top of docs/format.md',
    text: lines(
      '# Sodium beam through a short state-selecting magnet (invented demo numbers)',
      'species Na23                          # built-in data: mass, nuclear spin, g_I, ground and P levels',
      '  level ground: 3s 2S1/2              # A and g_J come from the built-in table',
      '  level upper:  3p 2P°3/2  A = 18.53 MHz  B = 2.72 MHz',
      '',
      'field bias = 3.2 G',
      '',
      'magnet selector',
      '  field    = 0.45 T',
      '  gradient = 180 T/m',
      '  length   = 8 cm',
      '',
      'line D2: ground -> upper',
    ),
    tree: [
      'species Na23',
      '  level ground: 3s 2S1/2',
      '  level upper: 3p 2P°3/2 {A=q:18.53|MHz B=q:2.72|MHz}',
      'field bias = q:3.2|G',
      'magnet selector',
      '  field=q:0.45|T',
      '  gradient=q:180|T/m',
      '  length=q:8|cm',
      'line D2: ground -> upper',
    ],
    problems: [],
  },
  {
    name: 'the example in the product brief',
    text: lines(
      '# Lithium-7 beam through a state-selecting magnet (invented demo scenario)',
      'species Li7                       # built-in data: mass, nuclear spin, nuclear g',
      '  level ground: 2s 2S1/2  A = 401.75 MHz',
      '  level upper:  2p 2P3/2  A = -3.06 MHz  B = -0.22 MHz',
      '',
      'magnet selector',
      '  field    = 0.45 T',
      '  gradient = 180 T/m',
      '  length   = 8 cm',
      '',
      'beam',
      '  source   = oven 720 K',
      '  slits    = 80 um, 50 um  apart 40 cm',
      '  drift    = 35 cm',
      '  detector = 25 um',
      '',
      'line D2: ground -> upper',
      '',
    ),
    tree: [
      'species Li7',
      '  level ground: 2s 2S1/2 {A=q:401.75|MHz}',
      '  level upper: 2p 2P3/2 {A=q:-3.06|MHz B=q:-0.22|MHz}',
      'magnet selector',
      '  field=q:0.45|T',
      '  gradient=q:180|T/m',
      '  length=q:8|cm',
      'beam',
      '  source=w:oven q:720|K',
      '  slits=q:80|um, q:50|um w:apart q:40|cm',
      '  drift=q:35|cm',
      '  detector=q:25|um',
      'line D2: ground -> upper',
    ],
    problems: [],
  },
  {
    name: 'species settings, level settings on the next lines, and a species key after a level',
    text: lines(
      'species Xq',
      '  mass = 86.909 u',
      '  I = 3/2',
      '  level g: 5s 2S1/2',
      '    A = 3417.34 MHz',
      '    g_J = 2.00233',
      '  g_I = -0.000995',
      '  mu_I = 2.75 muN',
      '  level e: 5p 2P3/2',
      '    energy = 12816.5 cm^-1',
    ),
    tree: [
      'species Xq',
      '  level g: 5s 2S1/2 {A=q:3417.34|MHz g_J=n:2.00233}',
      '  level e: 5p 2P3/2 {energy=q:12816.5|cm^-1}',
      '  mass=q:86.909|u',
      '  I=n:3/2',
      '  g_I=n:-0.000995',
      '  mu_I=q:2.75|muN',
    ],
    problems: [],
  },
  {
    name: 'a block word directly followed by = is a setting (field inside a magnet; species, level, magnet inside a beam)',
    text: lines(
      'magnet m1',
      '  field = 0.45 T',
      'beam b1',
      '  species = Li7',
      '  level=ground',
      '  magnet = m1',
      '  source = jet 1500 m/s spread 8 %',
    ),
    tree: [
      'magnet m1',
      '  field=q:0.45|T',
      'beam b1',
      '  species=w:Li7',
      '  level=w:ground',
      '  magnet=w:m1',
      '  source=w:jet q:1500|m/s w:spread q:8|%',
    ],
    problems: [],
  },
  {
    name: 'headers: beam without a name, settings block, line with qualified levels and a Unicode arrow',
    text: lines(
      'beam',
      '  source = speed 800 m/s',
      'settings',
      '  g_s = exact',
      '  reduced_mass = on',
      'line L1: Na23.ground → Na23.upper',
    ),
    tree: [
      'beam',
      '  source=w:speed q:800|m/s',
      'settings',
      '  g_s=w:exact',
      '  reduced_mass=w:on',
      'line L1: Na23.ground -> Na23.upper',
    ],
    problems: [],
  },
  {
    name: 'several settings on one line, no spaces around =, glued units',
    text: lines('species S', '  level a: 2S1/2 A=401.75MHz B=-0.22MHz', '  mass=7u  I=3/2'),
    tree: ['species S', '  level a: 2S1/2 {A=q:401.75|MHz B=q:-0.22|MHz}', '  mass=q:7|u', '  I=n:3/2'],
    problems: [],
  },
  {
    name: 'designations are kept raw with configurations and Unicode term symbols',
    text: lines(
      'species S',
      '  level a: [Ne] 3s 2S1/2',
      '  level b: ²P₃/₂',
      '  level c: 4f7 6s2 8S7/2   g_J = 1.9',
      '  level d:1s2.2s 3P0',
      '  level e: 2Po3/2',
    ),
    tree: [
      'species S',
      '  level a: [Ne] 3s 2S1/2',
      '  level b: ²P₃/₂',
      '  level c: 4f7 6s2 8S7/2 {g_J=n:1.9}',
      '  level d: 1s2.2s 3P0',
      '  level e: 2Po3/2',
    ],
    problems: [],
  },

  // ---- problems ---------------------------------------------------------------------------
  {
    name: 'a misspelt block word gets a suggestion; the lines under it are not pinned on the previous block',
    text: lines('magnet m1', '  length = 8 cm', 'magent selector', '  gradient = 180 T/m', 'field bias = 1 G'),
    tree: ['magnet m1', '  length=q:8|cm', 'field bias = q:1|G'],
    problems: ['syntax-unknown-statement 2:0-2:6'],
  },
  {
    name: 'a misspelt setting key in a magnet block: gradiant → gradient',
    text: lines('magnet m1', '  gradiant = 180 T/m', '  length = 8 cm'),
    tree: ['magnet m1', '  length=q:8|cm'],
    problems: ['syntax-unknown-key 1:2-1:10'],
  },
  {
    name: 'keys are case-sensitive: a wrong-case key is refused with a suggestion',
    text: lines('species S', '  level g: 2S1/2', '  a = 400 MHz', '  g_j = 2'),
    tree: ['species S', '  level g: 2S1/2'],
    problems: ['syntax-unknown-key 2:2-2:3', 'syntax-unknown-key 3:2-3:5'],
  },
  {
    name: 'a setting before any block, and a level outside a species block',
    text: lines('field = 0.45 T', 'magnet m', '  level g: 2S1/2', '  field = 1 T'),
    tree: ['magnet m', '  field=q:1|T'],
    problems: ['syntax-outside-block 0:0-0:5', 'syntax-level-outside-species 2:2-2:7'],
  },
  {
    name: 'a level key in a species block before any level',
    text: lines('species S', '  A = 400 MHz', '  level g: 2S1/2'),
    tree: ['species S', '  level g: 2S1/2'],
    problems: ['syntax-unknown-key 1:2-1:3'],
  },
  {
    name: 'a species key on a level line is refused; the rest of the line is kept',
    text: lines('species S', '  level g: 2S1/2  mass = 7 u  A = 1 MHz'),
    tree: ['species S', '  level g: 2S1/2 {A=q:1|MHz}'],
    problems: ['syntax-unknown-key 1:18-1:22'],
  },
  {
    name: 'a duplicate setting: warning on the second, the first value is kept',
    text: lines('magnet m', '  field = 1 T', '  field = 2 T', 'species S', '  level g: 2S1/2 A = 1 MHz', '    A = 2 MHz'),
    tree: ['magnet m', '  field=q:1|T', 'species S', '  level g: 2S1/2 {A=q:1|MHz}'],
    problems: ['syntax-duplicate-setting 2:2-2:7', 'syntax-duplicate-setting 5:4-5:5'],
  },
  {
    name: 'a missing = (and : written for =) in a block that takes the key',
    text: lines('magnet m', '  gradient 180 T/m', '  length: 8 cm'),
    tree: ['magnet m', '  gradient~q:180|T/m', '  length~q:8|cm'],
    problems: ['syntax-missing-equals 1:2-1:10', 'syntax-missing-equals 2:8-2:9'],
  },
  {
    name: 'a field header without = keeps its value',
    text: 'field bias 3.2 G',
    tree: ['field bias = q:3.2|G'],
    problems: ['syntax-missing-equals 0:11-0:14'],
  },
  {
    name: 'a missing colon after a level name and after a line name; a missing arrow',
    text: lines('species S', '  level g 2S1/2', 'line L1 g -> e', 'line L2: g e'),
    tree: ['species S', '  level g: 2S1/2', 'line L1: g -> e', 'line L2: g ? e'],
    problems: ['syntax-missing-colon 1:10-1:15', 'syntax-missing-colon 2:8-2:9', 'syntax-missing-arrow 3:10-3:11'],
  },
  {
    name: 'text after a header, a field with two values, settings on a header line',
    text: lines('magnet m extra words', 'field f = 1 G gradient = 2 T/m', 'species S mass = 7 u', 'settings now'),
    tree: ['magnet m', 'field f = q:1|G', 'species S', 'settings'],
    problems: [
      'syntax-unexpected-text 0:9-0:20',
      'syntax-unexpected-text 1:14-1:30',
      'syntax-unexpected-text 2:10-2:20',
      'syntax-unexpected-text 3:9-3:12',
    ],
  },
  {
    name: 'an empty list item, a trailing comma, a bad number, a stray colon in a value',
    text: lines('beam', '  slits = 80 um,, 50 um', '  drift = 35 cm,', '  detector = 1/0', '  magnet = a : b'),
    tree: ['beam', '  slits=q:80|um, q:50|um', '  drift=q:35|cm', '  detector=w:1/0', '  magnet=w:a w:b'],
    problems: [
      'syntax-empty-item 1:16-1:17',
      'syntax-empty-item 2:15-2:16',
      'syntax-bad-number 3:13-3:16',
      'syntax-unexpected-text 4:13-4:14',
    ],
  },
  {
    name: 'settings in blocks that take none',
    text: lines('field f = 1 G', '  gradient = 2 T/m', 'line L: a -> b', '  width = 3'),
    tree: ['field f = q:1|G', 'line L: a -> b'],
    problems: ['syntax-unknown-key 1:2-1:10', 'syntax-unknown-key 3:2-3:7'],
  },
  {
    name: 'an unknown word with no close keyword, and a line that starts with =',
    text: lines('magnet m', '  zzzzzz 12', '  = 3 T', '  field = 1 T'),
    tree: ['magnet m', '  field=q:1|T'],
    problems: ['syntax-unknown-statement 1:2-1:8', 'syntax-unexpected-text 2:2-2:7'],
  },
  {
    name: 'a misspelt level line: its continuation settings are not pinned on the previous level',
    text: lines('species S', '  level g: 2S1/2 A = 1 MHz', '  levle e: 2P3/2', '    A = 2 MHz', '  level f: 2P1/2', '    A = 3 MHz'),
    tree: ['species S', '  level g: 2S1/2 {A=q:1|MHz}', '  level f: 2P1/2 {A=q:3|MHz}'],
    problems: ['syntax-unknown-statement 2:2-2:7'],
  },
  {
    name: 'recovery: one bad line between good ones',
    text: lines('magnet m', '  field = 0.45 T', '  ### not a comment? yes it is', '  @@@ = = 3', '  gradient = 180 T/m', '  length = 8 cm'),
    tree: ['magnet m', '  field=q:0.45|T', '  gradient=q:180|T/m', '  length=q:8|cm'],
    problems: ['syntax-unknown-key 3:2-3:5'],
  },
  {
    name: 'recovery: a line of junk punctuation',
    text: lines('species S', '  level g: 2S1/2', '  ) ( ] [ -> , :', '    A = 1 MHz'),
    tree: ['species S', '  level g: 2S1/2 {A=q:1|MHz}'],
    problems: ['syntax-unknown-statement 2:2-2:3'],
  },
];

describe('parser: table of forms and problems', () => {
  for (const c of CASES) {
    it(c.name, () => {
      const doc = parseSetup(c.text);
      expect(problemSummary(doc)).toEqual(c.problems);
      if (c.tree) expect(treeSummary(doc)).toEqual(c.tree);
    });
  }
});

describe('parser: details', () => {
  it('suggestions and messages for misspelt words', () => {
    const doc = parseSetup(lines('magent selector', 'magnet m', '  gradiant = 1 T/m', 'species S', '  level g: 2S1/2', '  a = 1 MHz'));
    const [p0, p1, p2] = doc.problems;
    expect(p0?.data?.suggestions).toEqual(['magnet']);
    expect(p0?.message).toBe("unknown statement 'magent' — did you mean 'magnet'?");
    expect(p1?.data?.suggestions).toEqual(['gradient']);
    expect(p1?.message).toContain("did you mean 'gradient'?");
    expect(p2?.data?.suggestions).toEqual(['A']);
  });

  it('a duplicate points back to the first setting', () => {
    const doc = parseSetup(lines('magnet m', '  field = 1 T  # first', '  field = 2 T'));
    const dup = doc.problems[0]!;
    expect(dup.severity).toBe('warning');
    expect(dup.message).toContain('line 2');
    expect(dup.related?.map((r) => formatRange(r.range))).toEqual(['1:2-1:13']);
  });

  it('comments: own-line flag, trailing comments, # glued to a value, ranges and text', () => {
    const doc = parseSetup(lines('# head', 'magnet m # trailing', '  field = 1 T#glued', '   # indented own-line'));
    expect(doc.comments.map((c) => [c.text, formatRange(c.range), c.ownLine])).toEqual([
      ['# head', '0:0-0:6', true],
      ['# trailing', '1:9-1:19', false],
      ['#glued', '2:13-2:19', false],
      ['# indented own-line', '3:3-3:22', true],
    ]);
    expect(treeSummary(doc)).toEqual(['magnet m', '  field=q:1|T']);
  });

  it('ranges: key, =, value text, setting, level (with continuation lines), block and header', () => {
    const text = lines('species S   # c', '  level g: 3p 2P3/2  A = 1 MHz', '    B = 2 MHz', '  mass = 7 u', '');
    const doc = parseSetup(text);
    const block = doc.blocks[0]!;
    const level = block.levels[0]!;
    const a = level.settings[0]!;
    expect(formatRange(block.headerRange)).toBe('0:0-0:9');
    expect(formatRange(block.range)).toBe('0:0-3:12');
    expect(formatRange(level.range)).toBe('1:2-2:13');
    expect(level.name?.text).toBe('g');
    expect(formatRange(level.designation!.range)).toBe('1:11-1:19');
    expect(formatRange(a.key.range)).toBe('1:21-1:22');
    expect(formatRange(a.equals!)).toBe('1:23-1:24');
    expect(a.valueText.text).toBe('1 MHz');
    expect(formatRange(a.valueText.range)).toBe('1:25-1:30');
    expect(formatRange(a.range)).toBe('1:21-1:30');
    const part = a.groups[0]![0]!;
    expect(part.kind).toBe('quantity');
    if (part.kind === 'quantity') expect(formatRange(part.unit.range)).toBe('1:27-1:30');
  });

  it('a line header: name, arrow and qualified names with their ranges', () => {
    const doc = parseSetup('line D1: Na23.g -> e');
    const link = doc.blocks[0]!.link!;
    expect(link.from?.qualifier?.text).toBe('Na23');
    expect(link.from?.name.text).toBe('g');
    expect(formatRange(link.from!.name.range)).toBe('0:14-0:15');
    expect(formatRange(link.from!.range)).toBe('0:9-0:15');
    expect(link.from?.text).toBe('Na23.g');
    expect(formatRange(link.arrow!)).toBe('0:16-0:18');
    expect(link.to?.qualifier).toBeUndefined();
    expect(link.to?.text).toBe('e');
  });

  it('an empty value keeps the setting with no groups (the model reports it)', () => {
    const doc = parseSetup(lines('magnet m', '  field =', '  length ='));
    expect(doc.problems).toEqual([]);
    const [f, l] = doc.blocks[0]!.settings;
    expect(f?.groups).toEqual([]);
    expect(f?.valueText.text).toBe('');
    expect(formatRange(f!.valueText.range)).toBe('1:9-1:9');
    expect(l?.key.text).toBe('length');
  });

  it('names left out are absent, not invented (the model reports them)', () => {
    const doc = parseSetup(lines('species', 'magnet', 'field', 'line', 'species S', '  level : 2S1/2', '  level'));
    expect(doc.problems).toEqual([]);
    expect(doc.blocks.map((b) => b.name?.text)).toEqual([undefined, undefined, undefined, undefined, 'S']);
    expect(doc.blocks[4]!.levels.map((l) => [l.name?.text, l.designation?.text])).toEqual([
      [undefined, '2S1/2'],
      [undefined, undefined],
    ]);
  });
});

describe('parser: text encodings and line ends', () => {
  const base = ['magnet m', '\tfield = 0.45 T', '\tgradient = 180 T/m'];

  it('CRLF gives the same tree and the same ranges as LF', () => {
    const lf = parseSetup(base.join('\n') + '\n');
    const crlf = parseSetup(base.join('\r\n') + '\r\n');
    expect(treeSummary(crlf)).toEqual(treeSummary(lf));
    expect(crlf.blocks).toEqual(lf.blocks);
    expect(crlf.lineStarts).toEqual([0, 10, 27, 48]);
  });

  it('a lone CR ends a line too', () => {
    const doc = parseSetup(base.join('\r'));
    expect(treeSummary(doc)).toEqual(['magnet m', '  field=q:0.45|T', '  gradient=q:180|T/m']);
    expect(formatRange(doc.blocks[0]!.settings[1]!.range)).toBe('2:1-2:19');
  });

  it('a byte-order mark is skipped but counted in positions; no final newline is fine', () => {
    const doc = parseSetup('\uFEFF' + base.join('\n'));
    expect(doc.problems).toEqual([]);
    expect(formatRange(doc.blocks[0]!.keyword.range)).toBe('0:1-0:7');
    expect(treeSummary(doc)).toEqual(['magnet m', '  field=q:0.45|T', '  gradient=q:180|T/m']);
  });

  it('positions are UTF-16 code units (a character outside the BMP counts 2)', () => {
    const doc = parseSetup('species 𝔛 # 𝔛\nmagnet m');
    expect(doc.blocks[0]!.name?.text).toBe('𝔛');
    expect(formatRange(doc.blocks[0]!.name!.range)).toBe('0:8-0:10');
    expect(formatRange(doc.comments[0]!.range)).toBe('0:11-0:15');
  });

  it('a very long line parses in linear time and keeps exact ranges', () => {
    const lineOf = (n: number) => Array.from({ length: n }, (_, i) => `${i} um`).join(', ');
    const values = lineOf(20000);
    const doc = parseSetup(`beam\n  slits = ${values}\n  drift = 1 m`);
    expect(doc.problems).toEqual([]);
    const slits = doc.blocks[0]!.settings[0]!;
    expect(slits.groups.length).toBe(20000);
    expect(slits.valueText.text).toBe(values);
    expect(doc.blocks[0]!.settings[1]!.key.text).toBe('drift');
    // Linear, not quadratic: four times the values cost about 4× the time when linear and 16× when
    // quadratic. Both sizes are large (a small line runs in the young generation's spare room and
    // costs several times less per value: measured 0.4–1.3 µs a value at 2,500–10,000, 3–8 µs from
    // 20,000 on), so the ratio compares like with like. Best of three runs each, alternating.
    const timeOnce = (text: string) => { const t0 = performance.now(); parseSetup(text); return performance.now() - t0; };
    const smallText = `beam\n  slits = ${lineOf(20000)}\n`;
    const largeText = `beam\n  slits = ${lineOf(80000)}\n`;
    let small = Infinity, large = Infinity;
    for (let run = 0; run < 3; run++) { small = Math.min(small, timeOnce(smallText)); large = Math.min(large, timeOnce(largeText)); }
    expect(large / small).toBeLessThan(10);
  });

  it('an empty document and a blank document', () => {
    for (const t of ['', '\n\n', '   \t  ', '\uFEFF']) {
      const doc = parseSetup(t);
      expect(doc.blocks).toEqual([]);
      expect(doc.problems).toEqual([]);
    }
  });
});
