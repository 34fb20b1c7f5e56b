/** The `*_unc` field of a JSON result: present only when the value has an uncertain input. */
import { standardUncertainty, type InputTable, type Sensitivities } from '../../physics/uncertainty';

/** The standard uncertainty, or undefined when nothing uncertain reaches the value (or it is not finite). */
export function uncOf(sens: Sensitivities | undefined, inputs: InputTable): number | undefined {
  if (!sens) return undefined;
  const u = standardUncertainty(sens, inputs);
  return u > 0 && Number.isFinite(u) ? u : undefined;
}

/** Sets `target[key_unc]` when the value is uncertain. */
export function setUnc(target: object, key: string, sens: Sensitivities | undefined, inputs: InputTable): void {
  const u = uncOf(sens, inputs);
  if (u !== undefined) (target as Record<string, unknown>)[`${key}_unc`] = u;
}
