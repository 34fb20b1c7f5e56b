/**
 * The uncertain inputs of one setup: every value written with an uncertainty (`0.35(2) T`) and
 * every built-in value whose source publishes one. Each is an independent input with a stable id; a built-in
 * value summed from pieces shared with other built-in values (the lithium D lines' common anchor) enters as its
 * pieces, `builtin:<key>`, so the shared piece is one input however many values carry it.
 */
import type { SetupModel, LevelModel, Valued } from '../../model/types';
import { hasSensitivity, NO_SENSITIVITY, type ParamSensitivities, type Sensitivities, type UncertainInput } from '../../physics/uncertainty';
import type { UncertainPart } from '../../physics/species';
import { centreFieldSensitivities, magnetSourceInputs, type SourceGap, type SourceInput } from './sourceInputs';

export interface SetupInputs {
  table: Map<string, UncertainInput>;
  /** Sensitivities of a working field by its source (`field:bias`, `magnet:selector`). */
  fieldSens: Map<string, Sensitivities>;
  magnetSens: Map<string, { gradient: Sensitivities; length: Sensitivities }>;
  /** A magnet built from sources: its sources' uncertain inputs, each able to rebuild the field with itself moved. */
  sourceInputs: Map<string, SourceInput[]>;
  /** A magnet built from sources: the inputs its field and gradient leave out, with why (sourceGaps.ts reports them). */
  sourceGaps: Map<string, SourceGap[]>;
  /** The level parameters' sensitivities (A, B, C, ζ, g_I and a measured g_J). */
  levelParams: (level: LevelModel) => ParamSensitivities;
  beamDrift: Map<string, Sensitivities>;
  /** A beam's oven temperature, slit widths w1, w2, slit separation d and detector width W. */
  beamGeometry: Map<string, BeamGeometrySens>;
  /** A level's energy above the ground level (absolute line frequencies). */
  levelEnergy: (level: LevelModel) => Sensitivities;
  resonanceFrequency: Map<string, Sensitivities>;
}

export interface BeamGeometrySens {
  temperature: Sensitivities;
  slit1: Sensitivities;
  slit2: Sensitivities;
  separation: Sensitivities;
  detector: Sensitivities;
}

export function fieldKey(source: { kind: 'field' | 'magnet'; name: string }): string {
  return `${source.kind}:${source.name}`;
}

export function setupInputs(model: SetupModel): SetupInputs {
  const table = new Map<string, UncertainInput>();
  const add = (id: string, label: string, v: Valued<number> | undefined): Sensitivities => {
    const u = v?.uncertainty;
    if (!v || u === undefined || !(u > 0) || !Number.isFinite(u) || !Number.isFinite(v.value)) return NO_SENSITIVITY;
    if (v.parts) return addParts(v.parts);
    table.set(id, { id, label, value: v.value, u, ...(v.range !== undefined ? { written: true } : {}) });
    return { [id]: 1 };
  };
  // A built-in value summed from shared pieces: one input per piece, the same one in every value it enters.
  const addParts = (parts: readonly UncertainPart[]): Sensitivities => {
    const sens: Record<string, number> = {};
    for (const p of parts) {
      const id = `builtin:${p.key}`;
      table.set(id, { id, label: p.label, value: p.value, u: p.u });
      sens[id] = p.sign;
    }
    return sens;
  };
  const fieldSens = new Map<string, Sensitivities>();
  for (const f of model.fields) fieldSens.set(fieldKey({ kind: 'field', name: f.name }), add(`field:${f.name}`, `field ${f.name}`, f.tesla));
  const magnetSens = new Map<string, { gradient: Sensitivities; length: Sensitivities }>();
  const sourceInputs = new Map<string, SourceInput[]>();
  const sourceGaps = new Map<string, SourceGap[]>();
  for (const m of model.magnets) {
    fieldSens.set(fieldKey({ kind: 'magnet', name: m.name }), add(`magnet:${m.name}.field`, `field of magnet ${m.name}`, m.fieldT));
    magnetSens.set(m.name, {
      gradient: add(`magnet:${m.name}.gradient`, `gradient of magnet ${m.name}`, m.gradientTPerM),
      length: add(`magnet:${m.name}.length`, `length of magnet ${m.name}`, m.lengthM),
    });
    if (!m.sources) continue;
    // Built from sources: the field and gradient at the beam line move with the sources' inputs.
    const inputs = magnetSourceInputs(m, add);
    sourceInputs.set(m.name, inputs);
    const centre = centreFieldSensitivities(inputs);
    if (centre.gaps.length > 0) sourceGaps.set(m.name, centre.gaps);
    if (hasSensitivity(centre.field)) fieldSens.set(fieldKey({ kind: 'magnet', name: m.name }), centre.field);
    if (hasSensitivity(centre.gradient)) magnetSens.get(m.name)!.gradient = centre.gradient;
  }
  const levelParams = new Map<LevelModel, ParamSensitivities>();
  const levelEnergy = new Map<LevelModel, Sensitivities>();
  for (const s of model.species) {
    const gI = add(`species:${s.name}.g_I`, `g_I of ${s.name}`, s.gI);
    for (const l of s.levels) {
      const id = `level:${s.name}.${l.name}`;
      const name = `${s.name}.${l.name}`;
      levelParams.set(l, {
        gI,
        A: add(`${id}.A`, `A of ${name}`, l.A),
        B: add(`${id}.B`, `B of ${name}`, l.B),
        C: add(`${id}.C`, `C of ${name}`, l.C),
        zeta: add(`${id}.zeta`, `zeta of ${name}`, l.zeta),
        gJ: add(`${id}.g_J`, `g_J of ${name}`, l.gJMeasured),
      });
      levelEnergy.set(l, add(`${id}.energy`, `energy of ${name}`, l.energyHz));
    }
  }
  const beamDrift = new Map(model.beams.map((b) => [b.name, add(`beam:${b.name}.drift`, `drift of beam ${b.name}`, b.driftM)]));
  const beamGeometry = new Map(
    model.beams.map((b) => [
      b.name,
      {
        temperature: add(`beam:${b.name}.temperature`, `oven temperature of beam ${b.name}`, b.ovenTemperatureK),
        slit1: add(`beam:${b.name}.slit1`, `first slit of beam ${b.name}`, b.slitParts?.firstM),
        slit2: add(`beam:${b.name}.slit2`, `second slit of beam ${b.name}`, b.slitParts?.secondM),
        separation: add(`beam:${b.name}.slit_separation`, `slit separation of beam ${b.name}`, b.slitParts?.separationM),
        detector: add(`beam:${b.name}.detector`, `detector width of beam ${b.name}`, b.detectorM),
      },
    ]),
  );
  const resonanceFrequency = new Map(model.resonances.map((r) => [r.name, add(`resonance:${r.name}.frequency`, `frequency of resonance ${r.name}`, r.frequencyHz)]));
  return {
    table,
    fieldSens,
    magnetSens,
    sourceInputs,
    sourceGaps,
    levelParams: (l) => levelParams.get(l) ?? {},
    beamDrift,
    beamGeometry,
    levelEnergy: (l) => levelEnergy.get(l) ?? NO_SENSITIVITY,
    resonanceFrequency,
  };
}

/** Whether any input these sensitivities reach (a nonzero one) was written in the file, not built in: a lost one then earns a warning, else a note. */
export function reachesWritten(sens: Readonly<Record<string, number>>, table: ReadonlyMap<string, UncertainInput>): boolean {
  return Object.keys(sens).some((id) => sens[id] !== 0 && table.get(id)?.written === true);
}
