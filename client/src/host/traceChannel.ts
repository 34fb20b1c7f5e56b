/**
 * The channel that receives the language-server protocol trace.
 *
 * The language client only traces when its trace channel's log level is Trace, and writes each
 * line at that level; with the client's own log channel (level Info unless the user changes it
 * in the Output view) `sublevel.trace.server` therefore did nothing. This channel takes its level
 * from the setting instead and writes the lines as plain text to a channel of its own, opened on
 * the first line, so the setting alone shows the traffic.
 *
 * No `vscode` values are imported here, so the wiring is testable without an editor.
 */
import type * as vscode from 'vscode';

export const TRACE_CHANNEL_NAME = 'Sublevel Trace';

export interface TraceChannelHost {
  /** The value of `sublevel.trace.server` now: a word, or the object form `{ "verbosity": "verbose" }`. */
  readSetting(): unknown;
  /** Calls `listener` whenever the setting may have changed. */
  onSettingChange(listener: () => void): vscode.Disposable;
  /** Opens the plain output channel named {@link TRACE_CHANNEL_NAME}; called at most once. */
  openChannel(name: string): vscode.OutputChannel;
  /** `vscode.LogLevel`, passed in because this module imports no editor values. */
  levels: typeof vscode.LogLevel;
  /** Time of a line; the plain channel adds none itself. */
  now?: () => Date;
}

/** Settings values under which the trace is on (the client reads "verbose" itself). */
const TRACING_VALUES: ReadonlySet<string> = new Set(['messages', 'compact', 'verbose']);

/** The trace verbosity of the setting: the word itself, or the `verbosity` of its object form (as the language client reads it). */
function verbosityOf(setting: unknown): string {
  if (typeof setting === 'string') return setting;
  const verbosity = typeof setting === 'object' && setting !== null ? (setting as { verbosity?: unknown }).verbosity : undefined;
  return typeof verbosity === 'string' ? verbosity : 'off';
}

export function createTraceChannel(host: TraceChannelHost): vscode.LogOutputChannel {
  const levelOf = (): vscode.LogLevel =>
    TRACING_VALUES.has(verbosityOf(host.readSetting())) ? host.levels.Trace : host.levels.Off;
  let level = levelOf();
  let channel: vscode.OutputChannel | undefined;
  const opened = (): vscode.OutputChannel => (channel ??= host.openChannel(TRACE_CHANNEL_NAME));
  const listeners = new Set<(level: vscode.LogLevel) => void>();
  const settingWatch = host.onSettingChange(() => {
    const next = levelOf();
    if (next === level) return;
    level = next;
    // The client re-reads the setting and restarts or stops its tracer on this event.
    for (const listener of [...listeners]) listener(level);
  });
  const clock = host.now ?? (() => new Date());
  const write = (text: string): void => {
    if (level === host.levels.Off) return;
    opened().appendLine(`[${clock().toISOString().slice(11, 23)}] ${text}`);
  };
  const onDidChangeLogLevel: vscode.Event<vscode.LogLevel> = (listener, thisArgs, disposables) => {
    const bound = (value: vscode.LogLevel): void => { listener.call(thisArgs, value); };
    listeners.add(bound);
    const subscription = { dispose: () => { listeners.delete(bound); } };
    disposables?.push(subscription);
    return subscription;
  };
  return {
    name: TRACE_CHANNEL_NAME,
    get logLevel() { return level; },
    onDidChangeLogLevel,
    trace: write,
    debug: write,
    info: write,
    warn: write,
    error: (error) => write(typeof error === 'string' ? error : error.stack ?? error.message),
    append: (value) => opened().append(value),
    appendLine: (value) => opened().appendLine(value),
    replace: (value) => opened().replace(value),
    clear: () => channel?.clear(),
    show: (columnOrFocus?: vscode.ViewColumn | boolean, preserveFocus?: boolean) => {
      if (typeof columnOrFocus === 'boolean') opened().show(columnOrFocus);
      else opened().show(columnOrFocus, preserveFocus);
    },
    hide: () => channel?.hide(),
    dispose: () => {
      settingWatch.dispose();
      listeners.clear();
      channel?.dispose();
      channel = undefined;
    },
  };
}
