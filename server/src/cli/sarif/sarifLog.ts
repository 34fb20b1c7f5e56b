/**
 * A SARIF 2.1.0 log (the OASIS interchange format for static-analysis results) for the findings
 * of `sublevel check`: one run, one rule per diagnostic code, one result per finding with its
 * exact region. Lines and columns are 1-based as SARIF wants; columns count UTF-16 code units
 * (the editor protocol's unit, said in `columnKind`). Files below the root are written relative
 * to the `SRCROOT` base, which `originalUriBaseIds` maps to the root's file URI.
 */
import * as path from 'path';
import { fileURLToPath, pathToFileURL } from 'url';
import type * as Sarif from 'sarif';
import type { Problem, ProblemSeverity, Range } from '../../format/ast';
import { ruleCatalogue, type RuleEntry, unlistedRule } from './ruleCatalogue';

export const SARIF_SCHEMA_URI = 'https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json';
export const ROOT_BASE_ID = 'SRCROOT';

export interface SarifFile {
  /** The path as the command found it (relative to `cwd` or absolute). */
  path: string;
  problems: readonly Problem[];
}

export interface SarifSettings {
  toolVersion: string;
  /** Absolute folder that artifact URIs are relative to. */
  root: string;
  /** Absolute folder relative paths are resolved against. */
  cwd: string;
}

const LEVEL: Readonly<Record<ProblemSeverity, Sarif.ReportingConfiguration.level>> = { error: 'error', warning: 'warning', info: 'note', hint: 'note' };

function rule(r: RuleEntry): Sarif.ReportingDescriptor {
  return {
    id: r.id,
    shortDescription: { text: r.summary },
    fullDescription: { text: `${r.summary} Found by ${r.stage}; default severity: ${r.severity}.` },
    help: { text: r.help },
    defaultConfiguration: { level: LEVEL[r.severity] },
  };
}

/** A folder's file URI with the trailing slash a base URI needs. */
function folderUri(folder: string): string {
  const href = pathToFileURL(folder).href;
  return href.endsWith('/') ? href : `${href}/`;
}

function artifactLocation(file: string, settings: SarifSettings): Sarif.ArtifactLocation {
  const absolute = path.resolve(settings.cwd, file);
  const relative = path.relative(settings.root, absolute);
  if (relative === '' || relative.startsWith('..') || path.isAbsolute(relative)) return { uri: pathToFileURL(absolute).href };
  return { uri: relative.split(path.sep).map(encodeURIComponent).join('/'), uriBaseId: ROOT_BASE_ID };
}

function region(r: Range): Sarif.Region {
  return { startLine: r.start.line + 1, startColumn: r.start.character + 1, endLine: r.end.line + 1, endColumn: r.end.character + 1 };
}

/** A related place: in the same file, or in a used file named by path or file URI. */
function relatedFile(uri: string | undefined, file: string): string {
  if (uri === undefined) return file;
  return uri.startsWith('file:') ? fileURLToPath(uri) : uri;
}

export function sarifLog(files: readonly SarifFile[], settings: SarifSettings): Sarif.Log {
  const rules = [...ruleCatalogue()];
  const indexOf = new Map(rules.map((r, i) => [r.id, i]));
  const ruleIndex = (p: Problem): number => {
    let i = indexOf.get(p.code);
    if (i === undefined) {
      i = rules.push(unlistedRule(p.code, p.severity)) - 1;
      indexOf.set(p.code, i);
    }
    return i;
  };
  const results: Sarif.Result[] = [];
  for (const f of files) {
    for (const p of f.problems) {
      const related = (p.related ?? []).map((r, id) => ({
        id,
        message: { text: r.message },
        physicalLocation: { artifactLocation: artifactLocation(relatedFile(r.uri, f.path), settings), region: region(r.range) },
      }));
      results.push({
        ruleId: p.code,
        ruleIndex: ruleIndex(p),
        level: LEVEL[p.severity],
        message: { text: p.message },
        locations: [{ physicalLocation: { artifactLocation: artifactLocation(f.path, settings), region: region(p.range) } }],
        ...(related.length ? { relatedLocations: related } : {}),
      });
    }
  }
  return {
    $schema: SARIF_SCHEMA_URI,
    version: '2.1.0',
    runs: [
      {
        tool: { driver: { name: 'sublevel', version: settings.toolVersion, semanticVersion: settings.toolVersion, rules: rules.map(rule) } },
        originalUriBaseIds: { [ROOT_BASE_ID]: { uri: folderUri(settings.root) } },
        columnKind: 'utf16CodeUnits',
        results,
      },
    ],
  };
}
