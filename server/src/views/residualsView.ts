/** A fit's points as the residuals view draws them: x from the points' fields or positions, else their number. */
import type { FitResult } from '../eval/fitResultTypes';
import type { ResidualsViewData } from '../render/residuals';

export function residualsView(f: FitResult): ResidualsViewData | undefined {
  const pts = f.points.filter((p) => p.model !== undefined);
  if (pts.length === 0) return undefined;
  const profile = f.kind === 'profile';
  const allFields = pts.every((p) => p.field_T !== undefined);
  const x = pts.map((p, i) => (profile ? p.position_m! : allFields ? p.field_T! : i + 1));
  return {
    title: `Fit ${f.name}: data, model and residuals${f.status === 'not-converged' ? ' (not converged)' : ''}`,
    xKind: profile ? 'position' : allFields ? 'field' : 'index',
    x,
    measured: pts.map((p) => p.measured),
    sigma: pts.map((p) => p.uncertainty ?? 0),
    model: pts.map((p) => p.model!),
    unit: f.measured_unit,
    modelLine: profile,
    ...(!profile && allFields && f.at_written_unit !== undefined ? { xWrittenUnit: f.at_written_unit } : {}),
  };
}
