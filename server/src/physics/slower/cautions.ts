/**
 * Short safety reminders shown beside slower results: the slowing laser and the coils. They defer
 * to the lab's own rules and its laser safety officer; they are not a safety assessment.
 */
const LAB_RULES = "follow your lab's rules and ask its safety officer";

export interface SlowerCautionSetup {
  wavelengthM?: number;
  /** Largest |B| of the profile, T. */
  peakFieldT?: number;
}

export function slowerCautions(setup: SlowerCautionSetup): string[] {
  const nm = setup.wavelengthM !== undefined ? ` at ${Math.round(setup.wavelengthM * 1e9)} nm` : '';
  const out = [
    `Slowing laser${nm}: a slower beam is typically tens to hundreds of mW, collimated and aimed straight along the atom beam into the oven — an eye hazard directly and by reflections from windows; use the eyewear, enclosures and beam dumps your lab's laser rules require and ask its laser safety officer.`,
  ];
  const field = setup.peakFieldT !== undefined ? ` for up to ${Number((setup.peakFieldT * 1e4).toPrecision(3))} G` : '';
  out.push(`Slower coils${field}: the windings dissipate their power as heat and can overheat without cooling; check the current density and the cooling; ${LAB_RULES}.`);
  return out;
}
