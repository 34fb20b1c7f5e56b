/**
 * The built server with failures planted in its language service: a copy of `dist/server.js`
 * loads, as it always does, the `service.js` beside it, which here is the real service with an
 * evaluation that throws at once, one that rejects later, and a hover that throws, each for a
 * document with a marker comment. Every failure must reach the log, the server must stay up, the
 * failing document keep its last diagnostics, and the next request (another document's hover and
 * evaluation) be answered as usual. With diagnostics pushed and pulled.
 */
import { copyFileSync, mkdtempSync, rmSync, writeFileSync } from 'fs';
import { tmpdir } from 'os';
import path from 'path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, open, SERVER, startClient, type TestClient } from './lspClient';

const dir = mkdtempSync(path.join(tmpdir(), 'sublevel-injected-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

beforeAll(() => {
  ensureBuilt();
  copyFileSync(SERVER, path.join(dir, 'server.js'));
  writeFileSync(
    path.join(dir, 'service.js'),
    `const real = require(${JSON.stringify(path.join(path.dirname(SERVER), 'service.js'))});
class PlantedFailures extends real.LanguageService {
  evaluate(doc) {
    const text = doc.getText();
    if (text.includes('# plant: evaluation throws')) throw new Error('planted: the evaluation threw');
    if (text.includes('# plant: evaluation rejects')) return Promise.reject(new Error('planted: the evaluation rejected'));
    return super.evaluate(doc);
  }
  hover(doc, position, settings) {
    if (doc.getText().includes('# plant: hover throws')) throw new Error('planted: the hover threw');
    return super.hover(doc, position, settings);
  }
}
module.exports = { ...real, LanguageService: PlantedFailures };
`,
  );
}, 120_000);

/** Li-7 2p 2P3/2 at 5 G (invented set-up): its evaluation notes the intermediate regime, which parse and model cannot. */
const SOUND = 'species Li7\n  level upper: 2p 2P°3/2\nfield bias = 5 G\n';
/** The same with a mistake parse and model find (an unknown block word), so its diagnostics are known before any evaluation. */
const planted = (marker: string): string => `${SOUND}spices X\n${marker}\n`;

const pause = (ms: number): Promise<void> => new Promise((resolve) => setTimeout(resolve, ms));

const CLIENTS = [
  { name: 'diagnostics pushed', capabilities: {} },
  { name: 'diagnostics pulled', capabilities: { diagnostic: { dynamicRegistration: false } } },
];

for (const kind of CLIENTS) {
  describe(`planted failures (${kind.name})`, () => {
    let client: TestClient;
    const errors: string[] = [];
    const pulled = kind.name.endsWith('pulled');
    beforeAll(async () => {
      client = await startClient({ textDocument: { hover: { contentFormat: ['markdown'] }, ...kind.capabilities } }, {}, path.join(dir, 'server.js'));
      client.connection.onNotification('window/logMessage', (m: { type: number; message: string }) => {
        if (m.type === 1) errors.push(m.message);
      });
    }, 60_000);

    /** The codes shown for a document now (pulled, or the last push), after its evaluation was due. */
    async function shown(uri: string): Promise<string[]> {
      if (!pulled) return (await client.waitForPush(uri, () => true)).map((d) => String(d.code));
      const report = (await client.connection.sendRequest('textDocument/diagnostic', { textDocument: { uri } })) as { items: { code: string }[] };
      return report.items.map((d) => d.code);
    }

    /** Waits until the evaluation of a sound document is in (its regime note shows), i.e. the server still evaluates. */
    async function evaluatedSound(uri: string): Promise<string[]> {
      await open(client, uri, SOUND);
      const until = Date.now() + 30_000;
      for (;;) {
        const codes = await shown(uri);
        if (codes.includes('zeeman-not-linear') || Date.now() > until) return codes;
        await pause(100);
      }
    }

    for (const [marker, logged] of [
      ['# plant: evaluation throws', 'planted: the evaluation threw'],
      ['# plant: evaluation rejects', 'planted: the evaluation rejected'],
    ] as const) {
      it(`logs ${marker.slice(9)}, keeps the file's diagnostics, and answers the next requests`, async () => {
        errors.length = 0;
        const uri = `file:///planted/${marker.split(' ').at(-1)}-${kind.name.split(' ')[1]}.sublevel`;
        await open(client, uri, planted(marker));
        expect(await shown(uri)).toEqual(['syntax-unknown-statement']); // the pull also schedules the evaluation
        const until = Date.now() + 20_000;
        while (!errors.some((e) => e.includes(logged)) && Date.now() < until) await pause(50);
        expect(errors.map((e) => e.split('\n')[0])).toEqual([`sublevel: evaluating ${uri} (version 1) failed: Error: ${logged}`]);
        expect(client.process.exitCode).toBeNull();
        expect(await shown(uri)).toEqual(['syntax-unknown-statement']);
        // The next requests: a hover on the failing file, and a sound file evaluated in full.
        const hover = await client.connection.sendRequest('textDocument/hover', { textDocument: { uri }, position: { line: 1, character: 9 } });
        expect(JSON.stringify(hover)).toContain('upper');
        expect(await evaluatedSound(`${uri}.sound.sublevel`)).toContain('zeeman-not-linear');
        expect(errors).toHaveLength(1);
      }, 60_000);
    }

    it('answers a hover that throws with nothing, logs it, and answers the next hover', async () => {
      errors.length = 0;
      const uri = `file:///planted/hover-${kind.name.split(' ')[1]}.sublevel`;
      await open(client, uri, `${SOUND}# plant: hover throws\n`);
      expect(await client.connection.sendRequest('textDocument/hover', { textDocument: { uri }, position: { line: 1, character: 9 } })).toBeNull();
      expect(errors.map((e) => e.split('\n')[0])).toEqual([`sublevel: hover failed for ${uri}: Error: planted: the hover threw`]);
      const other = 'file:///planted/other.sublevel';
      await open(client, other, SOUND);
      expect(JSON.stringify(await client.connection.sendRequest('textDocument/hover', { textDocument: { uri: other }, position: { line: 1, character: 9 } }))).toContain('upper');
    }, 60_000);

    it('shuts down and exits cleanly', async () => {
      expect(await client.stop()).toBe(0);
    });
  });
}
