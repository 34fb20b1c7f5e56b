/** The test workspace (a temporary copy of examples/) and the extension under test. */
import * as assert from 'node:assert/strict';
import * as vscode from 'vscode';
import { whenEvent } from './events';

export const EXTENSION_ID = 'sublevel-dev.sublevel';
const DIAGNOSTICS_TIMEOUT_MS = 60_000;

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
