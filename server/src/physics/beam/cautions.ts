/**
 * Short safety reminders shown next to beam results. They defer to the lab's own
 * rules; they are not a safety assessment.
 */
export const BEAM_CAUTIONS: readonly string[] = Object.freeze([
  'Strong magnets: keep pacemakers and other implants, steel tools, watches and cards away from the magnet; follow your lab\'s magnet rules.',
  'Hot ovens: oven parts stay hot long after switch-off; follow your lab\'s rules for hot surfaces and heater power.',
  'Vacuum: venting, viewports and pressure relief carry risks; follow your lab\'s vacuum procedures.',
  'Alkali metals react violently with water and can ignite in air; handle and dispose of them only as your lab\'s safety rules require.',
]);
