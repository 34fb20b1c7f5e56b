import * as assert from 'node:assert/strict';
import * as vscode from 'vscode';
import { describe, it } from '../harness';
import { codeOf, exampleUri, openSetup, whenDiagnostics } from './workspace';

const isAction = (a: vscode.CodeAction | vscode.Command): a is vscode.CodeAction => !('command' in a && typeof a.command === 'string');

export function registerQuickFixTests(): void {
  describe('quick fix', () => {
    it("offers 'upper' for the unknown level name 'uper', and applying it changes the line", async () => {
      const uri = exampleUri('mistakes.sublevel');
      const editor = await openSetup('mistakes.sublevel');
      const problem = await whenDiagnostics(uri, (ds) => ds.find((d) => codeOf(d) === 'name-unknown'));
      const actions = await vscode.commands.executeCommand<(vscode.CodeAction | vscode.Command)[]>(
        'vscode.executeCodeActionProvider',
        uri,
        problem.range,
        vscode.CodeActionKind.QuickFix.value,
      );
      const fix = actions.filter(isAction).find((a) => a.title.includes("'upper'"));
      assert.ok(fix?.edit, `no quick fix with an edit mentions 'upper'; offered: ${actions.map((a) => a.title).join(' | ')}`);
      try {
        assert.equal(await vscode.workspace.applyEdit(fix.edit), true);
        const line = editor.document.lineAt(problem.range.start.line).text;
        assert.match(line, /^line D1: ground -> upper\s+#/, line);
        // The problem goes away once the server has seen the change.
        await whenDiagnostics(uri, (ds) => (ds.some((d) => codeOf(d) === 'name-unknown') ? undefined : true));
      } finally {
        await vscode.window.showTextDocument(editor.document);
        await vscode.commands.executeCommand('workbench.action.files.revert');
      }
    });
  });
}
