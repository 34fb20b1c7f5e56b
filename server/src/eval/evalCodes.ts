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
  'spectrum-no-linewidth': { severity: 'warning', summary: 'The upper level of a line with a spectrum has no lifetime or linewidth: no natural width.' },
  'spectrum-no-width': { severity: 'warning', summary: 'A spectrum with no width at all (no lifetime, Doppler or instrument width): not drawn.' },
  'spectrum-no-line-frequency': { severity: 'warning', summary: 'A Doppler width asked for on a line whose frequency is unknown.' },
  'spectrum-nothing-seen': { severity: 'warning', summary: 'No component of the line is seen from that direction through that analyser.' },
  'spectrum-analyser-mixes': { severity: 'info', summary: 'Across the field an analyser cannot separate σ+ from σ−.' },
  'spectrum-doppler-beam': { severity: 'warning', summary: 'A spectrum takes its Doppler width from a beam that cannot give one.' },
  'spectrum-span-cuts': { severity: 'warning', summary: 'The span of a spectrum leaves some seen components outside its window.' },
  'spectrum-undersampled': { severity: 'warning', summary: 'Samples of a spectrum further apart than half the line width: peaks may be missed.' },
  'level-too-large': { severity: 'error', summary: 'A level has more sublevels than the engine handles.' },
  'level-not-computed': { severity: 'error', summary: 'The eigen-solver failed for a level at one working field.' },
  'document-too-large': { severity: 'error', summary: 'A file longer than the document cap; it is not checked.' },
  'too-many-statements': { severity: 'error', summary: 'A file with more statements than the cap; it is not checked.' },
  'evaluation-cut-short': { severity: 'warning', summary: 'The evaluation was stopped (time limit or failure); its findings are missing.' },
} as const satisfies Record<string, { severity: ProblemSeverity; summary: string }>;
