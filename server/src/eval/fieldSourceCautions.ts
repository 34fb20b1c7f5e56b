/**
 * Short safety reminders shown beside a field source's results (report, JSON, hover): windings that heat up, strong
 * fields near implants, permanent magnets that pinch and erase. They defer to the lab's own
 * rules and its safety officer; they are not a safety assessment.
 */
import { MAGNET_CAUTION_T } from '../physics/beam/cautions';
import { AIR_COOLED_LIMIT_A_PER_M2, WATER_COOLED_LIMIT_A_PER_M2, type WindingPower } from '../physics/fields/coilPower';
import { centreFieldText, magnetisationText } from './fieldSourceText';
import { windingNumbersText } from './windingText';

/** From here up steel tools and loose iron are pulled in (common practice, rough). */
const TOOLS_CAUTION_T = 0.05;

export interface SourceCautionInput {
  kind: 'coil' | 'solenoid' | 'wire' | 'slab';
  /** The winding's numbers and the conductor's diameter (m), when the file gives a `conductor`. */
  winding?: WindingPower & { conductorM: number };
  /** Largest |B| the source makes at its centre (or, for a wire, near it), T. */
  fieldT?: number;
  /** |μ0·M| of a magnetised block, T. */
  magnetisationT?: number;
  /** The unit the magnetisation was written in: the caution echoes it as the report line does (fieldSourceText.magnetisationText). */
  magnetisationUnit?: string;
  /** The unit the file writes fields in (the report line's unit, which the caution repeats). */
  fieldUnit?: string;
}

const LAB_RULES = "follow your lab's rules and ask its safety officer";

function trim(v: number, digits = 3): string {
  return String(Number(v.toPrecision(digits)));
}

export function sourceCautions(s: SourceCautionInput): string[] {
  const out: string[] = [];
  const w = s.winding;
  if (w) {
    const n = windingNumbersText(w);
    const heat = `Coil heating (${n.power} at ${n.currentDensity}, ${n.voltage})`;
    if (w.cooling === 'air') {
      out.push(`${heat}: windings dissipate I²R and warm up, and warm copper has more resistance (+0.39 %/K); check the temperature under load; ${LAB_RULES}.`);
    } else if (w.cooling === 'water') {
      out.push(`${heat}: above the ~${trim(AIR_COOLED_LIMIT_A_PER_M2 / 1e6)} A/mm² air-cooled windings usually carry continuously (common practice); plan water cooling, an interlock on flow and temperature, and ${LAB_RULES}.`);
    } else {
      out.push(`${heat}: beyond the ~${trim(WATER_COOLED_LIMIT_A_PER_M2 / 1e6)} A/mm² even water-cooled conductors usually carry (common practice); run it pulsed only, with a thermal interlock, and ${LAB_RULES}.`);
    }
  }
  if (s.kind === 'slab' && s.magnetisationT !== undefined && s.magnetisationT > 0) {
    out.push(`Permanent magnet (${magnetisationText(s.magnetisationT, s.magnetisationUnit)}): magnets pull together and onto steel hard enough to pinch fingers and shatter; keep them away from implants, cards and instruments; ${LAB_RULES}.`);
  } else if (s.fieldT !== undefined && Math.abs(s.fieldT) >= MAGNET_CAUTION_T) {
    const b = Math.abs(s.fieldT);
    const away = b >= TOOLS_CAUTION_T ? 'pacemakers and other implants, steel tools, watches and cards' : 'pacemakers and other implants';
    out.push(`Field above the 5 G implant limit (${centreFieldText(b, s.fieldUnit)} at the centre): keep ${away} away while it is on; ${LAB_RULES}.`);
  }
  return out;
}
