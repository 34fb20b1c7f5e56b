/**
 * Size caps. Past these the engine answers with an error value instead of
 * allocating or computing for a long time (user text reaches these functions).
 */

/** Largest uncoupled basis (all blocks together). */
export const MAX_BASIS_STATES = 4096;
/** Largest single m block that will be diagonalised. */
export const MAX_BLOCK_SIZE = 256;
/** Largest number of field points in one sweep. */
export const MAX_SWEEP_POINTS = 200_001;
/** Largest points × states stored by one sweep (each value is 8 bytes, two or three arrays). */
export const MAX_SWEEP_VALUES = 4_000_000;
/** Largest points × Σ(block size)³ (an estimate of the work of one sweep). */
export const MAX_SWEEP_WORK = 2e9;
/** Largest points × (pairs of states in different blocks) scanned for crossings. */
export const MAX_CROSSING_SCAN = 5e7;
/** At most this many crossings are reported per sweep. */
export const MAX_CROSSINGS = 5000;
