/**
 * Reading a command's arguments with the platform's `util.parseArgs` (strict): positional words
 * and the command's own `--name value` / `--name=value` options. Everything else is a usage
 * error with a plain message: unknown or repeated options, a missing value, a flag given a value.
 */
import { parseArgs as nodeParseArgs } from 'util';
import { suggestNames } from '../format/didYouMean';
import { listWords } from '../physics/listWords';

export interface OptionSpec {
  /** Placeholder for the value in help (`NAME`, `FILE`); absent for an option that takes none. */
  value?: string;
  help: string;
  /** The only values allowed, if the option has a fixed set. */
  choices?: readonly string[];
}

export interface CommandSpec {
  name: string;
  /** The positional part of the synopsis, e.g. `<file>`. */
  operands: string;
  summary: string;
  options: Readonly<Record<string, OptionSpec>>;
  /** Extra lines of help after the options (examples, limits). */
  notes?: readonly string[];
}

export interface ParsedArgs {
  command: string;
  positionals: string[];
  /** Option name → value (`true` for an option without a value). `help` is set for -h/--help. */
  options: Map<string, string | true>;
}

export class UsageError extends Error {}

type NodeOptions = Record<string, { type: 'string' | 'boolean'; short?: string }>;

function nodeOptions(spec: CommandSpec): NodeOptions {
  const out: NodeOptions = { help: { type: 'boolean', short: 'h' } };
  for (const [name, o] of Object.entries(spec.options)) out[name] = { type: o.value ? 'string' : 'boolean' };
  return out;
}

/** The option name in one of util.parseArgs's error messages (`'--to'`, `'-x'`, `'--to <value>'`, `'-h, --help'`). */
function optionIn(message: string): string {
  return /'(?:-\w, )?(-{1,2}[^' ]*)/.exec(message)?.[1] ?? 'an option';
}

function translate(spec: CommandSpec, e: Error & { code?: string }): UsageError {
  const opt = optionIn(e.message);
  if (e.code === 'ERR_PARSE_ARGS_UNKNOWN_OPTION') {
    const names = ['help', ...Object.keys(spec.options)];
    const hint = suggestNames(opt.replace(/^-+/, ''), names).map((n) => `--${n}`);
    return new UsageError(`${spec.name} has no option ${opt}${hint.length ? ` — did you mean ${hint.join(' or ')}?` : ''}`);
  }
  if (e.code === 'ERR_PARSE_ARGS_INVALID_OPTION_VALUE') {
    if (/does not take an argument/.test(e.message)) return new UsageError(`${opt} takes no value`);
    return new UsageError(`${opt} needs a value`);
  }
  return new UsageError(e.message);
}

/**
 * `--from -5 mT`: util.parseArgs refuses a separate value that starts with `-` (it could be a
 * forgotten value followed by an option). A negative number cannot be an option here, so it is
 * joined to its option as `--from=-5 mT`.
 */
function joinNegativeValues(spec: CommandSpec, argv: string[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    const next = argv[i + 1];
    const name = a.startsWith('--') && !a.includes('=') ? a.slice(2) : undefined;
    if (name !== undefined && spec.options[name]?.value && next !== undefined && /^-[0-9.]/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
    if (a === '--') {
      out.push(...argv.slice(i + 1));
      break;
    }
  }
  return out;
}

/** Parses the words after the command name against the command's options. */
export function parseCommandArgs(spec: CommandSpec, argv: string[]): ParsedArgs {
  let tokens;
  try {
    const args = joinNegativeValues(spec, argv);
    ({ tokens } = nodeParseArgs({ args, options: nodeOptions(spec), allowPositionals: true, strict: true, tokens: true }));
  } catch (e) {
    throw translate(spec, e as Error & { code?: string });
  }
  const positionals: string[] = [];
  const options = new Map<string, string | true>();
  for (const t of tokens) {
    if (t.kind === 'positional') positionals.push(t.value);
    if (t.kind !== 'option') continue;
    if (options.has(t.name)) throw new UsageError(`--${t.name} is given more than once`);
    options.set(t.name, t.value ?? true);
  }
  return { command: spec.name, positionals, options };
}

/** The value of an option, checked against its fixed set of values if it has one. */
export function stringOption(args: ParsedArgs, name: string, allowed?: readonly string[]): string | undefined {
  const v = args.options.get(name);
  if (v === undefined) return undefined;
  if (v === true || v === '') throw new UsageError(`--${name} needs a value`);
  if (allowed && !allowed.includes(v)) throw new UsageError(`--${name} must be ${choiceList(allowed)}, got '${v}'`);
  return v;
}

/** `a, b or c`: a fixed set of values as a sentence says it. */
export function choiceList(items: readonly string[]): string {
  return listWords(items);
}
