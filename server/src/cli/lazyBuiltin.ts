/**
 * Node's own modules that only some commands use (child_process, worker_threads, os), loaded when
 * first needed: each costs the CLI's start-up several milliseconds when imported at the top,
 * which every `check` would pay (docs/speed.md).
 */
type Loader = (name: string) => unknown;

export function lazyBuiltin<T>(name: string): T {
  const fromProcess = (process as { getBuiltinModule?: Loader }).getBuiltinModule;
  // getBuiltinModule: Node ≥ 20.16; before it, require (the CLI bundle is CommonJS).
  return (fromProcess ? fromProcess(name) : require(name)) as T;
}
