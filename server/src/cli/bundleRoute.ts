/**
 * Which CLI bundle answers a command line, told from its first word alone so that the launcher
 * (dist/cli.js) loads nothing else to decide: the core bundle has the commands of
 * coreCommands.ts and the version; everything else, the overview help and every usage error
 * about the first word included, goes to the full bundle, which has every command.
 */
const CORE_WORDS: ReadonlySet<string> = new Set(['check', 'eval', '--version', '-V']);

export type CliBundle = 'core' | 'full';

export function bundleFor(firstWord: string | undefined): CliBundle {
  return firstWord !== undefined && CORE_WORDS.has(firstWord) ? 'core' : 'full';
}
