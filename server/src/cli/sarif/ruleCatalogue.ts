/**
 * Every diagnostic code Sublevel can report, from the five registries (syntax and units, model,
 * evaluation, physics, command line), with its default severity, a summary, the stage that finds
 * it and help text. SARIF rules are made from this list, so a CI page can explain any finding.
 */
import type { ProblemSeverity } from '../../format/ast';
import { RULES } from '../../format/codes';
import { MODEL_RULES } from '../../model/modelCodes';
import { EVAL_RULES } from '../../eval/evalCodes';
import { PHYSICS_RULES } from '../../physics/issueCodes';
import { CLI_RULES } from '../cliCodes';

export interface RuleEntry {
  id: string;
  severity: ProblemSeverity;
  summary: string;
  /** The step that finds it, in words ("the parser"). */
  stage: string;
  help: string;
}

const STAGE_WORDS: Readonly<Record<string, string>> = {
  syntax: 'the parser',
  unit: 'the unit reader',
  model: 'the model builder (names, values, levels)',
  physics: 'the physics core',
  evaluation: 'the evaluation at the working fields',
  cli: 'the command line (paths it is given)',
};

/** Where to read more and what to do, by code family; the first matching prefix wins. */
const FAMILY_HELP: readonly [RegExp, string][] = [
  [/^syntax-/, 'Rewrite the statement in the shape docs/format.md gives; the parser skips what it cannot place and reads on.'],
  [/^text-/, 'Remove or retype the character: setup files are plain UTF-8 text (docs/reliability.md).'],
  [/^unit-/, 'Write a number with a unit of the kind the setting needs, e.g. 0.45 T, 180 T/m, 8 cm (units in docs/format.md).'],
  [/^(?:value|spin|name)-/, 'Correct the value or name as the message says; docs/format.md lists what each setting takes.'],
  [/^(?:species|level|zeta|term|hyperfine|dipole|quadrupole|octupole|gj|config)-/, 'Check the level against docs/format.md (species, levels, term symbols) and the published data for the species.'],
  [/^(?:use)-/, 'Check the `use` path: a .sublevel file inside the root that exists and has no errors (docs/format.md).'],
  [/^coil-/, 'Check the winding against docs/fields.md (cautions): a thicker conductor, less current or cooling; follow your lab\u2019s rules.'],
  [/^(?:magnet|trajectory)-(?:line|gradient|spin|deflection|forward|field|meets|not|level)/, 'A magnet built from sources: see docs/beam.md §7 (the frame, the flights and what each finding means); move `at` or change the sources as the message says.'],
  [/^(?:source|vector|direction)-/, 'Check the coil, solenoid, wire or slab block against docs/format.md; the field formulas and their limits are in docs/fields.md.'],
  [/^trap-/, 'Check the trap block against docs/traps.md (region, sources, level, gravity, temperature, cut); the message names the sublevel.'],
  [/^(?:field|magnet|beam)-/, 'Check the apparatus settings against docs/beam.md; the message names the setting and the value.'],
  [/^(?:line|resonance|pair|scan|no-resonance|no-insensitive)/, 'Check the line or resonance against docs/transitions.md; the message names the levels involved.'],
  [/^(?:r2|diamagnetic)-/, 'Give a whole term the valence electron\u2019s ⟨r²⟩ as `r2 = … a0^2` (docs/format.md); the diamagnetic term it adds is in docs/engine.md.'],
  [/^(?:fit|data)-/, 'Check the data and fit blocks against docs/fit.md (points, CSV columns, free parameters, starting values); the message names the point or parameter.'],
  [/^slower-/, 'Check the slower block against docs/slower.md: the line, speeds, safety factor, bias and coils; the message names what is missing or where atoms are lost.'],
  [/^zeeman-/, 'Read the exact sublevel energies rather than the linear formula at this field (docs/engine.md).'],
  [/^(?:document|too-many|evaluation-cut|level-too|level-not)/, 'The file or a level is past a size or time cap; the caps are listed in docs/reliability.md.'],
  [/^(?:file|folder|link|nothing)-/, 'Check the path given on the command line (docs/reliability.md, "Exit codes" and "Files").'],
  [/^internal-error$/, 'Sublevel failed on this file; please report it with the file attached.'],
];

const ENGINE_HELP = 'A value handed to the exact engine was out of its domain; docs/engine.md says what it accepts.';

export function helpFor(id: string): string {
  return FAMILY_HELP.find(([re]) => re.test(id))?.[1] ?? ENGINE_HELP;
}

function entries(stageOf: (id: string) => string, table: Readonly<Record<string, { severity: ProblemSeverity; summary: string }>>): RuleEntry[] {
  return Object.entries(table).map(([id, r]) => ({ id, severity: r.severity, summary: r.summary, stage: STAGE_WORDS[stageOf(id)] ?? stageOf(id), help: helpFor(id) }));
}

let catalogue: readonly RuleEntry[] | undefined;

/**
 * One entry per code; a code in two registries (an evaluation check that repeats a physics one)
 * is listed once, first come. Made on first use: only SARIF output reads it, and matching every
 * code against the help patterns would cost every `check` its time at start-up (docs/speed.md).
 */
export function ruleCatalogue(): readonly RuleEntry[] {
  catalogue ??= (() => {
    const internal: RuleEntry = {
      id: 'internal-error',
      severity: 'error',
      summary: 'Sublevel itself failed while reading the file.',
      stage: 'the pipeline',
      help: helpFor('internal-error'),
    };
    const all = [
      ...entries((id) => RULES[id]!.stage, RULES),
      ...entries(() => 'model', MODEL_RULES),
      ...entries(() => 'evaluation', EVAL_RULES),
      ...entries(() => 'physics', PHYSICS_RULES),
      ...entries(() => 'cli', CLI_RULES),
      internal,
    ];
    const seen = new Set<string>();
    return all.filter((r) => !seen.has(r.id) && seen.add(r.id));
  })();
  return catalogue;
}

/** A rule for a code no registry lists (a future code): described by the finding itself. */
export function unlistedRule(id: string, severity: ProblemSeverity): RuleEntry {
  return { id, severity, summary: `Finding ${id}.`, stage: 'Sublevel', help: helpFor(id) };
}
