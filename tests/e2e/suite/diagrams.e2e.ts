import * as assert from 'node:assert/strict';
import * as vscode from 'vscode';
import { describe, it } from '../harness';
import { whenEvent } from './events';
import { openSetup } from './workspace';

function diagramTab(): vscode.Tab | undefined {
  return vscode.window.tabGroups.all
    .flatMap((g) => g.tabs)
    .find((t) => t.input instanceof vscode.TabInputWebview && t.input.viewType.endsWith('sublevel.diagrams'));
}

export function registerDiagramTests(): void {
  describe('diagram panel', () => {
    it('opens beside the setup file when sublevel.showDiagrams runs', async () => {
      await openSetup('lithium-beam.sublevel');
      await vscode.commands.executeCommand('sublevel.showDiagrams');
      const tab = await whenEvent(vscode.window.tabGroups.onDidChangeTabs, diagramTab, 30_000, () =>
        `open tabs: ${vscode.window.tabGroups.all.flatMap((g) => g.tabs.map((t) => t.label)).join(', ')}`,
      );
      assert.equal(tab.label, 'Sublevel diagrams');
      assert.notEqual(tab.group.viewColumn, vscode.window.activeTextEditor?.viewColumn, 'the panel should open beside the editor');
    });
  });
}
