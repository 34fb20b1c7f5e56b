/**
 * Codes of the problems the CLI itself finds about the paths it is given: files it cannot read
 * and folders it cannot search. Stable ids like the other registries (users' CI filters use them).
 * Each is reported as `file:line:col severity code message`, in text and in JSON, per path, and
 * the run goes on with the other paths.
 */
import type { ProblemSeverity } from '../format/ast';

export const CLI_RULES = {
  'file-missing': { severity: 'error', summary: 'No file or folder at a path named on the command line.' },
  'file-unreadable': { severity: 'error', summary: 'A setup file that exists but cannot be read (permission, I/O error).' },
  'file-not-regular': { severity: 'error', summary: 'A path that is a folder, a FIFO, a socket or a device where a setup file is needed.' },
  'file-too-large': { severity: 'error', summary: 'A file too large to be a setup file (over 3 bytes per allowed character); it is not read.' },
  'folder-unreadable': { severity: 'error', summary: 'A folder that cannot be listed while searching for setup files.' },
  'link-broken': { severity: 'error', summary: 'A symbolic link named *.sublevel whose target does not exist.' },
  'link-repeated': { severity: 'info', summary: 'A link to a folder or file already searched (a loop or a second path to it); not followed again.' },
  'folder-too-deep': { severity: 'error', summary: 'Folders nested deeper than the search goes (64 levels).' },
  'nothing-to-compute': { severity: 'error', summary: 'The file lacks what the command needs (no beam to profile, no level to draw).' },
} as const satisfies Record<string, { severity: ProblemSeverity; summary: string }>;

export type CliCode = keyof typeof CLI_RULES;
