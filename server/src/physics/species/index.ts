/** Built-in species data with published sources. */
export type { BuiltinLevel, BuiltinSpecies, PublishedEnergy, PublishedEnergyUnit, Sourced, UncertainPart } from './types';
export { BUILTIN_SPECIES } from './table';
export { citationOf } from './build-helpers';
export { findBuiltinLevel, findSpecies, normalizeSpeciesName, normalizedSpellings, speciesNames, speciesSpellings } from './lookup';
export { nuclearGFromMoment, nuclearMomentFromG, NUCLEAR_TO_BOHR_MAGNETON, publishedEnergyToHz, vacuumWavelengthM } from './conversions';
export { DESIGNATION_PATTERN, parseDesignation } from './designation';
export type { DesignationParts } from './designation';
