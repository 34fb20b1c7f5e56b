/**
 * The beam's own flights are reused, not flown again: the uncertainty pass starts from the
 * evaluated coefficients and exit angles (eval/uncertainty/fieldMapPass.ts), and a profile fit's
 * flights at scale 1 and the reference speed are the beam's (eval/sourceFlights.ts).
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { analyze } from '../../server/src/eval/analyze';
import { beamInputs } from '../../server/src/eval/beamInput';
import { gJLookup } from '../../server/src/eval/gJLookup';
import { hyperfineSpec } from '../../server/src/eval/levelSpec';
import { sourceFlights } from '../../server/src/eval/sourceFlights';
import { CoefficientFlyer } from '../../server/src/physics/beam/trajectory';
import { twoWireBeam } from '../fixtures/fieldMapBeams';

afterEach(() => vi.restoreAllMocks());

describe('flights reused', () => {
  it('the uncertainty pass flies only nudged pairs (±h), never the reference again: an even number of re-flights', () => {
    const fly = vi.spyOn(CoefficientFlyer.prototype, 'fly');
    const r = analyze(twoWireBeam({ at: '1.50(2)' })).result!;
    expect(r.beams[0]!.peaks[0]!.position_m_unc).toBeGreaterThan(0);
    expect(fly.mock.calls.length).toBeGreaterThanOrEqual(2);
    expect(fly.mock.calls.length % 2).toBe(0);
  });

  it('a fit’s first pattern (scale 1 at the reference speed) uses the beam’s own coefficients: no flight', () => {
    const a = analyze(twoWireBeam());
    const beam = a.model!.beams[0]!;
    const gJOf = gJLookup(a.result!.levels);
    const spec = hyperfineSpec(beam.level!, gJOf(beam.level!)!)!;
    const f = sourceFlights(beamInputs(beam, gJOf)!, spec, beam.magnet!)!;
    const evaluated = a.result!.beams[0]!;
    const k = f.flights.coefficients(1, evaluated.field_map!.reference_speed_m_per_s)!;
    expect(f.flown()).toBe(0);
    expect(Array.from(k)).toEqual(evaluated.sublevels.map((s) => s.field_map!.coefficient_m3_per_s2));
    // any other scale flies each of the 8 sublevels once
    f.flights.coefficients(1.01, evaluated.field_map!.reference_speed_m_per_s);
    expect(f.flown()).toBe(8);
  });
});
