/**
 * Reusable work arrays. Allocating (and zeroing) megabytes of typed arrays per pattern
 * dominated the run time, so work arrays are kept between calls under a name. Callers
 * must write every element they later read and must never return these arrays.
 * (JavaScript runs one computation at a time, and no pattern code re-enters itself.)
 */
const float64 = new Map<string, Float64Array>();
const int32 = new Map<string, Int32Array>();
const uint8 = new Map<string, Uint8Array>();

export function scratchFloat64(name: string, length: number): Float64Array {
  const hit = float64.get(name);
  if (hit && hit.length >= length) return hit.length === length ? hit : hit.subarray(0, length);
  const fresh = new Float64Array(length);
  float64.set(name, fresh);
  return fresh;
}

export function scratchInt32(name: string, length: number): Int32Array {
  const hit = int32.get(name);
  if (hit && hit.length >= length) return hit.length === length ? hit : hit.subarray(0, length);
  const fresh = new Int32Array(length);
  int32.set(name, fresh);
  return fresh;
}

export function scratchUint8(name: string, length: number): Uint8Array {
  const hit = uint8.get(name);
  if (hit && hit.length >= length) return hit.length === length ? hit : hit.subarray(0, length);
  const fresh = new Uint8Array(length);
  uint8.set(name, fresh);
  return fresh;
}
