/**
 * The Doppler part of a spectrum's Gaussian: from a gas temperature, or from the transverse
 * speed spread of a beam of the file (line of sight across the beam; docs/spectra.md).
 */
import type { BeamModel, LineModel } from '../model/types';
import { sourceSpeeds } from '../physics/beam';
import { beamTransverseRmsSpeed, dopplerSigmaFromSpeedSpread, dopplerSigmaHz } from '../physics/lineshape';
import { speedDistributionOf } from './beamInput';

export interface DopplerPart {
  sigmaHz: number;
  temperatureK?: number;
  beam?: string;
  transverseRmsSpeed?: number;
}

/** `say` gets a plain-words reason when a beam cannot give a width. */
export function dopplerPart(line: LineModel, lineHz: number | undefined, beams: readonly BeamModel[], say: (message: string) => void): DopplerPart | undefined {
  const req = line.spectrum!;
  const massKg = line.upper?.species.massKg?.value;
  if (!massKg || !lineHz || lineHz <= 0) return undefined;
  if (req.dopplerK) return { sigmaHz: dopplerSigmaHz(lineHz, req.dopplerK.value, massKg), temperatureK: req.dopplerK.value };
  const ref = req.dopplerBeam;
  if (!ref) return undefined;
  const beam = beams.find((b) => b.name === ref.name);
  if (!beam) {
    say(`there is no beam '${ref.name}' in this file${beams.length ? ` (beams: ${beams.map((b) => b.name).join(', ')})` : ''}; the spectrum has no Doppler width`);
    return undefined;
  }
  const species = beam.species ?? beam.level?.species;
  if (species && species !== line.upper?.species) {
    say(`beam '${beam.name}' carries ${species.name}, but line '${line.name}' is a line of ${line.upper?.species.name}; its speeds do not apply`);
    return undefined;
  }
  if (!beam.slits || !beam.source) {
    say(`beam '${beam.name}' needs its slits and source to give a transverse speed spread`);
    return undefined;
  }
  const speeds = sourceSpeeds(speedDistributionOf(beam.source.value), massKg).speeds;
  if (!speeds) {
    say(`beam '${beam.name}': its source cannot be used (see its own diagnostics)`);
    return undefined;
  }
  const s = beam.slits.value;
  const u = beamTransverseRmsSpeed(s.firstM, s.secondM, s.separationM, speeds.meanSpeed, speeds.rmsSpread);
  return { sigmaHz: dopplerSigmaFromSpeedSpread(lineHz, u), beam: beam.name, transverseRmsSpeed: u };
}
