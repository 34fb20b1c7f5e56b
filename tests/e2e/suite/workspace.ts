/** The test workspace (a temporary copy of examples/) and the extension under test. */
import * as assert from 'node:assert/strict';
import * as vscode from 'vscode';
import { whenEvent } from './events';

export const EXTENSION_ID = 'sublevel-dev.sublevel';
const DIAGNOSTICS_TIMEOUT_MS = 90_000;
const EVALUATION_TIMEOUT_MS = 90_000;

export function extension(): vscode.Extension<unknown> {
  const ext = vscode.extensions.getExtension(EXTENSION_ID);
  assert.ok(ext, `extension ${EXTENSION_ID} is not loaded`);
  return ext;
}

export function exampleUri(name: string): vscode.Uri {
  const folder = vscode.workspace.workspaceFolders?.[0];
  assert.ok(folder, 'the test window has no workspace folder (expected a copy of examples/)');
  return vscode.Uri.joinPath(folder.uri, name);
}

export async function openSetup(name: string): Promise<vscode.TextEditor> {
  const doc = await vscode.workspace.openTextDocument(exampleUri(name));
  return vscode.window.showTextDocument(doc);
}

/** A position inside the first occurrence of `text` (one character in, so a hover hits it). */
export function positionOf(doc: vscode.TextDocument, text: string): vscode.Position {
  const at = doc.getText().indexOf(text);
  assert.ok(at >= 0, `'${text}' not found in ${doc.uri.path}`);
  return doc.positionAt(at + 1);
}

export function codeOf(d: vscode.Diagnostic): string | undefined {
  const c = d.code;
  if (c === undefined) return undefined;
  return typeof c === 'object' ? String(c.value) : String(c);
}

export function listDiagnostics(uri: vscode.Uri): string {
  const ds = vscode.languages.getDiagnostics(uri);
  return `diagnostics now: [${ds.map((d) => `${d.range.start.line + 1}:${codeOf(d)}`).join(', ')}]`;
}

/** Waits until the diagnostics of `uri` satisfy `probe`. */
export function whenDiagnostics<T>(uri: vscode.Uri, probe: (ds: vscode.Diagnostic[]) => T | undefined): Promise<T> {
  return whenEvent(
    vscode.languages.onDidChangeDiagnostics,
    () => probe(vscode.languages.getDiagnostics(uri)),
    DIAGNOSTICS_TIMEOUT_MS,
    () => listDiagnostics(uri),
  );
}

/**
 * Waits until the server's evaluation of the open document is in: an inlay hint containing `label`
 * (the hints that carry numbers come from the evaluation) is offered for it. A hover asked before
 * that shows only what the file says: the server waits at most EVALUATION_WAIT_MS
 * (server/src/service/languageService.ts) for the evaluation. No editor event tells a test that
 * the hints changed, so it asks again, a moment apart, until the deadline.
 */
export async function whenInlayHint(doc: vscode.TextDocument, label: string): Promise<void> {
  const whole = new vscode.Range(0, 0, doc.lineCount, 0);
  const deadline = Date.now() + EVALUATION_TIMEOUT_MS;
  let seen: string[] = [];
  while (Date.now() < deadline) {
    const hints = (await vscode.commands.executeCommand<vscode.InlayHint[]>('vscode.executeInlayHintProvider', doc.uri, whole)) ?? [];
    seen = hints.map((h) => (typeof h.label === 'string' ? h.label : h.label.map((p) => p.value).join('')));
    if (seen.some((l) => l.includes(label))) return;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  assert.fail(`no inlay hint with '${label}' within ${EVALUATION_TIMEOUT_MS} ms; hints now: [${seen.join(' | ')}]`);
}
