/**
 * What a person does in the VS Code window, as playwright steps on code-server's page: open a
 * file by name, run a command from the palette, go to a line, point at text, read the hover,
 * the Problems view and the editor's lines. Every step waits for what it needs to see.
 */
import { join } from 'node:path';
import type { Frame, Locator, Page } from 'playwright-core';

const STEP_TIMEOUT_MS = 45_000;

export class Workbench {
  constructor(
    readonly page: Page,
    private readonly shotsDir: string,
  ) {
    page.setDefaultTimeout(STEP_TIMEOUT_MS);
  }

  async shot(name: string): Promise<string> {
    const file = join(this.shotsDir, `${name}.png`);
    await this.page.screenshot({ path: file });
    return file;
  }

  /** Parks the mouse on the empty part of the explorer, where it raises no tooltip or hover. */
  private async restMouse(): Promise<void> {
    await this.page.mouse.move(150, 600);
  }

  private quickInput(): Locator {
    return this.page.locator('.quick-input-widget input');
  }

  /** Quick Open (Ctrl+P): type the file name, pick it, wait for its tab. */
  async openFile(name: string): Promise<void> {
    await this.page.keyboard.press('Control+P');
    await this.quickInput().waitFor({ state: 'visible' });
    await this.quickInput().fill(name);
    // Click the matching entry: Enter could still pick a recently opened file while the list filters.
    await this.page.locator('.quick-input-list .monaco-list-row', { hasText: name }).first().click();
    await this.page.locator(`.tab.active[aria-label*="${name}"]`).waitFor();
    await this.restMouse();
    await this.editorLine('').waitFor();
  }

  /** The command palette (F1): type the command's title and run it. */
  async runCommand(title: string): Promise<void> {
    await this.page.keyboard.press('F1');
    await this.quickInput().waitFor({ state: 'visible' });
    await this.quickInput().fill(`>${title}`);
    await this.page.locator('.quick-input-list .monaco-list-row', { hasText: title }).first().click();
    await this.quickInput().waitFor({ state: 'hidden' });
    await this.restMouse();
  }

  /** Go to Line (Ctrl+G) with 1-based line and column. */
  async goTo(line: number, column: number): Promise<void> {
    await this.page.keyboard.press('Control+G');
    await this.quickInput().waitFor({ state: 'visible' });
    // The box opens holding ':' (go to line); keep it, or the text becomes a file search.
    await this.quickInput().fill(`:${line}:${column}`);
    await this.page.keyboard.press('Enter');
    await this.page.locator('.statusbar-item', { hasText: `Ln ${line}, Col ${column}` }).waitFor();
  }

  /** The active editor's rendered line that contains `text`. */
  editorLine(text: string): Locator {
    return this.page.locator('.editor-group-container.active .monaco-editor .view-line', { hasText: text }).first();
  }

  /** Moves the mouse onto `text` in the active editor, as a person pointing at it. */
  async pointAt(text: string): Promise<void> {
    const line = this.editorLine(text);
    await line.waitFor();
    const centre = await line.evaluate((el, wanted) => {
      // Find the text across the line's token spans and measure just that substring.
      const walker = document.createTreeWalker(el, NodeFilter.SHOW_TEXT);
      const pieces: { node: Text; start: number }[] = [];
      let full = '';
      for (let n = walker.nextNode(); n; n = walker.nextNode()) {
        pieces.push({ node: n as Text, start: full.length });
        full += n.textContent ?? '';
      }
      const at = full.indexOf(wanted);
      if (at < 0) return undefined;
      const locate = (pos: number): [Text, number] => {
        const p = pieces.find((q) => pos >= q.start && pos <= q.start + (q.node.textContent ?? '').length) ?? pieces[0];
        return [p.node, pos - p.start];
      };
      const range = document.createRange();
      range.setStart(...locate(at));
      range.setEnd(...locate(at + wanted.length));
      const box = range.getBoundingClientRect();
      return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
    }, text);
    if (!centre) throw new Error(`'${text}' is not on the rendered line`);
    await this.page.mouse.move(centre.x - 30, centre.y + 40);
    await this.page.mouse.move(centre.x, centre.y, { steps: 5 });
  }

  /**
   * Point at `text` until a hover containing `expected` shows: the editor may redraw the line (inlay
   * hints arriving) under a resting pointer, and then no hover opens, so point again up to three times.
   */
  async hoverAt(text: string, expected: string): Promise<string> {
    for (let attempt = 1; ; attempt++) {
      await this.pointAt(text);
      const hover = this.page.locator('.monaco-hover:visible', { hasText: expected }).first();
      try {
        await hover.waitFor({ timeout: 12_000 });
        return await hover.innerText();
      } catch (e) {
        if (attempt >= 3) throw e;
        await this.page.mouse.move(5, 5);
      }
    }
  }

  /** Problems view rows (Ctrl+Shift+M) once a row mentions every one of `codes`. */
  async problems(codes: readonly string[]): Promise<string[]> {
    await this.page.keyboard.press('Control+Shift+M');
    const rows = this.page.locator('.markers-panel .monaco-list-row');
    for (const code of codes) await rows.filter({ hasText: code }).first().waitFor();
    return rows.allInnerTexts();
  }

  /** Quick Fix menu (Ctrl+.) at the cursor: picks the entry whose label contains `label`. */
  async applyQuickFix(label: string): Promise<void> {
    const entry = this.page.locator('.action-widget .monaco-list-row', { hasText: label }).first();
    // The menu lists what the server had when it opened: before the diagnostics for this line have
    // arrived it is empty and closes, so ask again (as a person would) until the fix is there.
    for (let attempt = 1; ; attempt++) {
      await this.page.keyboard.press('Control+.');
      try {
        await entry.waitFor({ timeout: 5_000 });
        break;
      } catch (e) {
        if (attempt >= 5) throw e;
        await this.page.keyboard.press('Escape');
      }
    }
    await entry.click();
    await entry.waitFor({ state: 'hidden' });
  }

  /** The frame of the first webview panel's content (webviews nest two iframes deep). */
  async webviewContent(): Promise<Frame> {
    const outer = await this.page.locator('iframe.webview.ready').first().elementHandle();
    const outerFrame = await outer?.contentFrame();
    if (!outerFrame) throw new Error('no webview frame');
    const inner = await outerFrame.locator('iframe#active-frame').elementHandle();
    const innerFrame = await inner?.contentFrame();
    if (!innerFrame) throw new Error('no webview content frame');
    return innerFrame;
  }
}
