/**
 * `sublevel.trace.server` must show the protocol traffic by itself. The wiring is checked with a
 * fake host, and then against the real language client (loaded with a stand-in for the editor
 * module) which decides from its trace channel's log level whether to trace at all.
 */
import { readFileSync } from 'node:fs';
import Module from 'node:module';
import Ajv from 'ajv';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type * as vscode from 'vscode';
import { createTraceChannel, TRACE_CHANNEL_NAME, type TraceChannelHost } from '../../client/src/host/traceChannel';

/** `vscode.LogLevel` as the editor API defines it (@types/vscode). */
const LEVELS = { Off: 0, Trace: 1, Debug: 2, Info: 3, Warning: 4, Error: 5 } as unknown as typeof vscode.LogLevel;

interface FakeHost extends TraceChannelHost {
  setting: unknown;
  change(value: unknown): void;
  lines: string[];
  opened: string[];
  watching: number;
}

function fakeHost(setting: unknown): FakeHost {
  const listeners = new Set<() => void>();
  const host: FakeHost = {
    setting,
    lines: [],
    opened: [],
    watching: 0,
    readSetting: () => host.setting,
    onSettingChange: (listener) => {
      listeners.add(listener);
      host.watching += 1;
      return { dispose: () => { listeners.delete(listener); host.watching -= 1; } };
    },
    openChannel: (name) => {
      host.opened.push(name);
      const sink = { appendLine: (text: string) => host.lines.push(text), dispose: () => undefined };
      return sink as unknown as vscode.OutputChannel;
    },
    levels: LEVELS,
    now: () => new Date('2026-01-02T03:04:05.678Z'),
    change: (value) => { host.setting = value; for (const listener of listeners) listener(); },
  };
  return host;
}

describe('trace channel wiring', () => {
  it('takes its log level from the setting', () => {
    expect(createTraceChannel(fakeHost('off')).logLevel).toBe(LEVELS.Off);
    expect(createTraceChannel(fakeHost(undefined)).logLevel).toBe(LEVELS.Off);
    expect(createTraceChannel(fakeHost('messages')).logLevel).toBe(LEVELS.Trace);
    expect(createTraceChannel(fakeHost('verbose')).logLevel).toBe(LEVELS.Trace);
  });

  it('reads the object form of the setting by its verbosity, as the language client does', () => {
    expect(createTraceChannel(fakeHost({ verbosity: 'verbose' })).logLevel).toBe(LEVELS.Trace);
    expect(createTraceChannel(fakeHost({ verbosity: 'messages', format: 'json' })).logLevel).toBe(LEVELS.Trace);
    expect(createTraceChannel(fakeHost({ verbosity: 'off' })).logLevel).toBe(LEVELS.Off);
    expect(createTraceChannel(fakeHost({})).logLevel).toBe(LEVELS.Off);
    expect(createTraceChannel(fakeHost(null)).logLevel).toBe(LEVELS.Off);
  });

  it('writes trace lines as plain timed text to its own channel, opened on the first line', () => {
    const host = fakeHost('messages');
    const channel = createTraceChannel(host);
    expect(host.opened).toEqual([]);
    channel.trace("Sending request 'initialize - (0)'.");
    channel.trace('Params: {}');
    expect(host.opened).toEqual([TRACE_CHANNEL_NAME]);
    expect(host.lines).toEqual(["[03:04:05.678] Sending request 'initialize - (0)'.", '[03:04:05.678] Params: {}']);
  });

  it('drops lines and opens nothing while the setting is off', () => {
    const host = fakeHost('off');
    createTraceChannel(host).trace('Sending notification');
    expect(host.opened).toEqual([]);
    expect(host.lines).toEqual([]);
  });

  it('announces a changed level once, and stops watching when disposed', () => {
    const host = fakeHost('off');
    const channel = createTraceChannel(host);
    const seen: number[] = [];
    channel.onDidChangeLogLevel((level) => seen.push(level));
    host.change('verbose');
    host.change('messages');
    host.change('off');
    expect(seen).toEqual([LEVELS.Trace, LEVELS.Off]);
    expect(host.watching).toBe(1);
    channel.dispose();
    expect(host.watching).toBe(0);
  });
});

/** The real language client, with `vscode` answered by a stand-in that knows the setting. */
describe('with the real language client', () => {
  const moduleInternals = Module as unknown as { _resolveFilename: (request: string, ...rest: unknown[]) => string };
  const originalResolve = moduleInternals._resolveFilename;
  const requireHere = Module.createRequire(import.meta.url);
  const stubId = 'sublevel-test-vscode-stand-in';
  let setting = 'off';
  let LanguageClient: new (id: string, name: string, server: unknown, options: unknown) => unknown;

  beforeAll(() => {
    // Anything else the client touches at load or construction is answered by a stand-in that is
    // callable, constructible (the client extends editor classes) and has stand-ins as properties.
    const anything: ProxyHandler<object> = {
      get: (target, key) => (key in target ? (target as Record<PropertyKey, unknown>)[key] : new Proxy(function standIn() {}, anything)),
    };
    const infoChannel = new Proxy({ logLevel: LEVELS.Info, onDidChangeLogLevel: () => ({ dispose: () => undefined }) }, anything);
    class EventEmitter {
      readonly event = () => ({ dispose: () => undefined });
      fire(): void {}
      dispose(): void {}
    }
    const api = {
      LogLevel: LEVELS,
      EventEmitter,
      version: '1.91.0', // the oldest editor package.json allows
      workspace: new Proxy({ getConfiguration: () => ({ get: (key: string, fallback: unknown) => (key === 'trace.server' ? setting : fallback) }) }, anything),
      window: new Proxy({ createOutputChannel: () => infoChannel }, anything),
    };
    requireHere.cache[stubId] = { id: stubId, filename: stubId, loaded: true, exports: new Proxy(api, anything) } as unknown as NodeJS.Module;
    moduleInternals._resolveFilename = function (request: string, ...rest: unknown[]) {
      return request === 'vscode' ? stubId : originalResolve.call(this, request, ...rest);
    };
    ({ LanguageClient } = requireHere('vscode-languageclient/node'));
  });

  afterAll(() => {
    moduleInternals._resolveFilename = originalResolve;
    delete requireHere.cache[stubId];
  });

  /** The trace value the client hands its connection after reading the setting. */
  function traceChosen(traceOutputChannel: vscode.LogOutputChannel | undefined): { value: number; tracer: { log(message: string): void } } {
    const client = new LanguageClient('sublevel', 'Sublevel', { module: 'server.js' }, { traceOutputChannel }) as {
      refreshTrace(connection: unknown, sendNotification: boolean): void;
    };
    let chosen: { value: number; tracer: { log(message: string): void } } | undefined;
    client.refreshTrace({ trace: async (value: number, tracer: { log(message: string): void }) => { chosen = { value, tracer }; } }, false);
    return chosen!;
  }

  it('did not trace with its own log channel at the default level (the defect)', () => {
    setting = 'messages';
    expect(traceChosen(undefined).value).toBe(0); // Trace.Off
  });

  it('traces messages and verbose, and writes the lines, with the Sublevel trace channel', () => {
    setting = 'messages';
    const host = fakeHost('messages');
    const chosen = traceChosen(createTraceChannel(host));
    expect(chosen.value).toBe(1); // Trace.Messages (vscode-jsonrpc)
    chosen.tracer.log("Received notification 'textDocument/publishDiagnostics'.");
    expect(host.lines).toEqual(["[03:04:05.678] Received notification 'textDocument/publishDiagnostics'."]);

    setting = 'verbose';
    expect(traceChosen(createTraceChannel(fakeHost('verbose'))).value).toBe(3); // Trace.Verbose
    setting = 'off';
    expect(traceChosen(createTraceChannel(fakeHost('off'))).value).toBe(0);
  });

  it('starts tracing when the setting is changed while the client runs', () => {
    setting = 'off';
    const host = fakeHost('off');
    const client = new LanguageClient('sublevel', 'Sublevel', { module: 'server.js' }, { traceOutputChannel: createTraceChannel(host) }) as {
      hookLogLevelChanged(connection: unknown): void;
    };
    const values: number[] = [];
    client.hookLogLevelChanged({ trace: async (value: number) => { values.push(value); } });
    setting = 'messages';
    host.change('messages');
    expect(values).toEqual([1]);
  });
});

describe('the declared setting', () => {
  // The editor checks a user's settings against this declaration and warns on what it rejects;
  // both forms the client and the channel read (vscode-languageclient refreshTrace) must pass.
  const declared = (JSON.parse(readFileSync('package.json', 'utf8')) as {
    contributes: { configuration: { properties: Record<string, object> } };
  }).contributes.configuration.properties['sublevel.trace.server']!;
  const valid = new Ajv({ strict: false }).compile(declared);

  it('accepts the word and the object form, and nothing else', () => {
    for (const ok of ['off', 'messages', 'compact', 'verbose', { verbosity: 'verbose' }, { verbosity: 'messages', format: 'json' }]) {
      expect(valid(ok), JSON.stringify(ok)).toBe(true);
    }
    for (const bad of ['loud', 3, { verbosity: 'loud' }, { format: 'yaml' }, { verbosity: 'verbose', colour: 'red' }]) {
      expect(valid(bad), JSON.stringify(bad)).toBe(false);
    }
  });

  it('every verbosity it declares other than off turns the trace channel on', () => {
    for (const word of ['messages', 'compact', 'verbose']) {
      expect(createTraceChannel(fakeHost(word)).logLevel, word).toBe(LEVELS.Trace);
      expect(createTraceChannel(fakeHost({ verbosity: word, format: 'json' })).logLevel, word).toBe(LEVELS.Trace);
    }
    expect(createTraceChannel(fakeHost({ format: 'json' })).logLevel).toBe(LEVELS.Off);
  });
});
