/**
 * A bound, without solving, showing that the regime scan's linear test passes at every field up to a
 * given one, for a hyperfine level: the scan then need not solve those steps (regime.ts).
 *
 * In one m block, H(B) = H0 + B·Z with Z diagonal. Each F appears once in a block, so the
 * zero-field states |F m> are H0's eigenvectors, with eigenvalues E0_F, and <F m|Z|F m> is the
 * linear slope g_F m μ_B (projection theorem). Write V = B·(Z − c), c the middle of Z's diagonal,
 * so ‖V‖ = B·Δz/2 with Δz = max z − min z (shifting by c moves every level and every linear
 * formula alike). With δ the distance from E0_F to the block's other zero-field energies and
 * δ > B·Δz, Weyl's inequality keeps the F-th eigenvalue within ‖V‖ of E0_F (so energy rank
 * matches zero-field rank, as the scan pairs them), and the Feshbach reduction onto |F m> gives
 *   |E_F(B) − E0_F − g_F m μ_B B| ≤ ‖Q V |F m>‖² / (δ − 2‖V‖) ≤ (B·Δz/2)² / (δ − B·Δz)
 * (Q the projector off |F m>; second-order perturbation theory with its remainder, from memory:
 * Kato's perturbation theory, the Feshbach–Schur complement). The scan compares computed
 * numbers, so round-off is allowed for on top: backward-stable symmetric eigensolvers return
 * eigenvalues within a small multiple of n·ε·‖H‖ of the exact ones (Golub & Van Loan, symmetric
 * QR and Jacobi, from memory); the slack here is 100 (n + 1)² ε times a bound on every term's
 * size, far above that. The round-off slack is a chosen allowance, not a proven constant for this solver; the bound is used only with a factor 4/3 to spare.
 */
import type { LevelModel } from './levelModel';
import { jj1 } from './halfIntegers';
import { octupoleActs, quadrupoleActs } from './zeroFieldLevels';

const EPS = Number.EPSILON;

/** Largest size of any term of the zero-field Hamiltonian (a bound on its parts' norms), Hz. */
function zeroFieldTermSize(model: LevelModel): number {
  const s = model.spec;
  if (s.kind !== 'hyperfine') return Number.NaN;
  const ii = jj1(s.twoI);
  const j2 = jj1(s.twoJ);
  const r = Math.sqrt(ii * j2); // ‖I·J‖ ≤ ‖I‖‖J‖
  const I = s.twoI / 2;
  const J = s.twoJ / 2;
  let size = Math.abs(s.A) * r;
  if (s.B !== 0 && quadrupoleActs(s.twoJ, s.twoI)) size += (Math.abs(s.B) / (2 * I * (2 * I - 1) * J * (2 * J - 1))) * (3 * r * r + 1.5 * r + ii * j2);
  if (s.C !== 0 && octupoleActs(s.twoJ, s.twoI)) {
    const lin = Math.abs(2 * (ii + j2 + 3 - 3 * ii * j2));
    size += (Math.abs(s.C) / Math.abs(I * (I - 1) * (2 * I - 1) * J * (J - 1) * (2 * J - 1))) * (10 * r ** 3 + 20 * r * r + lin * r + 5 * ii * j2);
  }
  return size;
}

/**
 * True when the scan's test `|E_exact − (E0 + slope·f)| ≤ fraction·maxSlope·f` provably holds,
 * as computed, for every sublevel at every field f in [fLo, fHi] (0 < fLo ≤ fHi). False when it
 * cannot be shown (then the scan solves as before): other kinds of level, a B² term, zero-field
 * energies too close together, or a field too close to the limit.
 */
export function linearProvenBetween(model: LevelModel, fraction: number, maxSlope: number, fLo: number, fHi: number): boolean {
  const termSize = zeroFieldTermSize(model);
  if (!(termSize >= 0 && Number.isFinite(termSize) && fLo > 0 && fHi >= fLo && maxSlope > 0)) return false;
  const allowed = fraction * maxSlope; // the test's threshold over f
  for (const block of model.blocks) {
    if (block.quadratic) return false;
    const n = block.size;
    const low = block.low[0];
    let zMin = Number.POSITIVE_INFINITY;
    let zMax = Number.NEGATIVE_INFINITY;
    for (let i = 0; i < n; i++) {
      zMin = Math.min(zMin, block.zeeman[i]!);
      zMax = Math.max(zMax, block.zeeman[i]!);
    }
    let e0Max = 0;
    let slopeMax = 0;
    for (const l of low) {
      e0Max = Math.max(e0Max, Math.abs(l.zeroFieldHz));
      slopeMax = Math.max(slopeMax, Math.abs(l.slopeHzPerT));
    }
    const zAbs = Math.max(Math.abs(zMin), Math.abs(zMax));
    // Round-off of the solve, the zero-field energies and the linear formula, at field f.
    const slackAt = (f: number): number => 100 * (n + 1) ** 2 * EPS * (n * termSize + e0Max + f * (n * zAbs + slopeMax));
    // slack/f falls as f grows: its largest share of the threshold is at fLo.
    if (!(slackAt(fLo) / fLo <= allowed / 4)) return false;
    if (n === 1) continue; // E = E0 + z·f exactly: only round-off
    const spread = zMax - zMin;
    for (let k = 0; k < n; k++) {
      // Distance to the block's other zero-field energies, less what their round-off could take away.
      let gap = Number.POSITIVE_INFINITY;
      if (k > 0) gap = Math.min(gap, low[k]!.zeroFieldHz - low[k - 1]!.zeroFieldHz);
      if (k < n - 1) gap = Math.min(gap, low[k + 1]!.zeroFieldHz - low[k]!.zeroFieldHz);
      gap -= 2 * slackAt(0);
      // The bound over f grows with f: its largest share of the threshold is at fHi.
      const half = (fHi * spread) / 2;
      if (!(gap > 2 * half) || !((half * half) / (gap - 2 * half) / fHi <= allowed / 2)) return false;
    }
  }
  return true;
}
