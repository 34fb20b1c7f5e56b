/** Picks the speed law for a source description (inputs already validated). */
import { effusiveLaw } from './effusiveLaw';
import { jetLaw } from './jetLaw';
import { singleSpeedLaw } from './singleSpeedLaw';
import type { SpeedLaw } from './speedLaw';
import type { SpeedDistribution } from './types';

/** Default panels of the jet's cumulative table ("speed grid"). */
export const DEFAULT_SPEED_PANELS = 1024;

export function speedLawFor(source: SpeedDistribution, massKg: number, speedPanels = DEFAULT_SPEED_PANELS): SpeedLaw {
  switch (source.kind) {
    case 'effusive':
      return effusiveLaw(source.temperatureK, massKg);
    case 'jet':
      return jetLaw(source.meanSpeed, source.relativeSpread, speedPanels);
    case 'single':
      return singleSpeedLaw(source.speed);
  }
}
