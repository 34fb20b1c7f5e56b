/**
 * A progress bar on stderr for long CLI runs, drawn only when stderr is a terminal: piped or
 * redirected output gets nothing extra. Our own few lines rather than a package: the bar is one
 * line redrawn with a carriage return, and every module the CLI loads adds to its start-up.
 */

/** The part of a stream the bar needs (process.stderr, or a stand-in in tests). */
export interface ProgressStream {
  isTTY?: boolean;
  columns?: number;
  write(text: string): unknown;
}

export interface Progress {
  /** `done` of the run's `total` steps are finished. */
  update(done: number): void;
  /** Clears the bar, so other output starts on a clean line; the next update draws it again. */
  clear(): void;
}

/** Redraws at most this often (ms): drawing every file of a 2,000-file batch would cost more than it shows. */
const REDRAW_MS = 100;
const BAR_WIDTH = 30;

const NO_PROGRESS: Progress = { update: () => undefined, clear: () => undefined };

/**
 * A bar labelled `label` for `total` steps, or one that draws nothing when the stream is not a
 * terminal or the run is too short to need one. `now` is the clock (tests pass their own).
 */
export function createProgress(stream: ProgressStream | undefined, label: string, total: number, now: () => number = Date.now): Progress {
  if (!stream?.isTTY || total < 2) return NO_PROGRESS;
  let last = -Infinity;
  let drawn = false;
  const draw = (done: number): void => {
    const filled = Math.round((BAR_WIDTH * done) / total);
    const text = `${label} [${'#'.repeat(filled)}${'-'.repeat(BAR_WIDTH - filled)}] ${done}/${total}`;
    const width = Math.max(10, (stream.columns ?? 80) - 1);
    stream.write(`\r${text.slice(0, width)}\x1b[K`);
    drawn = true;
  };
  return {
    update(done) {
      const t = now();
      if (t - last < REDRAW_MS && done < total) return;
      last = t;
      draw(done);
    },
    clear() {
      if (drawn) stream.write('\r\x1b[K');
      drawn = false;
    },
  };
}
