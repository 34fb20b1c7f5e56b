/** The progress bar: drawn on a terminal (a stand-in stream with isTTY), nothing at all on a pipe. */
import { describe, expect, it } from 'vitest';
import { startCli } from '../../server/src/cli/main';
import { createProgress, type ProgressStream } from '../../server/src/cli/progress';

function stream(isTTY: boolean): ProgressStream & { written: string[] } {
  const written: string[] = [];
  return { isTTY, columns: 60, written, write: (t: string) => written.push(t) };
}

describe('progress bar', () => {
  it('draws on a terminal: a bar with the count, redrawn at most every 100 ms, the last step always, and cleared', () => {
    const s = stream(true);
    let t = 0;
    const p = createProgress(s, 'eval', 4, () => t);
    p.update(1);
    t = 50;
    p.update(2); // too soon: not drawn
    t = 200;
    p.update(3);
    t = 210;
    p.update(4); // the last step is drawn however soon
    p.clear();
    expect(s.written).toEqual([
      `\reval [${'#'.repeat(8)}${'-'.repeat(22)}] 1/4\x1b[K`,
      `\reval [${'#'.repeat(23)}${'-'.repeat(7)}] 3/4\x1b[K`,
      `\reval [${'#'.repeat(30)}] 4/4\x1b[K`,
      '\r\x1b[K',
    ]);
  });

  it('keeps to the terminal width', () => {
    const s = { ...stream(true), columns: 20 };
    createProgress(s, 'eval', 10, () => 0).update(5);
    expect(s.written[0]).toBe('\reval [#############\x1b[K');
  });

  it('writes nothing when the stream is a pipe or a file, or when there is a single step', () => {
    const pipe = stream(false);
    const p = createProgress(pipe, 'eval', 100, () => 0);
    for (let i = 1; i <= 100; i++) p.update(i);
    p.clear();
    expect(pipe.written).toEqual([]);
    const tty = stream(true);
    createProgress(tty, 'eval', 1, () => 0).update(1);
    expect(tty.written).toEqual([]);
  });

  it('shows on a terminal during a batch eval and leaves no trace in its output; nothing on a pipe', async () => {
    for (const isTTY of [true, false]) {
      const s = stream(isTTY);
      const out: string[] = [];
      const err: string[] = [];
      const code = await startCli(['eval', 'examples', '--format', 'jsonl'], { out: (l) => out.push(l), err: (l) => err.push(l) }, { progress: s });
      expect(code).toBe(1); // examples/mistakes.sublevel
      expect(out).toHaveLength(13);
      expect(err).toEqual(['13 files evaluated: 1 with errors or not read']);
      if (isTTY) {
        expect(s.written.some((w) => /^\reval \[[#-]{30}\] [0-9]+\/13\x1b\[K$/.test(w))).toBe(true);
        expect(s.written.at(-1)).toBe('\r\x1b[K');
      } else expect(s.written).toEqual([]);
    }
  });

  it('shows on a terminal during a long sweep (per m block) and is cleared before the CSV; nothing on a pipe', async () => {
    for (const isTTY of [true, false]) {
      const s = stream(isTTY);
      const out: string[] = [];
      const err: string[] = [];
      const code = await startCli(['sweep', 'examples/rubidium-bias.sublevel', '--level', 'Rb87.ground', '--to', '0.1T', '--points', '5001'], { out: (l) => out.push(l), err: (l) => err.push(l) }, { progress: s });
      expect(code).toBe(0);
      expect(out.join('\n')).toContain('field_T');
      if (isTTY) {
        // 87Rb ground: 8 states in m blocks; the last update (8/8) is always drawn, then cleared.
        expect(s.written).toContain(`\rsweep [${'#'.repeat(30)}] 8/8\x1b[K`);
        expect(s.written.at(-1)).toBe('\r\x1b[K');
      } else expect(s.written).toEqual([]);
    }
  });
});
