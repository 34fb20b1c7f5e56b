/** A fresh script nonce per page load, from the operating system's cryptographic source. */
import { randomBytes } from 'node:crypto';

/** 18 random bytes (144 bits) as base64: 24 characters, no padding. */
export function makeNonce(): string {
  return randomBytes(18).toString('base64');
}
