/**
 * Diagnostics from a beam's evaluation: the beam engine's own problems (its stable codes, e.g.
 * `beam-slits-too-wide`, `beam-misses-detector`) and unresolvable peaks (or one merged peak) with what would resolve them.
 */
import type { Problem } from '../format/ast';
import type { BeamModel } from '../model/types';
import type { BeamEvaluation } from './beamEvaluation';
import { lengthText } from './quantityText';
import type { BeamResult } from './resultTypes';
import { EVAL_RULES } from './evalCodes';
import { lonePeak } from './lonePeak';

export function beamDiagnostics(beam: BeamModel, e: BeamEvaluation): Problem[] {
  const out: Problem[] = [];
  for (const i of e.issues) {
    // Findings about a magnet built from sources go on its `at` (or `sources`) setting, with the beam related.
    const onMagnet = /^(?:magnet|trajectory)-/.test(i.code) ? beam.magnet?.atM?.range ?? beam.magnet?.fieldT?.range : undefined;
    const where = i.code.includes('detector') ? beam.detectorM?.range : i.code.includes('slit') ? beam.slits?.range : onMagnet;
    out.push({
      code: i.code,
      severity: i.severity,
      message: `beam '${beam.name}': ${i.message}`,
      range: where ?? beam.nameRange,
      ...(onMagnet ? { related: [{ message: `beam '${beam.name}' flies through this magnet`, range: beam.nameRange }] } : {}),
    });
  }
  for (const u of e.unmatchedPopulations ?? []) {
    out.push({
      code: 'beam-population-unmatched',
      severity: EVAL_RULES['beam-population-unmatched'].severity,
      message: `beam '${beam.name}': level ${beam.level?.name ?? ''} has no ${u.named} (it has ${u.has}), so this population is not used`,
      range: u.range,
    });
  }
  const r = e.result;
  if (!r.computed || r.all_resolved !== false) return out;
  if (lonePeak(r) === 'merged') {
    out.push(onePeak(beam, r, e.pattern?.image?.kernelFwhmM, e.nothingWithinReach === true));
    return out;
  }
  const merged = r.pairs.filter((p) => !p.resolved);
  const names = merged.map((p) => `${peakName(r.peaks[p.left]?.members)} and ${peakName(r.peaks[p.right]?.members)}`);
  const gradient = beam.magnet?.gradientTPerM;
  const advice = r.resolving_advice ? ` ${r.resolving_advice}` : '';
  const related = [{ message: `beam '${beam.name}' uses this magnet`, range: beam.nameRange }];
  out.push({
    code: 'beam-unresolved',
    severity: severity('beam-unresolved', e.nothingWithinReach === true),
    message: `beam '${beam.name}': ${merged.length} neighbouring peak pair${merged.length === 1 ? '' : 's'} will not be resolved on the detector (${names.join('; ')}).${advice}`,
    range: gradient?.range ?? beam.nameRange,
    related,
    ...resolvingGradientData(beam, r),
  });
  return out;
}

/**
 * Information, not a warning, when the advice searched every change up to its reach (gradient, magnet length, drift,
 * slits, detector, speed spread) and none helps: nothing the user can turn within reach resolves the peaks (e.g.
 * nuclear-size moment differences); the advice sentence names the reach. A magnet built from sources is searched
 * without its gradient and length (its currents and geometry might help), so it stays a warning.
 */
function severity(code: 'beam-unresolved' | 'beam-one-peak', nothingWithinReach: boolean): Problem['severity'] {
  return nothingWithinReach ? 'info' : EVAL_RULES[code].severity;
}

/** One merged peak (sublevels that deflect differently, resolved: false): how far apart they are against the image. */
function onePeak(beam: BeamModel, r: BeamResult, imageFwhmM: number | undefined, nothingWithinReach: boolean): Problem {
  const members = new Set(r.peaks[0]!.members);
  const means = r.sublevels.filter((s) => members.has(s.label)).map((s) => s.mean_deflection_m);
  // The difference of exact mean deflections: above the engine's round-off (the verdict's own tolerance, physics/beam/deflectAlike.ts).
  const spread = Math.max(...means) - Math.min(...means);
  const image = imageFwhmM !== undefined ? ` against an image width (FWHM) of ${lengthText(imageFwhmM, 2)}` : '';
  const advice = r.resolving_advice ? ` ${r.resolving_advice}` : '';
  const fix = resolvingGradientData(beam, r);
  // The quick fix writes the advised gradient on the magnet's line: the diagnostic names that line.
  const gradient = fix.data ? beam.magnet?.gradientTPerM?.range : undefined;
  return {
    code: 'beam-one-peak',
    severity: severity('beam-one-peak', nothingWithinReach),
    message: `beam '${beam.name}': all ${members.size} sublevels with atoms land in one peak: their mean deflections span ${lengthText(spread, 2)}${image}, so the detector does not separate them.${advice}`,
    range: beam.nameRange,
    ...(gradient ? { related: [{ message: `magnet '${beam.magnet!.name}' sets the gradient here`, range: gradient }] } : {}),
    ...fix,
  };
}

/** For the quick fix that writes the advised gradient into the magnet (features/codeActions/resolvingGradientFix.ts). */
function resolvingGradientData(beam: BeamModel, r: BeamResult): Pick<Problem, 'data'> {
  const g = r.resolving_gradient_T_per_m;
  return typeof g === 'number' && beam.magnet ? { data: { resolvingGradientTPerM: Math.abs(g), magnet: beam.magnet.name } } : {};
}

/** A peak by its first sublevel and how many share it, in words: `(+3)` beside `m_F=-1` read as a quantum number. */
function peakName(members: string[] | undefined): string {
  if (!members || members.length === 0) return '?';
  const others = members.length - 1;
  return others === 0 ? members[0]! : `${members[0]} with ${others} other${others === 1 ? '' : 's'}`;
}
