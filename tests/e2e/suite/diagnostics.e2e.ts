import * as assert from 'node:assert/strict';
import * as vscode from 'vscode';
import { describe, it } from '../harness';
import { PLANTED } from '../planted';
import { codeOf, exampleUri, openSetup, whenDiagnostics } from './workspace';

const SEVERITY = { error: vscode.DiagnosticSeverity.Error, warning: vscode.DiagnosticSeverity.Warning } as const;

export function registerDiagnosticsTests(): void {
  describe('diagnostics', () => {
    it('reports every planted mistake of mistakes.sublevel with its code, place and severity', async () => {
      const uri = exampleUri('mistakes.sublevel');
      await openSetup('mistakes.sublevel');
      // Parse problems come first and the evaluation's later: wait until all are in.
      const ds = await whenDiagnostics(uri, (all) => (PLANTED.every((p) => all.some((d) => codeOf(d) === p.code)) ? all : undefined));
      for (const p of PLANTED) {
        const d = ds.find((x) => codeOf(x) === p.code && x.range.start.line + 1 === p.line);
        assert.ok(d, `${p.code} not on line ${p.line}`);
        assert.equal(d.range.start.character + 1, p.column, `${p.code} column`);
        assert.equal(d.severity, SEVERITY[p.severity], `${p.code} severity`);
        assert.equal(d.source, 'sublevel', `${p.code} source`);
      }
      const serious = ds.filter((d) => d.severity === vscode.DiagnosticSeverity.Error || d.severity === vscode.DiagnosticSeverity.Warning);
      assert.deepEqual(serious.map((d) => `${d.range.start.line + 1}:${codeOf(d)}`).sort(), PLANTED.map((p) => `${p.line}:${p.code}`).sort());
    });
  });
}
