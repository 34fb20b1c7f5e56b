/**
 * What a person does in the VS Code window, as playwright steps on code-server's page: open a
 * file from the Explorer, run a command from the palette, go to a line, point at text, read the
 * hover, the Problems view and the editor's lines. Every step waits for a state it can see, once,
 * with a deadline; none tries again.
 */
import { join } from 'node:path';
import type { Frame, Locator, Page } from 'playwright-core';

/** A step's deadline: at load 30 on the 2-core machine a file's first line took 60 s to render after its tab opened. */
const STEP_TIMEOUT_MS = 90_000;
/** The rendered lines of the active editor. */
const EDITOR_LINE = '.editor-group-container.active .monaco-editor .view-line';

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

  /**
   * Opens a file of the workspace folder from the Explorer (a double click pins it and focuses the
   * editor), then waits for its tab and its first rendered line. Not Quick Open: its file search is
   * a background job that took over 45 s at load 30 on the 2-core machine.
   */
  async openFile(name: string): Promise<void> {
    await this.page.locator(`.explorer-folders-view .monaco-list-row[aria-label="${name}"]`).dblclick();
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
    // The cursor moves (and the status bar shows it) while the box still previews the place, before
    // Enter closes it: keys pressed then go to the box. Wait for the box to close and the editor to
    // hold the keyboard focus as well.
    await this.page.locator('.statusbar-item', { hasText: `Ln ${line}, Col ${column}` }).waitFor();
    await this.quickInput().waitFor({ state: 'hidden' });
    await this.page.locator('.editor-group-container.active .monaco-editor.focused').waitFor();
  }

  /** The active editor's rendered line that contains `text`. */
  editorLine(text: string): Locator {
    return this.page.locator(EDITOR_LINE, { hasText: text }).first();
  }

  /**
   * Where `text` is drawn in the active editor, once the topmost element at its centre is the line
   * that shows it. Found and measured in one call in the page: the editor replaces a line's element
   * whenever it redraws it (semantic tokens, inlay hints, decorations), and an element found in one
   * call and measured in the next may be detached by then; a detached element measures as an empty
   * box at (0, 0), and the pointer then lands on the title bar, where no hover opens.
   */
  private async whereDrawn(text: string): Promise<{ x: number; y: number }> {
    const found = await this.page.waitForFunction(
      ({ selector, wanted }) => {
        for (const el of Array.from(document.querySelectorAll(selector))) {
          // Find the text across the line's token spans and measure just that substring.
          const walker = document.createTreeWalker(el, NodeFilter.SHOW_TEXT);
          const pieces: { node: Text; start: number }[] = [];
          let full = '';
          for (let n = walker.nextNode(); n; n = walker.nextNode()) {
            pieces.push({ node: n as Text, start: full.length });
            full += n.textContent ?? '';
          }
          // The editor draws spaces as no-break spaces (one character each, so offsets hold).
          const at = full.replace(/\u00a0/g, ' ').indexOf(wanted);
          if (at < 0) continue;
          const locate = (pos: number): [Text, number] => {
            const p = pieces.find((q) => pos >= q.start && pos <= q.start + (q.node.textContent ?? '').length) ?? pieces[0]!;
            return [p.node, pos - p.start];
          };
          const range = document.createRange();
          range.setStart(...locate(at));
          range.setEnd(...locate(at + wanted.length));
          const box = range.getBoundingClientRect();
          const centre = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
          // Not yet laid out, or covered (a menu, a notification, an earlier hover): not a place to point at yet.
          const top = box.width > 0 && box.height > 0 ? document.elementFromPoint(centre.x, centre.y) : null;
          return top && el.contains(top) ? centre : false;
        }
        return false;
      },
      { selector: EDITOR_LINE, wanted: text },
    );
    return (await found.jsonValue()) as { x: number; y: number };
  }

  /** Moves the mouse onto `text` in the active editor, as a person pointing at it. */
  async pointAt(text: string): Promise<void> {
    const centre = await this.whereDrawn(text);
    await this.page.mouse.move(centre.x - 30, centre.y + 40);
    await this.page.mouse.move(centre.x, centre.y, { steps: 5 });
  }

  /**
   * Points at `text` and gives the text of the hover that opens there, once it contains `expected`.
   * One pointing, no second try: a hover that does not open, or opens without `expected`, fails.
   */
  async hoverAt(text: string, expected: string): Promise<string> {
    await this.pointAt(text);
    const hover = this.page.locator('.monaco-hover:visible', { hasText: expected }).first();
    await hover.waitFor();
    return hover.innerText();
  }

  /** Problems view rows (Ctrl+Shift+M) once a row mentions every one of `codes`. */
  async problems(codes: readonly string[]): Promise<string[]> {
    await this.page.keyboard.press('Control+Shift+M');
    const rows = this.page.locator('.markers-panel .monaco-list-row');
    for (const code of codes) await rows.filter({ hasText: code }).first().waitFor();
    return rows.allInnerTexts();
  }

  /**
   * Waits until the rendered line containing `text` carries a problem's squiggle: the markers the
   * Quick Fix menu hands to the server as its context are in (the squiggles are drawn from them).
   */
  async problemMarkedOn(text: string): Promise<void> {
    await this.page.waitForFunction(
      ({ selector, wanted }) => {
        // The editor draws spaces as no-break spaces.
        const line = Array.from(document.querySelectorAll<HTMLElement>(selector)).find((el) => (el.textContent ?? '').replace(/\u00a0/g, ' ').includes(wanted));
        const editor = line?.closest('.monaco-editor');
        if (!line || !editor) return false;
        // The overlay layer draws each line's decorations (squiggles: `cdr squiggly-error` and the
        // like) in a row of its own, level with the line.
        const top = line.getBoundingClientRect().top;
        return Array.from(editor.querySelectorAll<HTMLElement>('.view-overlays > div')).some(
          (row) => Math.abs(row.getBoundingClientRect().top - top) < 1 && row.querySelector('.cdr[class*="squiggly-"]') !== null,
        );
      },
      { selector: EDITOR_LINE, wanted: text },
    );
  }

  /**
   * Quick Fix menu (Ctrl+.) at the cursor: picks the entry whose label contains `label`. The menu
   * lists the fixes for the problems marked when it opens: wait for the mark first (problemMarkedOn).
   */
  async applyQuickFix(label: string): Promise<void> {
    const entry = this.page.locator('.action-widget .monaco-list-row', { hasText: label }).first();
    await this.page.keyboard.press('Control+.');
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
