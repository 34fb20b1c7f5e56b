/**
 * A magnet: field, gradient and length in other units, the Zeeman scale at its field, the
 * force scale μ_B·∂B/∂z, and the levels' sublevels at its field. Beam results add a section
 * here when the evaluation carries them.
 */
import type { EvaluationResult, MagnetResult } from '../../eval/resultTypes';
import { lengthText, prefixedText } from '../../eval/quantityText';
import { averagedGradients, averagedOverText } from '../../eval/magnetGradientText';
import { BOHR_MAGNETON } from '../../physics/constants';
import { md, mdTitle } from '../shared/markdown';
import { valueInUnits } from '../shared/units';
import type { HoverOptions } from './context';
import { beamVerdict } from './beamSection';
import { fieldValueLines, levelsAtFieldSection } from './fieldSection';

/** Force on a moment of one Bohr magneton in this gradient, in newtons. */
export function bohrForceN(gradientTPerM: number): number {
  return BOHR_MAGNETON * gradientTPerM;
}

export function magnetSection(m: MagnetResult, ctx: { result: EvaluationResult | undefined; options: HoverOptions }): string {
  const lines = [mdTitle(`magnet ${md(m.name)}`)];
  if (m.sources) {
    const at = m.at_m ? m.at_m.map((x) => lengthText(x, 4)).join(', ') : 'the origin';
    lines.push(`built from ${m.sources.map(md).join(', ')}: field and gradient of |B| where the beam line (along +x) passes, at ${at}; the beam flies through their field`);
  }
  if (m.field_T !== undefined) lines.push(`field ${fieldValueLines(m.field_T, m.field_unit).join('; ')}`);
  else lines.push('field: not given');
  if (m.gradient_T_per_m !== undefined) {
    const where = m.sources ? ' ∂|B|/∂z at the centre of the beam line' : '';
    lines.push(`gradient${where} = ${valueInUnits(m.gradient_T_per_m, 'gradient', m.gradient_unit).join(' = ')}; force on 1 μ_B: ${prefixedText(bohrForceN(m.gradient_T_per_m), 'N', { digits: 5 })}`);
    // A beam through sources averages the gradient along the magnet's length: said beside the centre value, never instead of it.
    for (const averaged of averagedGradients(m, ctx.result?.beams ?? [], md)) lines.push(`gradient ∂|B|/∂z averaged along ${averagedOverText(m)}: ${averaged}`);
  } else lines.push('gradient: not given');
  if (m.length_m !== undefined) lines.push(`length = ${valueInUnits(m.length_m, 'length', m.length_unit).join(' = ')}`);
  else lines.push('length: not given');
  const parts = [lines.join('  \n')];
  const beams = (ctx.result?.beams ?? []).filter((b) => b.magnet === m.name);
  for (const b of beams) {
    const verdict = beamVerdict(b);
    parts.push(`beam ${md(b.name)}: ${verdict ?? 'not computed (see its diagnostics)'}`);
  }
  if (m.field_T !== undefined) {
    const tables = levelsAtFieldSection(ctx.result, { kind: 'magnet', name: m.name }, ctx.options);
    if (tables) parts.push(tables);
  }
  return parts.join('\n\n');
}
