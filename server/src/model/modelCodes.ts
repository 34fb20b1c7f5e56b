/**
 * Problem codes raised while building the model and checking the physics.
 * Stable ids: quick fixes and tests switch on them, so never rename one.
 */
import type { ProblemSeverity } from '../format/ast';

interface RuleInfo {
  severity: ProblemSeverity;
  summary: string;
}

export const MODEL_RULES = {
  'value-missing': { severity: 'error', summary: 'A setting has no value.' },
  'value-extra': { severity: 'warning', summary: 'A setting has more items than it uses.' },
  'value-not-number': { severity: 'error', summary: 'A setting needs a plain number.' },
  'value-not-allowed': { severity: 'error', summary: 'A setting takes one of a fixed set of words.' },
  'value-out-of-range': { severity: 'error', summary: 'A value is negative or zero where it cannot be.' },
  'spin-not-half-integer': { severity: 'error', summary: 'An angular momentum that is not a multiple of 1/2.' },
  'spin-negative': { severity: 'error', summary: 'A negative angular momentum.' },
  'spin-too-large': { severity: 'error', summary: 'An angular momentum beyond what the engine handles.' },
  'name-missing': { severity: 'error', summary: 'A block or level has no name.' },
  'name-duplicate': { severity: 'error', summary: 'Two things of one kind share a name.' },
  'name-unknown': { severity: 'error', summary: 'A reference to a name that is not defined.' },
  'name-ambiguous': { severity: 'error', summary: 'A level name used by several species, written without its species.' },
  'species-needs-mass': { severity: 'error', summary: 'A species defined by hand has no mass.' },
  'species-needs-nuclear-g': { severity: 'warning', summary: 'A nucleus with spin but no g_I or mu_I; g_I is taken as 0.' },
  'species-g-conflict': { severity: 'warning', summary: 'g_I and mu_I are both given and disagree.' },
  'species-mass-number': { severity: 'warning', summary: 'A mass far from the species\u2019 mass number.' },
  'level-needs-term': { severity: 'error', summary: 'A level has no term symbol.' },
  'level-needs-j': { severity: 'error', summary: 'A level term without J (and without zeta).' },
  'zeta-needs-term': { severity: 'warning', summary: 'zeta given for a level with J; it applies to a whole term.' },
  'term-hyperfine-unsupported': { severity: 'warning', summary: 'Hyperfine constants on a whole term are not used.' },
  'hyperfine-without-nucleus': { severity: 'warning', summary: 'A hyperfine constant on a species with no nuclear spin.' },
  'dipole-cannot-act': { severity: 'warning', summary: 'A needs J \u2265 1/2 to act (a J = 0 level has no hyperfine structure).' },
  'quadrupole-cannot-act': { severity: 'warning', summary: 'B needs I \u2265 1 and J \u2265 1 to act.' },
  'octupole-cannot-act': { severity: 'warning', summary: 'C needs I \u2265 3/2 and J \u2265 3/2 to act.' },
  'gj-measured-differs': { severity: 'info', summary: 'A measured g_J differs from the LS-coupling value.' },
  'field-needs-value': { severity: 'error', summary: 'A field block without a value.' },
  'field-beyond-physical': { severity: 'error', summary: 'A field above 1e5 T, beyond what the Hamiltonian describes (near the atomic unit of field).' },
  'magnet-incomplete': { severity: 'warning', summary: 'A magnet lacks a field, gradient or length.' },
  'beam-incomplete': { severity: 'warning', summary: 'A beam lacks a setting it needs.' },
  'beam-source-malformed': { severity: 'error', summary: 'A beam source that is not oven/jet/speed with its values.' },
  'beam-slits-malformed': { severity: 'error', summary: 'Slits not written as width, width apart length.' },
  'resonance-incomplete': { severity: 'error', summary: 'A resonance block lacks its level or half of its pair.' },
  'resonance-sublevel-malformed': { severity: 'error', summary: 'A sublevel not written as F and m_F.' },
  'resonance-range-malformed': { severity: 'error', summary: 'A field range not written as two fields.' },
  'beam-detector-malformed': { severity: 'error', summary: 'A detector not written as width [at offset].' },
  'beam-populations-malformed': { severity: 'error', summary: 'Populations not written as F m weight groups.' },
  'line-incomplete': { severity: 'error', summary: 'A line without both levels.' },
  'line-across-species': { severity: 'error', summary: 'A line between levels of different species.' },
  'line-same-level': { severity: 'error', summary: 'A line from a level to itself.' },
  'line-to-whole-term': { severity: 'warning', summary: 'A line to a whole term (zeta, no J): not computed; name a J level.' },
  'line-written-as-emission': { severity: 'info', summary: 'A line written upper level first: computed as that emission line.' },
  'lifetime-not-positive': { severity: 'error', summary: 'A level lifetime or natural linewidth of zero or below.' },
  'lifetime-and-linewidth': { severity: 'warning', summary: 'A level gives both lifetime and linewidth; the lifetime is used.' },
  'spectrum-setting-unused': { severity: 'warning', summary: 'A line shape setting on a line without `spectrum`: nothing uses it.' },
  'spectrum-points-out-of-range': { severity: 'error', summary: 'A spectrum with too few or too many points.' },
  'line-levels-same-energy': { severity: 'warning', summary: 'A line between two levels of equal energy: no centre frequency.' },
  'use-file-missing': { severity: 'error', summary: 'A `use` path that leads to no readable file.' },
  'use-has-errors': { severity: 'warning', summary: 'A used file has errors of its own (reported in that file).' },
  'use-cycle': { severity: 'error', summary: 'Files that use each other in a circle.' },
  'use-too-deep': { severity: 'error', summary: 'A chain of `use` statements deeper than the limit.' },
  'use-not-setup-file': { severity: 'error', summary: 'A `use` path that does not name a .sublevel file (it is not read).' },
  'use-outside-root': { severity: 'error', summary: 'A `use` path outside the workspace folder or root (it is not read).' },
  'use-file-too-large': { severity: 'error', summary: 'A used file larger than the cap for used files (it is not read).' },
} as const satisfies Record<string, RuleInfo>;

export type ModelCode = keyof typeof MODEL_RULES;
