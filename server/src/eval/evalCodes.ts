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
  'level-too-large': { severity: 'error', summary: 'A level has more sublevels than the engine handles.' },
  'level-not-computed': { severity: 'error', summary: 'The eigen-solver failed for a level at one working field.' },
  'document-too-large': { severity: 'error', summary: 'A file longer than the document cap; it is not checked.' },
  'too-many-statements': { severity: 'error', summary: 'A file with more statements than the cap; it is not checked.' },
  'evaluation-cut-short': { severity: 'warning', summary: 'The evaluation was stopped (time limit or failure); its findings are missing.' },
  'fit-too-few-points': { severity: 'error', summary: 'Fewer data points than free parameters (info when equal: χ² says nothing).' },
  'fit-model-failed': { severity: 'error', summary: 'The model cannot be computed at the starting values.' },
  'fit-not-converged': { severity: 'error', summary: 'The fit stopped without reaching a minimum; its values are not a best fit.' },
  'fit-undetermined': { severity: 'error', summary: 'The data do not determine a combination of the free parameters.' },
  'fit-near-degenerate': { severity: 'warning', summary: 'Two free parameters more than 99.9 % correlated.' },
  'fit-chi2-high': { severity: 'warning', summary: 'χ²/dof far above 1: model and data disagree, or the uncertainties are too small.' },
  'fit-chi2-low': { severity: 'warning', summary: 'χ²/dof far below 1: the uncertainties look too large.' },
  'fit-at-start': { severity: 'info', summary: 'The starting values are already a minimum of χ².' },
  'fit-pair-not-found': { severity: 'error', summary: 'A data pair that the level does not have, or not a magnetic-dipole pair for resonance data.' },
  'fit-several-roots': { severity: 'info', summary: 'A one-resonance calibration is resonant at several fields in the range; all are listed.' },
  'fit-no-root': { severity: 'warning', summary: 'A one-resonance calibration finds no field in the range.' },
  'fit-not-possible': { severity: 'error', summary: 'A fit that cannot be set up (mixed levels, mixed uncertainties, a point without field, a level kind not fitted).' },
} as const satisfies Record<string, { severity: ProblemSeverity; summary: string }>;
