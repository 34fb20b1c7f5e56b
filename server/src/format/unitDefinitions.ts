/**
 * Sublevel's changes to mathjs' unit table, in mathjs' own definition syntax: the first set
 * replaces mathjs' units of the same name, the second adds. They are applied to mathjs when the
 * unit table is generated (scripts/unitTable/), never at run time.
 */
import { ATOMIC_MASS_UNIT, BOHR_MAGNETON, BOHR_RADIUS, ELEMENTARY_CHARGE, NUCLEAR_MAGNETON } from '../physics/constants';

export const UNIT_OVERRIDES = {
  // mathjs' own eV predates the 2019 SI; the exact elementary charge replaces it.
  eV: { definition: `${ELEMENTARY_CHARGE} J`, prefixes: 'short' },
  electronvolt: { definition: `${ELEMENTARY_CHARGE} J`, prefixes: 'long' },
};
export const UNIT_ADDITIONS = {
  G: { definition: '1e-4 T', prefixes: 'short' }, // gauss (CGS): 1 G = 1e-4 T exactly
  gauss: { definition: '1e-4 T', prefixes: 'long' },
  u: { definition: `${ATOMIC_MASS_UNIT} kg` },
  Da: { definition: `${ATOMIC_MASS_UNIT} kg` },
  muN: { definition: `${NUCLEAR_MAGNETON} J/T` },
  muB: { definition: `${BOHR_MAGNETON} J/T` },
  percent: { definition: '0.01' },
  a0: { definition: `${BOHR_RADIUS} m` }, // Bohr radius (CODATA 2022), for ⟨r²⟩ in a0^2
};
