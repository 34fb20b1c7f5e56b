/**
 * Entry point of the UI suite (bundled to out/e2e/ui.js): runs the browser-window tests on a
 * page already showing code-server with the packaged extension installed.
 */
import type { Page } from 'playwright-core';
import { type Outcome, runRegistered } from '../harness';
import { registerUiTests } from './ui.e2e';
import { Workbench } from './workbench';

export async function runUi(page: Page, shotsDir: string, report: (o: Outcome) => void): Promise<Outcome[]> {
  const wb = new Workbench(page, shotsDir);
  registerUiTests(() => wb);
  return runRegistered(report, async (_o, index) => {
    await wb.shot(`failed-test-${index}`);
  });
}
