/**
 * The diagram panel beside the editor: follows the active setup file, asks the server for the
 * chosen diagram after each edit (debounced), exports SVG/CSV through a save dialog, and is
 * restored after a reload. Every message from the page is validated before use.
 */
import * as vscode from 'vscode';
import type { LanguageClient } from 'vscode-languageclient/node';
import { makeNonce } from '../panel/nonce';
import { panelHtml } from '../panel/panelHtml';
import { isView, parsePageMessage, type View, type ViewOptions } from '../panel/messages';
import { FIELD_UNIT_TESLA } from '../../../server/src/render/fieldUnits';
import { DIAGRAM_REQUEST, type DiagramParams, type DiagramResult } from './diagramProtocol';
import { messageSvg } from './messageSvg';

export const PANEL_VIEW_TYPE = 'sublevel.diagrams';
/** Redraw this long after the last keystroke. */
const REDRAW_DELAY_MS = 100;
/** Device pixels per SVG unit for PNG (a 760-unit figure becomes 2280 px, about 300 dpi at 19 cm). */
const PNG_SCALE = 3;

export class DiagramPanel {
  private static current: DiagramPanel | undefined;
  private view: View = 'levels';
  private options: ViewOptions = {};
  private document: vscode.TextDocument | undefined;
  private timer: NodeJS.Timeout | undefined;
  private readonly disposables: vscode.Disposable[] = [];

  static show(context: vscode.ExtensionContext, client: LanguageClient): void {
    if (DiagramPanel.current) {
      DiagramPanel.current.panel.reveal(vscode.ViewColumn.Beside, true);
      return;
    }
    const panel = vscode.window.createWebviewPanel(PANEL_VIEW_TYPE, 'Sublevel diagrams', { viewColumn: vscode.ViewColumn.Beside, preserveFocus: true }, webviewOptions(context));
    DiagramPanel.current = new DiagramPanel(panel, context, client);
  }

  static restore(panel: vscode.WebviewPanel, context: vscode.ExtensionContext, client: LanguageClient, state: unknown): void {
    panel.webview.options = webviewOptions(context);
    const saved = state as { view?: unknown } | undefined;
    const d = new DiagramPanel(panel, context, client);
    if (saved && isView(saved.view)) d.view = saved.view;
    DiagramPanel.current = d;
  }

  private constructor(
    private readonly panel: vscode.WebviewPanel,
    context: vscode.ExtensionContext,
    private readonly client: LanguageClient,
  ) {
    const root = vscode.Uri.joinPath(context.extensionUri, 'dist', 'panel');
    panel.webview.html = panelHtml({
      cspSource: panel.webview.cspSource,
      nonce: makeNonce(),
      scriptUri: panel.webview.asWebviewUri(vscode.Uri.joinPath(root, 'page.js')).toString(),
      styleUri: panel.webview.asWebviewUri(vscode.Uri.joinPath(root, 'panel.css')).toString(),
    });
    this.document = activeSetup();
    this.disposables.push(
      panel.onDidDispose(() => this.dispose()),
      panel.webview.onDidReceiveMessage((m: unknown) => this.onMessage(m)),
      vscode.window.onDidChangeActiveTextEditor((e) => {
        if (e && e.document.languageId === 'sublevel') {
          this.document = e.document;
          this.schedule();
        }
      }),
      vscode.workspace.onDidChangeTextDocument((e) => {
        if (e.document === this.document) this.schedule();
      }),
      vscode.window.onDidChangeTextEditorSelection((e) => {
        if (e.textEditor.document === this.document) this.schedule();
      }),
    );
  }

  private onMessage(raw: unknown): void {
    const m = parsePageMessage(raw);
    if (!m) return;
    this.view = m.view;
    if (m.type === 'export') void (m.format === 'png' ? this.exportPng() : this.export(m.format));
    else if (m.type === 'png') void this.savePng(m.data);
    else {
      if (m.type === 'options') this.options = { field: m.field, from: m.from, to: m.to, unit: m.unit };
      this.schedule(0);
    }
  }

  private schedule(delay = REDRAW_DELAY_MS): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => void this.redraw(), delay);
  }

  private async request(theme: DiagramParams['theme']): Promise<DiagramResult> {
    const doc = this.document;
    if (!doc) return { ok: false, message: 'Open a .sublevel file to see its diagrams.' };
    const editor = vscode.window.visibleTextEditors.find((e) => e.document === doc);
    const o = this.options;
    const toTesla = (v: number | undefined): number | undefined => (v === undefined ? undefined : v * FIELD_UNIT_TESLA[o.unit ?? 'mT']);
    const params: DiagramParams = {
      uri: doc.uri.toString(),
      view: this.view,
      theme,
      ...(editor ? { line: editor.selection.active.line } : {}),
      ...(o.field ? { field: o.field } : {}),
      ...(o.from !== undefined ? { fromT: toTesla(o.from) } : {}),
      ...(o.to !== undefined ? { toT: toTesla(o.to) } : {}),
      ...(o.unit ? { unit: o.unit } : {}),
    };
    try {
      return await this.client.sendRequest<DiagramResult>(DIAGRAM_REQUEST, params);
    } catch (e) {
      return { ok: false, message: `The language server could not draw this: ${(e as Error).message}` };
    }
  }

  private async redraw(): Promise<void> {
    const r = await this.request('panel');
    const title = r.ok ? r.title : 'Sublevel diagrams';
    void this.panel.webview.postMessage({ type: 'show', view: this.view, svg: r.ok ? r.svg : messageSvg(r.message), title, ...(r.ok ? { csv: r.csv, fields: r.fields ?? [] } : {}) });
  }

  private async export(format: 'svg' | 'csv'): Promise<void> {
    const r = await this.request('export');
    if (!r.ok) {
      void vscode.window.showWarningMessage(r.message);
      return;
    }
    const base = this.document ? this.document.uri.path.replace(/\.sublevel$/, '') : 'sublevel';
    const target = await vscode.window.showSaveDialog({
      defaultUri: vscode.Uri.file(`${base}-${this.view}.${format}`),
      filters: format === 'svg' ? { 'SVG image': ['svg'] } : { 'CSV table': ['csv'] },
    });
    if (!target) return;
    await vscode.workspace.fs.writeFile(target, new TextEncoder().encode(format === 'svg' ? r.svg : r.csv));
  }

  /** PNG goes through the page: it draws the export SVG on a canvas and sends the pixels back. */
  private async exportPng(): Promise<void> {
    const r = await this.request('export');
    if (!r.ok) {
      void vscode.window.showWarningMessage(r.message);
      return;
    }
    void this.panel.webview.postMessage({ type: 'rasterise', view: this.view, svg: r.svg, scale: PNG_SCALE });
  }

  private async savePng(base64: string): Promise<void> {
    const base = this.document ? this.document.uri.path.replace(/\.sublevel$/, '') : 'sublevel';
    const target = await vscode.window.showSaveDialog({ defaultUri: vscode.Uri.file(`${base}-${this.view}.png`), filters: { 'PNG image': ['png'] } });
    if (!target) return;
    await vscode.workspace.fs.writeFile(target, Buffer.from(base64, 'base64'));
  }

  private dispose(): void {
    if (this.timer) clearTimeout(this.timer);
    DiagramPanel.current = undefined;
    for (const d of this.disposables.splice(0)) d.dispose();
  }
}

function webviewOptions(context: vscode.ExtensionContext): vscode.WebviewOptions & vscode.WebviewPanelOptions {
  return { enableScripts: true, localResourceRoots: [vscode.Uri.joinPath(context.extensionUri, 'dist', 'panel')] };
}

function activeSetup(): vscode.TextDocument | undefined {
  const e = vscode.window.activeTextEditor;
  if (e?.document.languageId === 'sublevel') return e.document;
  return vscode.workspace.textDocuments.find((d) => d.languageId === 'sublevel');
}
