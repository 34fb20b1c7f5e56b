/**
 * Safety reminders shown beside a trap's results: coils that carry the trap current heat up, and
 * switching a high current off fast makes an inductive voltage spike. They defer to the lab's own
 * rules and its safety officer; they are not a safety assessment.
 */

const LAB_RULES = "follow your lab's rules and ask its safety officer";

export function trapCautions(): string[] {
  return [
    `Trap coils dissipate power and heat up: check the current density and cooling of every coil before running it; ${LAB_RULES}.`,
    `Switching a high coil current off quickly induces a large voltage across the coil and its switch: use a protected switch and a snubber or free-wheeling path; ${LAB_RULES}.`,
  ];
}
