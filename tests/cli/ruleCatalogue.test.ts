/**
 * The rule catalogue behind SARIF rules lists every code: the physics modules raise theirs as
 * string values, so their sources are read for the code literals they pass to their issue makers.
 */
import * as fs from 'fs';
import * as path from 'path';
import { describe, expect, it } from 'vitest';
import { ruleCatalogue } from '../../server/src/cli/sarif/ruleCatalogue';
import { PHYSICS_RULES } from '../../server/src/physics/issueCodes';

function sources(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? sources(path.join(dir, e.name)) : e.name.endsWith('.ts') ? [path.join(dir, e.name)] : []));
}

/**
 * `issue('warning', 'code'`, `beamIssue('error', 'code'`, `finding('info', 'code'`, `issue('code'`, `fail('code'`,
 * and a trap finding carried as figures, `figureIssue('info', { code: 'code'`, over line breaks.
 */
const RAISED = /\b(?:issue|beamIssue|finding|fail|figureIssue)\(\s*(?:'(error|warning|info)',\s*)?(?:\{\s*code:\s*)?'([a-z][a-z0-9]*(?:-[a-z0-9]+)+)'/g;

function raisedCodes(): Map<string, string | undefined> {
  const out = new Map<string, string | undefined>();
  for (const file of sources('server/src/physics')) {
    for (const m of fs.readFileSync(file, 'utf8').matchAll(RAISED)) out.set(m[2]!, m[1] ?? out.get(m[2]!));
  }
  return out;
}

describe('rule catalogue', () => {
  const raised = raisedCodes();
  const catalogue = new Map(ruleCatalogue().map((r) => [r.id, r]));

  it('finds the physics codes in the sources (the scan itself works)', () => {
    expect(raised.get('line-delta-j')).toBe('error');
    expect(raised.get('beam-no-gradient')).toBe('info');
    expect(raised.has('term-j-out-of-range')).toBe(true);
    expect(raised.size).toBeGreaterThan(80);
  });

  it('lists every code the physics modules raise, with the severity they raise it at', () => {
    const missing = [...raised.keys()].filter((c) => !catalogue.has(c));
    expect(missing).toEqual([]);
    const disagree = [...raised].filter(([c, sev]) => sev !== undefined && catalogue.get(c)!.severity !== sev).map(([c]) => c);
    expect(disagree).toEqual([]);
  });

  it('lists no physics code that nothing raises', () => {
    expect(Object.keys(PHYSICS_RULES).filter((c) => !raised.has(c))).toEqual([]);
  });

  it('has one entry per code, each with a summary and help', () => {
    expect(new Set(ruleCatalogue().map((r) => r.id)).size).toBe(ruleCatalogue().length);
    for (const r of ruleCatalogue()) {
      expect(r.summary, r.id).toMatch(/\.$/);
      expect(r.help, r.id).toMatch(/\S/);
    }
    expect(catalogue.get('syntax-missing-equals')!.help).toContain('docs/format.md');
    expect(catalogue.get('beam-unresolved')!.help).toContain('docs/beam.md');
    expect(catalogue.get('solver-failed')!.help).toContain('docs/engine.md');
  });
});

describe('rule catalogue: field sources', () => {
  it('lists the winding checks with help that points to docs/fields.md', () => {
    const catalogue = new Map(ruleCatalogue().map((r) => [r.id, r]));
    expect(catalogue.get('coil-needs-cooling')).toMatchObject({ severity: 'info' });
    expect(catalogue.get('coil-overheats')).toMatchObject({ severity: 'warning' });
    expect(catalogue.get('coil-overheats')!.help).toContain('docs/fields.md');
  });
});
