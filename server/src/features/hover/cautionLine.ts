/** One line of safety cautions shared by the beam, field-source, slower and trap hovers. */
import { md } from '../shared/markdown';

/**
 * The cautions in one line: the lead words of each (what the hazard is, with the setup's number),
 * the full text staying in the eval report and docs/beam.md.
 */
export function cautionLine(cautions: readonly string[]): string | undefined {
  if (cautions.length === 0) return undefined;
  const heads = cautions.map((c) => c.split(':')[0]!.trim());
  return `⚠ ${md(heads.join(' · '))}: follow your lab's safety rules (full cautions in the eval report)`;
}
