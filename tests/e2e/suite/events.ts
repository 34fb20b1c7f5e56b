/**
 * Waiting on the editor's own events instead of sleeping: a probe is checked at once and again
 * after each event, until it gives a value or the deadline passes.
 */
import type * as vscode from 'vscode';

export function whenEvent<T, E>(event: vscode.Event<E>, probe: () => T | undefined, timeoutMs: number, describeState: () => string): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const first = probe();
    if (first !== undefined) {
      resolve(first);
      return;
    }
    const timer = setTimeout(() => {
      listener.dispose();
      reject(new Error(`gave up after ${timeoutMs} ms; ${describeState()}`));
    }, timeoutMs);
    const listener = event(() => {
      const value = probe();
      if (value === undefined) return;
      clearTimeout(timer);
      listener.dispose();
      resolve(value);
    });
  });
}
