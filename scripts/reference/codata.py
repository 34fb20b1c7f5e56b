#!/usr/bin/env python3
"""Write tests/reference/codata.json from scipy.constants (CODATA 2022 in SciPy 1.17).

Run from the repository root:  python3 scripts/reference/codata.py
The TypeScript test tests/physics/constants.test.ts compares every value in
server/src/physics/constants.ts against this file.
"""
import json
import os

import scipy
import scipy.constants as sc

# Map: our constant name in constants.ts -> scipy.constants physical_constants key
KEYS = {
    "PLANCK_H": "Planck constant",
    "HBAR": "reduced Planck constant",
    "ELEMENTARY_CHARGE": "elementary charge",
    "BOLTZMANN_K": "Boltzmann constant",
    "AVOGADRO": "Avogadro constant",
    "SPEED_OF_LIGHT": "speed of light in vacuum",
    "CAESIUM_HYPERFINE_HZ": "hyperfine transition frequency of Cs-133",
    "BOHR_MAGNETON": "Bohr magneton",
    "NUCLEAR_MAGNETON": "nuclear magneton",
    "ELECTRON_G": "electron g factor",
    "ELECTRON_MASS": "electron mass",
    "PROTON_MASS": "proton mass",
    "BOHR_RADIUS": "Bohr radius",
    "ATOMIC_MASS_UNIT": "atomic mass constant",
    "ELECTRON_MASS_U": "electron mass in u",
    "ELECTRON_PROTON_MASS_RATIO": "electron-proton mass ratio",
    "VACUUM_PERMEABILITY": "vacuum mag. permeability",
    "BOHR_MAGNETON_HZ_PER_T": "Bohr magneton in Hz/T",
    "NUCLEAR_MAGNETON_MHZ_PER_T": "nuclear magneton in MHz/T",
}

# Further CODATA values the physics tests compare derived quantities against
# (not stored in constants.ts): name used in the tests -> scipy key
EXTRA_KEYS = {
    "ELECTRON_GYROMAGNETIC_MHZ_PER_T": "electron gyromag. ratio in MHz/T",
    "PROTON_MOMENT_IN_MU_N": "proton mag. mom. to nuclear magneton ratio",
    "PROTON_MOMENT_IN_MU_B": "proton mag. mom. to Bohr magneton ratio",
    "ELECTRON_MOMENT_IN_MU_B": "electron mag. mom. to Bohr magneton ratio",
}


def entry(key: str) -> dict:
    value, unit, unc = sc.physical_constants[key]
    return {"key": key, "value": value, "unit": unit, "uncertainty": unc}


def main() -> None:
    out = {
        "source": "scipy.constants (CODATA 2022 adjustment)",
        "generator": "scripts/reference/codata.py",
        "scipy_version": scipy.__version__,
        "constants": {name: entry(key) for name, key in KEYS.items()},
        "extra": {name: entry(key) for name, key in EXTRA_KEYS.items()},
    }
    path = os.path.join("tests", "reference", "codata.json")
    with open(path, "w", encoding="utf-8") as f:
        json.dump(out, f, indent=2)
        f.write("\n")
    print(f"wrote {path} ({len(KEYS)} constants, {len(EXTRA_KEYS)} extra)")


if __name__ == "__main__":
    main()
