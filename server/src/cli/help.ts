/** Help texts: the overview (`sublevel --help`) and one page per command (`sublevel <command> --help`). */
import type { CommandSpec } from './args';

/** The overview's exit codes: every command's, then diff's own (it follows diff(1)). */
export const EXIT_CODES_TEXT =
  'exit codes: 0 no errors (warnings and notes allowed; see --fail-on), 1 an error in a setup file or a file that cannot be read, 2 usage error or --out not written, 3 internal error; diff: 0 no physical change, 1 changes, 2 usage or a file that cannot be read';

/** One command's exit codes: only what that command can do (--fail-on and --out where it has them). */
export function commandExitCodes(spec: CommandSpec): string {
  if (spec.name === 'diff') return 'exit codes: 0 no physical change, 1 changes, 2 usage error or a file that cannot be read, 3 internal error';
  const allowed = 'fail-on' in spec.options ? 'warnings and notes allowed; see --fail-on' : 'warnings and notes allowed';
  const usage = 'out' in spec.options ? 'usage error or --out not written' : 'usage error';
  return `exit codes: 0 no errors (${allowed}), 1 an error in a setup file or a file that cannot be read, 2 ${usage}, 3 internal error`;
}

export function overviewHelp(specs: readonly CommandSpec[]): string {
  const width = Math.max(...specs.map((s) => s.name.length));
  return [
    'usage: sublevel <command> [options]',
    '',
    'commands:',
    ...specs.map((s) => `  ${s.name.padEnd(width)}  ${s.summary}`),
    '',
    "'sublevel <command> --help' lists a command's options; 'sublevel --version' prints the version.",
    EXIT_CODES_TEXT,
  ].join('\n');
}

export function commandHelp(spec: CommandSpec): string {
  const rows: [string, string][] = Object.entries(spec.options).map(([name, o]) => [
    `--${name}${o.value ? ` ${o.choices ? o.choices.join('|') : o.value}` : ''}`,
    o.help,
  ]);
  rows.push(['-h, --help', 'this text']);
  const width = Math.max(...rows.map(([l]) => l.length));
  return [
    `usage: sublevel ${spec.name} ${spec.operands} [options]`,
    '',
    spec.summary,
    '',
    'options:',
    ...rows.map(([l, h]) => `  ${l.padEnd(width)}  ${h}`),
    ...(spec.notes?.length ? ['', ...spec.notes] : []),
    '',
    commandExitCodes(spec),
  ].join('\n');
}

export function usageHint(command: string | undefined): string {
  return command ? `(sublevel ${command} --help lists its options)` : '(sublevel --help lists the commands)';
}
