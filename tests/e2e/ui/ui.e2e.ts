/**
 * The extension as a person meets it after installing the .vsix into code-server: colours and
 * language mode, a hover with g_J, the planted problems in the Problems view, a quick fix, and
 * the diagram panel's SVG. Screenshots of each step go to the shots folder.
 */
import * as assert from 'node:assert/strict';
import { describe, it } from '../harness';
import { PLANTED } from '../planted';
import type { Workbench } from './workbench';

const DEMO = 'lithium-beam.sublevel';
const MISTAKES = 'mistakes.sublevel';
/**
 * Well above one step's deadline (STEP_TIMEOUT_MS, workbench.ts), so that a step that never
 * happens fails with its own message: at load 20–30 on the 2-core machine opening the first file
 * of a fresh workbench took 76–98 s.
 */
const UI_TEST_TIMEOUT_MS = 300_000;

export function registerUiTests(wb: () => Workbench): void {
  describe('in the browser window', () => {
    it('opens the demo file in the Sublevel language mode', async () => {
      await wb().openFile(DEMO);
      // The language's name from the manifest, shown in the status bar.
      await wb().page.locator('.statusbar-item', { hasText: 'Sublevel setup' }).waitFor();
      await wb().shot('1-demo-open');
    }, UI_TEST_TIMEOUT_MS);

    it('shows g_J when pointing at a term symbol', async () => {
      // The inlay hint comes from the server's evaluation of this version: the hover's g_J is in.
      await wb().editorLine('g_J 1.3').waitFor();
      const text = await wb().hoverAt('2P°3/2', 'g_J');
      await wb().shot('2-hover-term');
      assert.match(text, /g_J = [\d.]+/, text);
      // Landé g_J of ²P₃/₂ is exactly 4/3 with g_s = 2 (Landé formula, textbook value).
      assert.match(text, /4\/3/, text);
      await wb().page.keyboard.press('Escape');
    }, UI_TEST_TIMEOUT_MS);

    it('lists the planted mistakes of mistakes.sublevel in the Problems view', async () => {
      await wb().openFile(MISTAKES);
      const rows = await wb().problems(PLANTED.map((p) => p.code));
      await wb().shot('3-problems');
      for (const p of PLANTED) {
        const row = rows.find((r) => r.includes(p.code) && r.includes(`[Ln ${p.line}, Col ${p.column}]`));
        assert.ok(row, `no Problems row for ${p.code} at line ${p.line}, column ${p.column}`);
      }
    }, UI_TEST_TIMEOUT_MS);

    it("replaces 'uper' by 'upper' with the quick fix", async () => {
      await wb().openFile(MISTAKES);
      await wb().goTo(17, 21);
      await wb().problemMarkedOn('line D1:');
      await wb().applyQuickFix("'upper'");
      // The edit reaches the rendered line a moment after the menu closes.
      const line = (await wb().editorLine('line D1: ground -> upper').innerText()).replace(/\u00a0/g, ' ');
      await wb().shot('4-quick-fix-applied');
      assert.match(line, /^line D1: ground -> upper\s+#/, line);
    }, UI_TEST_TIMEOUT_MS);

    it('draws the levels diagram as SVG in the diagram panel', async () => {
      await wb().openFile(DEMO);
      await wb().runCommand('Sublevel: Show Diagrams');
      const content = await wb().webviewContent();
      const svg = content.locator('svg[data-view="levels"]');
      await svg.waitFor();
      const curves = await svg.locator('[data-kind="curve"]').count();
      const title = (await svg.locator('title').first().textContent()) ?? '';
      await wb().shot('5-diagram-panel');
      // Li7 ground level: I = 3/2, J = 1/2, so (2I+1)(2J+1) = 8 sublevel curves.
      assert.equal(curves, 8, `curves drawn: ${curves}`);
      assert.match(title, /Li7/, title);
    }, UI_TEST_TIMEOUT_MS);
  });
}
