/** Problem codes raised by the evaluation (physics at the file's fields). Stable ids. */
import type { ProblemSeverity } from '../format/ast';

export const EVAL_RULES = {
  'zeeman-not-linear': { severity: 'info', summary: 'A level is past the linear (weak-field) regime at a working field.' },
  'zeeman-strong-field': { severity: 'info', summary: 'A level is in the strong-field regime; low-field labels mislead.' },
  'beam-unresolved': { severity: 'warning', summary: 'Neighbouring peaks of a beam would merge on the detector.' },
  'beam-slits-too-wide': { severity: 'error', summary: 'Slits so wide for their separation that the collimated beam is not narrow.' },
  'beam-misses-detector': { severity: 'warning', summary: 'A detector placed where (almost) no atoms arrive.' },
  'resonance-unreachable': { severity: 'warning', summary: 'No transition reaches the given frequency in the field range.' },
  'resonance-no-such-pair': { severity: 'error', summary: 'The named sublevels have no magnetic-dipole or two-photon transition.' },
  'hyperfine-between-levels-assumed': { severity: 'info', summary: 'A whole term\u2019s hyperfine coupling between J levels rests on the stated assumption a_L = a_SD.' },
  'level-too-large': { severity: 'error', summary: 'A level has more sublevels than the engine handles.' },
  'level-not-computed': { severity: 'error', summary: 'The eigen-solver failed for a level at one working field.' },
  'document-too-large': { severity: 'error', summary: 'A file longer than the document cap; it is not checked.' },
  'too-many-statements': { severity: 'error', summary: 'A file with more statements than the cap; it is not checked.' },
  'uncertainty-one-sided': { severity: 'info', summary: 'Uncertain states degenerate inside one block: their uncertainty is the one-sided (increasing-input) value.' },
  'uncertainty-undefined': { severity: 'warning', summary: 'A result with uncertain inputs whose first-order uncertainty does not exist (a double root, a zero slope).' },
  'evaluation-cut-short': { severity: 'warning', summary: 'The evaluation was stopped (time limit or failure); its findings are missing.' },
} as const satisfies Record<string, { severity: ProblemSeverity; summary: string }>;
