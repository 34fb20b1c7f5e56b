/**
 * Short safety reminders shown next to beam results, chosen from the setup: a strong magnet,
 * a hot oven, a cryogenic source, a reactive metal. They defer to the lab's own rules and its
 * safety officer; they are not a safety assessment.
 */

export interface CautionSetup {
  /** Field at the beam in the magnet, T. */
  magnetFieldT?: number;
  /** The same field as the report's magnets table writes it (the unit the file wrote it in); else `0.45 T`. */
  magnetFieldText?: string;
  /** Oven (effusive source) temperature, K. */
  ovenTemperatureK?: number;
  /** Chemical symbol of the species, when known. */
  element?: string;
}

/** Fields from here up call for the magnet caution; 0.5 mT (5 G) is the usual limit for implants (common practice). */
export const MAGNET_CAUTION_T = 0.5e-3;
/** Surfaces above about 50 °C burn skin on contact (common practice). */
export const HOT_CAUTION_K = 323;
/** Below about 120 K a source is cooled by a cryogen such as liquid nitrogen, 77 K (common practice). */
export const CRYOGENIC_CAUTION_K = 120;

const ALKALI_METALS = new Set(['Li', 'Na', 'K', 'Rb', 'Cs', 'Fr']);
const LAB_RULES = "follow your lab's rules and ask its safety officer";

/** How the strong-magnet caution starts, so a later pass can find it. */
export const STRONG_MAGNET_START = 'Strong magnet (';

/** The strong-magnet caution quoting the field as `fieldText`. */
export function strongMagnetCaution(fieldText: string): string {
  return `${STRONG_MAGNET_START}${fieldText} at the beam): keep pacemakers and other implants, steel tools, watches and cards away from it; ${LAB_RULES}.`;
}

export function beamCautions(setup: CautionSetup): string[] {
  const out: string[] = [];
  const field = Math.abs(setup.magnetFieldT ?? 0);
  if (field >= MAGNET_CAUTION_T) {
    out.push(strongMagnetCaution(setup.magnetFieldText ?? `${trim(field)} T`));
  }
  const t = setup.ovenTemperatureK;
  if (t !== undefined && t >= HOT_CAUTION_K) {
    out.push(`Hot oven (${trim(t)} K): oven parts stay hot long after switch-off; ${LAB_RULES} on hot surfaces and heater power.`);
  }
  if (t !== undefined && t <= CRYOGENIC_CAUTION_K) {
    out.push(`Cryogenic source (${trim(t)} K): cryogens cause cold burns, can displace the air in a closed room and build up pressure when they boil off in a sealed volume; ${LAB_RULES} on cryogens.`);
  }
  if (setup.element !== undefined && ALKALI_METALS.has(setup.element)) {
    out.push(`Alkali metal (${setup.element}): it reacts violently with water and can ignite in air; handle and dispose of it only as your lab's safety rules require.`);
  }
  out.push(`Vacuum: venting, viewports and pressure relief carry risks; ${LAB_RULES} on vacuum work.`);
  return out;
}

function trim(v: number): string {
  return String(Number(v.toPrecision(4)));
}
