/**
 * Entry point VS Code loads as `extensionTestsPath`: registers the in-host tests and runs them
 * with mocha when the project has it installed, otherwise with the small runner in ../harness.
 * Each outcome is logged; when SUBLEVEL_E2E_RESULTS names a file, all outcomes are written
 * there as JSON for the driving script. A rejected `run` makes the extension host exit non-zero.
 */
import { writeFileSync } from 'node:fs';
import { describeError, type MochaBdd, type Outcome, runRegistered, useMocha } from '../harness';
import { registerActivationTests } from './activation.e2e';
import { registerDiagnosticsTests } from './diagnostics.e2e';
import { registerDiagramTests } from './diagrams.e2e';
import { registerHoverTests } from './hover.e2e';
import { registerQuickFixTests } from './quickFix.e2e';

function registerAll(): void {
  registerActivationTests();
  registerDiagnosticsTests();
  registerHoverTests();
  registerQuickFixTests();
  registerDiagramTests();
}

interface MochaTest {
  fullTitle(): string;
  duration?: number;
}
interface MochaRunner {
  on(event: 'pass', listener: (test: MochaTest) => void): MochaRunner;
  on(event: 'fail', listener: (test: MochaTest, err: unknown) => void): MochaRunner;
}
interface MochaInstance {
  suite: { emit(event: 'pre-require', context: object, file: string, mocha: MochaInstance): void };
  run(done: (failures: number) => void): MochaRunner;
}
type MochaConstructor = new (options: { ui: 'bdd'; color: boolean; timeout: number }) => MochaInstance;

/** mocha from the project's node_modules, resolved at run time (not bundled), if installed. */
function loadMocha(): MochaConstructor | undefined {
  try {
    const m = require('mocha') as MochaConstructor | { default: MochaConstructor };
    return 'default' in m ? m.default : m;
  } catch {
    return undefined;
  }
}

function log(o: Outcome): void {
  console.log(`sublevel-e2e: ${o.ok ? 'PASS' : 'FAIL'} ${o.title} (${o.ms} ms)${o.error ? `\n${o.error}` : ''}`);
}

function runWithMocha(Mocha: MochaConstructor): Promise<Outcome[]> {
  const mocha = new Mocha({ ui: 'bdd', color: false, timeout: 60_000 });
  const context: Partial<MochaBdd> = {};
  mocha.suite.emit('pre-require', context, 'sublevel-e2e', mocha);
  useMocha(context as MochaBdd);
  registerAll();
  const outcomes: Outcome[] = [];
  return new Promise((resolve) => {
    mocha
      .run(() => resolve(outcomes))
      .on('pass', (t) => outcomes.push({ title: t.fullTitle(), ok: true, ms: t.duration ?? 0 }))
      .on('fail', (t, err) => outcomes.push({ title: t.fullTitle(), ok: false, ms: t.duration ?? 0, error: describeError(err) }));
  });
}

export async function run(): Promise<void> {
  const Mocha = loadMocha();
  let outcomes: Outcome[];
  if (Mocha) {
    outcomes = await runWithMocha(Mocha);
    outcomes.forEach(log);
  } else {
    registerAll();
    outcomes = await runRegistered(log);
  }
  const resultsFile = process.env.SUBLEVEL_E2E_RESULTS;
  if (resultsFile) writeFileSync(resultsFile, JSON.stringify({ runner: Mocha ? 'mocha' : 'harness', outcomes }, null, 2));
  const failed = outcomes.filter((o) => !o.ok).length;
  if (failed > 0 || outcomes.length === 0) throw new Error(`${failed} of ${outcomes.length} in-host end-to-end tests failed`);
}
