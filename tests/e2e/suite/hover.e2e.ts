import * as assert from 'node:assert/strict';
import * as vscode from 'vscode';
import { describe, it } from '../harness';
import { unescapeMarkdown } from '../markdown';
import { exampleUri, extension, openSetup, positionOf, whenInlayHint } from './workspace';

async function hoverText(uri: vscode.Uri, position: vscode.Position): Promise<string> {
  const hovers = await vscode.commands.executeCommand<vscode.Hover[]>('vscode.executeHoverProvider', uri, position);
  const parts = hovers.flatMap((h) => h.contents).map((c) => (typeof c === 'string' ? c : c.value));
  return unescapeMarkdown(parts.join('\n'));
}

export function registerHoverTests(): void {
  describe('hover', () => {
    it('shows g_J for the term symbols of the demo file', async () => {
      const uri = exampleUri('lithium-beam.sublevel');
      const editor = await openSetup('lithium-beam.sublevel');
      await extension().activate(); // the language client has started once this resolves
      // The g_J shown is the evaluation's (measured where known): ask once it is in.
      await whenInlayHint(editor.document, 'g_J');
      const upper = await hoverText(uri, positionOf(editor.document, '2P°3/2'));
      // Landé g_J of ²P₃/₂ is exactly 4/3 with g_s = 2 (Landé formula, textbook value).
      assert.match(upper, /g_J = [\d.]+/, upper);
      assert.match(upper, /4\/3/, upper);
      const ground = await hoverText(uri, positionOf(editor.document, '2S1/2'));
      // An S term has g_J = g_s ≈ 2.0023 (CODATA 2022 |g_e| = 2.00231930436...).
      assert.match(ground, /g_J = 2\.002\d*/, ground);
    });
  });
}
