/**
 * `sublevel diff`: what changed physically between two versions of a setup file. Both versions
 * are analysed as `eval` would; the comparison itself is server/src/diff/. Exit codes follow
 * diff(1): 0 no physical change, 1 changes, 2 trouble (usage, a file or revision that cannot be
 * read), 3 internal error. As a git external diff driver (--git-driver) it exits 0 after a
 * comparison, since git stops at a driver that exits otherwise.
 */
import { analyze, type Analysis } from '../eval/analyze';
import { decodeSetupBytes } from '../format/textDecoding';
import { diskSources } from '../service/workspaceFiles';
import { compareSetups } from '../diff/compareSetups';
import { diffMarkdown, diffText } from '../diff/diffText';
import { type CommandSpec, type ParsedArgs, stringOption, UsageError } from './args';
import { withReaderProblems } from './analyzeFile';
import { DIFF_THRESHOLD_OPTIONS, diffThresholds } from './diffThresholdOptions';
import { jsonText } from './escape';
import { diagnosticLine } from './fileProblems';
import { ROOT_OPTION, rootOption } from './files';
import { gitShowFile } from './git';
import type { CliContext } from './io';
import { readSetup } from './readSetup';

const FORMATS = ['text', 'json', 'markdown'] as const;
/** git hands an external diff driver: path old-file old-hex old-mode new-file new-hex new-mode. */
const GIT_DRIVER_ARGS = 7;

export const diffSpec: CommandSpec = {
  name: 'diff',
  operands: '<old> <new> | --git <rev> <file>',
  summary: 'what changed physically between two versions of a setup (g-factors, energies, peaks, resonances, diagnostics); exit 1 if anything did',
  options: {
    format: { value: 'FORMAT', choices: FORMATS, help: 'text (default); json: one document (format sublevel-diff); markdown: for a review comment' },
    git: { value: 'REV', help: 'compare <file> as stored at git revision REV (e.g. HEAD, main) with the file on disk' },
    'git-driver': { help: "run as git's external diff driver (git passes 7 arguments; see docs/ci.md); exits 0" },
    quiet: { help: 'print nothing; the exit code says whether anything changed' },
    ...DIFF_THRESHOLD_OPTIONS,
    ...ROOT_OPTION,
  },
  notes: [
    'Things are matched by name (levels as species.level), so moved text is no change; diagnostics are matched by code and thing.',
    'Thresholds, formats and the git diff driver: docs/ci.md.',
  ],
};

/** One version to compare: its text, or the problem that kept it from being read. */
type Version = { label: string; file: string; analysis: Analysis } | { label: string; file: string; unreadable: string[] };

function fromDisk(file: string, label: string, root: string | undefined, ctx: CliContext): Version {
  const read = readSetup(file, ctx.fsys);
  if (!read.ok) return { label, file, unreadable: [diagnosticLine(file, read.problem)] };
  return { label, file, analysis: withReaderProblems(analyze(read.text, diskSources(file, root)), read.problems) };
}

function fromBytes(bytes: Uint8Array, file: string, label: string, root: string | undefined): Version {
  const decoded = decodeSetupBytes(bytes);
  return { label, file, analysis: withReaderProblems(analyze(decoded.text, diskSources(file, root)), decoded.problems) };
}

/** Git's side of a file that does not exist on that side. */
const NO_FILE = '/dev/null';

function versions(args: ParsedArgs, root: string | undefined, ctx: CliContext): [Version, Version] {
  const rev = stringOption(args, 'git');
  const words = args.positionals;
  if (args.options.has('git-driver')) {
    if (rev !== undefined) throw new UsageError('--git-driver and --git cannot be used together');
    if (words.length !== GIT_DRIVER_ARGS) throw new UsageError(`--git-driver takes the ${GIT_DRIVER_ARGS} arguments git passes to an external diff driver, got ${words.length}`);
    const [name, oldFile, , , newFile] = words as [string, string, string, string, string];
    const side = (file: string, label: string): Version => (file === NO_FILE ? fromBytes(new Uint8Array(), name, label, root) : fromDisk(file, label, root, ctx));
    return [side(oldFile, `a/${name}`), side(newFile, `b/${name}`)];
  }
  if (rev !== undefined) {
    if (words.length !== 1) throw new UsageError('diff --git <rev> needs exactly one file');
    const file = words[0]!;
    return [fromBytes(gitShowFile(rev, file), file, `${file} at ${rev}`, root), fromDisk(file, file, root, ctx)];
  }
  if (words.length !== 2) throw new UsageError('diff needs two setup files (or --git <rev> and one file)');
  return [fromDisk(words[0]!, words[0]!, root, ctx), fromDisk(words[1]!, words[1]!, root, ctx)];
}

export function runDiff(args: ParsedArgs, ctx: CliContext): number {
  const format = stringOption(args, 'format', FORMATS) ?? 'text';
  const thresholds = diffThresholds(args);
  const root = rootOption(stringOption(args, 'root'), ctx.fsys);
  const [a, b] = versions(args, root, ctx);
  if ('unreadable' in a || 'unreadable' in b) {
    for (const v of [a, b]) if ('unreadable' in v) for (const line of v.unreadable) ctx.io.err(line);
    return 2;
  }
  const diff = compareSetups({ label: a.label, analysis: a.analysis }, { label: b.label, analysis: b.analysis }, thresholds);
  if (!args.options.has('quiet')) {
    if (format === 'json') ctx.io.out(jsonText(diff));
    else for (const line of format === 'markdown' ? diffMarkdown(diff) : diffText(diff)) ctx.io.out(line);
  }
  if (args.options.has('git-driver')) return 0;
  return diff.changed ? 1 : 0;
}

