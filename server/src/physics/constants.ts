/**
 * Physical constants, CODATA 2022 recommended values (published 2024; the same set
 * SciPy 1.17 ships as scipy.constants). SI defining constants are exact.
 * Every value here is checked in tests/physics/constants.test.ts against
 * tests/reference/codata.json, written by scripts/reference/codata.py.
 */

/** Planck constant h, J·s (exact, SI 2019). */
export const PLANCK_H = 6.62607015e-34;
/** Reduced Planck constant ħ = h/2π, J·s. */
export const HBAR = PLANCK_H / (2 * Math.PI);
/** Elementary charge e, C (exact, SI 2019). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** Boltzmann constant k_B, J/K (exact, SI 2019). */
export const BOLTZMANN_K = 1.380649e-23;
/** Avogadro constant N_A, 1/mol (exact, SI 2019). */
export const AVOGADRO = 6.02214076e23;
/** Speed of light in vacuum c, m/s (exact). */
export const SPEED_OF_LIGHT = 299792458;
/** Caesium hyperfine transition frequency Δν_Cs, Hz (exact, defines the second). */
export const CAESIUM_HYPERFINE_HZ = 9192631770;

/** Bohr magneton μ_B, J/T. CODATA 2022: 9.274 010 0657(29) e-24. */
export const BOHR_MAGNETON = 9.2740100657e-24;
/** Nuclear magneton μ_N, J/T. CODATA 2022: 5.050 783 7393(16) e-27. */
export const NUCLEAR_MAGNETON = 5.0507837393e-27;
/** Electron g-factor g_e (negative by the CODATA sign convention). CODATA 2022: −2.002 319 304 360 92(36). */
export const ELECTRON_G = -2.00231930436092;
/** |g_e|, the spin g-factor g_s used in Landé formulas. */
export const ELECTRON_GS = -ELECTRON_G;
/** Electron mass m_e, kg. CODATA 2022: 9.109 383 7139(28) e-31. */
export const ELECTRON_MASS = 9.1093837139e-31;
/** Bohr radius a₀, m. CODATA 2022: 5.291 772 105 44(82) e-11. */
export const BOHR_RADIUS = 5.29177210544e-11;
/** Proton mass m_p, kg. CODATA 2022: 1.672 621 925 95(52) e-27. */
export const PROTON_MASS = 1.67262192595e-27;
/** Atomic mass constant m_u = 1 u, kg. CODATA 2022: 1.660 539 068 92(52) e-27. */
export const ATOMIC_MASS_UNIT = 1.66053906892e-27;
/** Electron mass in u. CODATA 2022: 5.485 799 090 441(97) e-4. */
export const ELECTRON_MASS_U = 5.485799090441e-4;
/** Electron-to-proton mass ratio. CODATA 2022: 5.446 170 214 889(94) e-4. */
export const ELECTRON_PROTON_MASS_RATIO = 5.446170214889e-4;

/** Vacuum magnetic permeability μ0, N/A². CODATA 2022: 1.256 637 061 27(20) e-6 (no longer exactly 4π·1e-7). */
export const VACUUM_PERMEABILITY = 1.25663706127e-6;

/** μ_B/h in Hz/T (derived; CODATA 2022 lists 13 996 244 917.1(4.4) Hz/T). */
export const BOHR_MAGNETON_HZ_PER_T = BOHR_MAGNETON / PLANCK_H;
/** μ_N/h in Hz/T (derived; CODATA 2022 lists 7.622 593 2188(24) MHz/T). */
export const NUCLEAR_MAGNETON_HZ_PER_T = NUCLEAR_MAGNETON / PLANCK_H;

/** The CODATA adjustment these values come from, for output metadata. */
export const CONSTANTS_SOURCE = 'CODATA 2022';
