/** A small argument reader for the CLI: positional words and `--name value` / `--flag` options. */

export interface ParsedArgs {
  command?: string;
  positionals: string[];
  options: Map<string, string | true>;
}

export class UsageError extends Error {}

/** Options that take a value; everything else starting with `--` is a flag. */
const VALUE_OPTIONS = new Set(['format', 'level', 'from', 'to', 'points', 'out', 'view', 'species', 'field', 'beam', 'line', 'unit', 'resonance']);

export function parseArgs(argv: string[]): ParsedArgs {
  const positionals: string[] = [];
  const options = new Map<string, string | true>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a === '--') {
      positionals.push(...argv.slice(i + 1));
      break;
    }
    if (a.startsWith('--')) {
      const eq = a.indexOf('=');
      const name = eq > 0 ? a.slice(2, eq) : a.slice(2);
      if (eq > 0) options.set(name, a.slice(eq + 1));
      else if (VALUE_OPTIONS.has(name)) {
        const v = argv[i + 1];
        if (v === undefined || v.startsWith('--')) throw new UsageError(`option --${name} needs a value`);
        options.set(name, v);
        i++;
      } else options.set(name, true);
    } else positionals.push(a);
  }
  const [command, ...rest] = positionals;
  return { ...(command !== undefined ? { command } : {}), positionals: rest, options };
}

export function stringOption(args: ParsedArgs, name: string, allowed?: readonly string[]): string | undefined {
  const v = args.options.get(name);
  if (v === undefined) return undefined;
  if (v === true) throw new UsageError(`option --${name} needs a value`);
  if (allowed && !allowed.includes(v)) throw new UsageError(`--${name} must be ${allowed.join(' or ')}, got '${v}'`);
  return v;
}

export function rejectUnknownOptions(args: ParsedArgs, known: readonly string[]): void {
  for (const k of args.options.keys()) {
    if (!known.includes(k)) throw new UsageError(`unknown option --${k}`);
  }
}
