// WebAssembly text of the eigen-solver's two O(n³) kernels (128-bit SIMD, two doubles a lane
// pair), written out by a generator so the unrolled row tiles stay readable here.
// Layout shared with server/src/physics/engine/simdEigen.ts: every matrix is row-major with an
// even row stride `ns` (n rounded up), so pairs of doubles start 16-byte aligned; all pointers
// are byte offsets into the one exported memory.

/** Rows of the eigenvector matrix that share each pass of a reflector in `applyReflectors`. */
export const ROW_TILE = 4;

/** Double precision's ε and the secular iteration's step limit, as in secularRoots.ts (they must match). */
const EPS = 2.220446049250313e-16;
const MAX_SECULAR_STEPS = 120;

const f64 = (addr) => `(f64.load ${addr})`;
const at = (base, index) => `(i32.add ${base} (i32.shl ${index} (i32.const 3)))`;
const at4 = (base, index) => `(i32.add ${base} (i32.shl ${index} (i32.const 2)))`;
const sumLanes = (x) => `(f64.add (f64x2.extract_lane 0 ${x}) (f64x2.extract_lane 1 ${x}))`;

/**
 * tridiagonalise(a, ns, n, d, e, betas, v, p, vn, pn, refl): Householder reduction of the lower
 * triangle of the order-n matrix at `a` to T (diagonal d, sub-diagonal e), the same steps as
 * tridiagonaliseLower in householderInverseIteration.ts: reflector k stays in column k below the
 * diagonal, β_k in betas[k], and is written as row k of `refl` too (stride ns, zero outside
 * columns k + 1 … n − 1, a zero row where β_k = 0), the form applyReflectors reads in aligned
 * pairs. The rows are written as each reflector is formed, from the copy made anyway, where a
 * separate pass had read the columns back afterwards, one double per row (22 µs at order 160). Per step, the symmetric product p = β A v (row i: a dot product
 * along the row and an update of p along it) and the rank-2 update A ← A − v wᵀ − w vᵀ, in pairs
 * from the even index at or below k + 1 (v_k = w_k = 0 make the pair's column-k half a no-op).
 *
 * The update of step k and the product of step k + 1 share one pass over the trailing triangle
 * (one trip of the matrix through the cache instead of two): column k + 1 is updated first,
 * reflector k + 1 formed from it, then each row is updated and at once multiplied by the new
 * reflector; rows go two at a time, sharing the loads of v, w, the new reflector and p (fused
 * 1.16–1.33×, two rows a further 1.28–1.38× at orders 160–192, docs/engine.md). v, p and vn, pn
 * (n + 2 doubles of scratch each) swap roles every step; v and w are
 * zeroed at k + 1 after the column's update, so pairs that start there leave the column as it is.
 * Every entry gets the same operations in the same order as with two passes (the same bits).
 * Going down column k + 1, one trip also forms w = p − (β/2)(vᵀp) v and, from row k + 3 on, sums
 * the next reflector's squares and copies its entries (three passes down the column, one double a
 * row, were one; the same bits, the reduction 1.02–1.09× at orders 128–161).
 */
function tridiagonalise() {
  const rowAt = (i) => `(i32.add (local.get $a) (i32.mul ${i} (local.get $rowBytes)))`;
  const A = (i, j) => at(rowAt(i), j);
  const X = (vec, i) => at(`(local.get ${vec})`, i);
  const pair = (base) => `(i32.add (local.get ${base}) (local.get $o))`;
  const K = (plus) => (plus === 0 ? '(local.get $k)' : `(i32.add (local.get $k) (i32.const ${plus}))`);
  /** Reflector of step k + plus from its column into vec (zero at the step), prod zeroed; $beta (0: nothing to do), betas, e. */
  const form = (plus, vec, prod) => `
      (local.set $tail (f64.const 0))
      (local.set $i ${K(plus + 2)})
      (block $t_done${plus} (loop $t${plus}
        (br_if $t_done${plus} (i32.ge_s (local.get $i) (local.get $n)))
        (local.set $aij ${f64(A('(local.get $i)', K(plus)))})
        (local.set $tail (f64.add (local.get $tail) (f64.mul (local.get $aij) (local.get $aij))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $t${plus})))
      (local.set $x0 ${f64(A(K(plus + 1), K(plus)))})
      (local.set $beta (f64.const 0))
      (if (f64.eq (local.get $tail) (f64.const 0))
        (then
          (f64.store ${at('(local.get $betas)', K(plus))} (f64.const 0))
          (f64.store ${at('(local.get $e)', K(plus))} (local.get $x0)))
        (else
          (local.set $alpha (f64.sqrt (f64.add (local.get $tail) (f64.mul (local.get $x0) (local.get $x0)))))
          (if (f64.ge (local.get $x0) (f64.const 0)) (then (local.set $alpha (f64.neg (local.get $alpha)))))
          (f64.store ${A(K(plus + 1), K(plus))} (f64.sub (local.get $x0) (local.get $alpha)))
          (f64.store ${X(vec, K(plus))} (f64.const 0))
          (f64.store ${X(prod, K(plus))} (f64.const 0))
          ${plus === 1 ? `(f64.store ${X(vec, K(0))} (f64.const 0))` : ''}
          (local.set $i ${K(plus + 1)})
          (block $c_done${plus} (loop $c${plus}
            (br_if $c_done${plus} (i32.ge_s (local.get $i) (local.get $n)))
            (local.set $aij ${f64(A('(local.get $i)', K(plus)))})
            (f64.store ${X(vec, '(local.get $i)')} (local.get $aij))
            (f64.store ${at(`(i32.add (local.get $refl) (i32.mul ${K(plus)} (local.get $rowBytes)))`, '(local.get $i)')} (local.get $aij))
            (f64.store ${X(prod, '(local.get $i)')} (f64.const 0))
            (local.set $i (i32.add (local.get $i) (i32.const 1)))
            (br $c${plus})))
          (local.set $x0 ${f64(X(vec, K(plus + 1)))})
          (local.set $beta (f64.div (f64.const 2) (f64.add (f64.mul (local.get $x0) (local.get $x0)) (local.get $tail))))
          (f64.store ${at('(local.get $betas)', K(plus))} (local.get $beta))
          (f64.store ${at('(local.get $e)', K(plus))} (local.get $alpha))))`;
  /** Row (suffix q: '' row i, '1' row i + 1) pairs strictly below its diagonal from $o on: the update by $v/$p (if upd) and the product with $vn/$pn (if mul). */
  const rowPairs = (upd, mul, label, q) => `
          (block $${label}_done (loop $${label}
            (br_if $${label}_done (i32.ge_s (i32.add (local.get $o) (i32.const 8)) (local.get $oDiag${q})))
            ${loadUpdateOperands(upd)}
            ${updatedPair(upd, q)}
            ${mul
              ? `(local.set $s2${q} (f64x2.add (local.get $s2${q}) (f64x2.mul (local.get $x${q}) (v128.load ${pair('$vn')}))))
            (v128.store ${pair('$pn')} (f64x2.add (v128.load ${pair('$pn')}) (f64x2.mul (local.get $x${q}) (local.get $ni2${q}))))`
              : ''}
            (local.set $o (i32.add (local.get $o) (i32.const 16)))
            (br $${label})))`;
  /** $x{q} ← the row's pair at $o, updated and stored back if upd. */
  const updatedPair = (upd, q) =>
    upd
      ? `(local.set $x${q} (f64x2.sub (v128.load ${pair(`$row${q}`)})
              (f64x2.add (f64x2.mul (local.get $vi2${q}) (local.get $pp)) (f64x2.mul (local.get $wi2${q}) (local.get $vv)))))
            (v128.store ${pair(`$row${q}`)} (local.get $x${q}))`
      : `(local.set $x${q} (v128.load ${pair(`$row${q}`)}))`;
  const loadUpdateOperands = (upd) => (upd ? `(local.set $pp (v128.load ${pair('$p')})) (local.set $vv (v128.load ${pair('$v')}))` : '');
  /** Rows i and i + 1 together: their common pairs (below row i's diagonal) share the loads of v, w, the new reflector and p. */
  const twoRowPairs = (upd, mul, label) => `
          (block $${label}_done (loop $${label}
            (br_if $${label}_done (i32.ge_s (i32.add (local.get $o) (i32.const 8)) (local.get $oDiag)))
            ${loadUpdateOperands(upd)}
            ${updatedPair(upd, '')}
            ${updatedPair(upd, '1')}
            ${mul
              ? `(local.set $y (v128.load ${pair('$vn')}))
            (local.set $s2 (f64x2.add (local.get $s2) (f64x2.mul (local.get $x) (local.get $y))))
            (local.set $s21 (f64x2.add (local.get $s21) (f64x2.mul (local.get $x1) (local.get $y))))
            (v128.store ${pair('$pn')} (f64x2.add (f64x2.add (v128.load ${pair('$pn')}) (f64x2.mul (local.get $x) (local.get $ni2))) (f64x2.mul (local.get $x1) (local.get $ni21))))`
              : ''}
            (local.set $o (i32.add (local.get $o) (i32.const 16)))
            (br $${label})))`;
  const scalarUpdate = (addr, q) =>
    `(f64.store ${addr} (f64.sub ${f64(addr)} (f64.add (f64.mul (local.get $vi${q}) ${f64(`(i32.add (local.get $p) (local.get $o))`)}) (f64.mul (local.get $wi${q}) ${f64(`(i32.add (local.get $v) (local.get $o))`)}))))`;
  const rowStart = (upd, mul, q, i) => `
        (local.set $row${q} ${rowAt(i)})
        (local.set $oDiag${q} (i32.shl ${i} (i32.const 3)))
        ${upd ? `(local.set $vi${q} ${f64(X('$v', i))}) (local.set $wi${q} ${f64(X('$p', i))})
        (local.set $vi2${q} (f64x2.splat (local.get $vi${q}))) (local.set $wi2${q} (f64x2.splat (local.get $wi${q})))` : ''}
        ${mul ? `(local.set $ni${q} ${f64(X('$vn', i))}) (local.set $ni2${q} (f64x2.splat (local.get $ni${q}))) (local.set $s2${q} (v128.const f64x2 0 0))` : ''}`;
  /** The row's one or two entries left after its pairs ($o at column i − 1 or i). */
  const rowTail = (upd, mul, q) => `
        (local.set $s (f64.const 0))
        (if (i32.lt_s (local.get $o) (local.get $oDiag${q}))
          (then
            ${upd ? scalarUpdate(pair(`$row${q}`), q) : ''}
            ${mul ? `(local.set $aij ${f64(pair(`$row${q}`))})
            (local.set $s (f64.mul (local.get $aij) ${f64(pair('$vn'))}))
            (f64.store ${pair('$pn')} (f64.add ${f64(pair('$pn'))} (f64.mul (local.get $aij) (local.get $ni${q}))))` : ''}
            (local.set $o (i32.add (local.get $o) (i32.const 8)))))
        ${upd ? scalarUpdate(pair(`$row${q}`), q) : ''}
        ${mul ? `(f64.store ${pair('$pn')}
          (f64.add ${f64(pair('$pn'))} (f64.add (f64.add ${sumLanes(`(local.get $s2${q})`)} (local.get $s)) (f64.mul ${f64(pair(`$row${q}`))} (local.get $ni${q})))))` : ''}`;
  /**
   * Rows from $i0 to n − 1, two at a time: their common pairs together, then row i's one or two
   * entries left, row i + 1's last pair and entries. Each row's sums and each p_j's additions keep
   * the order of one row at a time (row i before row i + 1), so the bits do not change.
   */
  const pass = (upd, mul, label) => `
      (local.set $i (local.get $i0))
      (block $${label}_rows_done (loop $${label}_rows
        (br_if $${label}_rows_done (i32.ge_s (local.get $i) (local.get $n)))
        ${rowStart(upd, mul, '', '(local.get $i)')}
        (local.set $o (local.get $o0))
        (if (i32.lt_s (i32.add (local.get $i) (i32.const 1)) (local.get $n))
          (then
            ${rowStart(upd, mul, '1', '(i32.add (local.get $i) (i32.const 1))')}
            ${twoRowPairs(upd, mul, `${label}_two`)}
            (local.set $oSave (local.get $o))
            ${rowTail(upd, mul, '')}
            (local.set $o (local.get $oSave))
            ${rowPairs(upd, mul, `${label}_last`, '1')}
            ${rowTail(upd, mul, '1')}
            (local.set $i (i32.add (local.get $i) (i32.const 2))))
          (else
            ${rowPairs(upd, mul, `${label}_one`, '')}
            ${rowTail(upd, mul, '')}
            (local.set $i (i32.add (local.get $i) (i32.const 1)))))
        (br $${label}_rows)))`;
  /** Row i of column k + 1: w_i = p_i − kk v_i stored, the entry updated; with next, also the next reflector's tail sum and its copies into vn, refl's row k + 1 ($row) and a zero pn. */
  const columnEntry = (next) => `
          (local.set $vi ${f64(X('$v', '(local.get $i)'))})
          (local.set $wi (f64.sub ${f64(X('$p', '(local.get $i)'))} (f64.mul (local.get $kk) (local.get $vi))))
          (f64.store ${X('$p', '(local.get $i)')} (local.get $wi))
          (local.set $aij (f64.sub ${f64(A('(local.get $i)', K(1)))} (f64.add (f64.mul (local.get $vi) (local.get $wk)) (f64.mul (local.get $wi) (local.get $vk)))))
          (f64.store ${A('(local.get $i)', K(1))} (local.get $aij))
          ${next
            ? `(local.set $tail (f64.add (local.get $tail) (f64.mul (local.get $aij) (local.get $aij))))
          (f64.store ${X('$vn', '(local.get $i)')} (local.get $aij))
          (f64.store ${at('(local.get $row)', '(local.get $i)')} (local.get $aij))
          (f64.store ${X('$pn', '(local.get $i)')} (f64.const 0))`
            : ''}
          (local.set $i (i32.add (local.get $i) (i32.const 1)))`;
  /** Reflector k + 1 from its column, whose entries from row k + 3 on columnEntry(true) has summed and copied already. */
  const formNext = () => `
      (local.set $x0 ${f64(A(K(2), K(1)))})
      (local.set $beta (f64.const 0))
      (if (f64.eq (local.get $tail) (f64.const 0))
        (then
          (f64.store ${at('(local.get $betas)', K(1))} (f64.const 0))
          (f64.store ${at('(local.get $e)', K(1))} (local.get $x0))
          ;; nothing to reflect: refl's row stays zero (the copies may have written ±0 or entries whose squares underflowed)
          (local.set $i ${K(3)})
          (block $rz_done (loop $rz
            (br_if $rz_done (i32.ge_s (local.get $i) (local.get $n)))
            (f64.store ${at('(local.get $row)', '(local.get $i)')} (f64.const 0))
            (local.set $i (i32.add (local.get $i) (i32.const 1)))
            (br $rz))))
        (else
          (local.set $alpha (f64.sqrt (f64.add (local.get $tail) (f64.mul (local.get $x0) (local.get $x0)))))
          (if (f64.ge (local.get $x0) (f64.const 0)) (then (local.set $alpha (f64.neg (local.get $alpha)))))
          (local.set $aij (f64.sub (local.get $x0) (local.get $alpha)))
          (f64.store ${A(K(2), K(1))} (local.get $aij))
          (f64.store ${X('$vn', K(1))} (f64.const 0))
          (f64.store ${X('$pn', K(1))} (f64.const 0))
          (f64.store ${X('$vn', K(0))} (f64.const 0))
          (f64.store ${X('$vn', K(2))} (local.get $aij))
          (f64.store ${at('(local.get $row)', K(2))} (local.get $aij))
          (f64.store ${X('$pn', K(2))} (f64.const 0))
          (local.set $beta (f64.div (f64.const 2) (f64.add (f64.mul (local.get $aij) (local.get $aij)) (local.get $tail))))
          (f64.store ${at('(local.get $betas)', K(1))} (local.get $beta))
          (f64.store ${at('(local.get $e)', K(1))} (local.get $alpha))))`;
  return `
  (func $tridiagonalise (export "tridiagonalise")
    (param $a i32) (param $ns i32) (param $n i32) (param $d i32) (param $e i32) (param $betas i32) (param $v i32) (param $p i32) (param $vn i32) (param $pn i32) (param $refl i32)
    (local $k i32) (local $i i32) (local $i0 i32) (local $o i32) (local $o0 i32) (local $oDiag i32) (local $row i32) (local $rowBytes i32) (local $pending i32) (local $swap i32)
    (local $tail f64) (local $x0 f64) (local $alpha f64) (local $beta f64) (local $s f64) (local $vi f64) (local $wi f64) (local $ni f64)
    (local $vp f64) (local $kk f64) (local $aij f64) (local $wk f64) (local $vk f64)
    (local $s2 v128) (local $x v128) (local $vi2 v128) (local $wi2 v128) (local $ni2 v128)
    (local $row1 i32) (local $oDiag1 i32) (local $oSave i32) (local $vi1 f64) (local $wi1 f64) (local $ni1 f64)
    (local $s21 v128) (local $x1 v128) (local $vi21 v128) (local $wi21 v128) (local $ni21 v128) (local $y v128) (local $pp v128) (local $vv v128)
    (local.set $rowBytes (i32.shl (local.get $ns) (i32.const 3)))
    ;; refl's n rows start at zero (ns is even: whole pairs)
    (local.set $o (local.get $refl))
    (local.set $o0 (i32.add (local.get $refl) (i32.mul (local.get $n) (local.get $rowBytes))))
    (block $z_done (loop $zl
      (br_if $z_done (i32.ge_u (local.get $o) (local.get $o0)))
      (v128.store (local.get $o) (v128.const f64x2 0 0))
      (local.set $o (i32.add (local.get $o) (i32.const 16)))
      (br $zl)))
    (local.set $k (i32.const 0))
    (block $steps_done
      (loop $steps
        (br_if $steps_done (i32.ge_s ${K(2)} (local.get $n)))
        (if (i32.eqz (local.get $pending))
          (then
            ${form(0, '$v', '$p')}
            (if (f64.eq (local.get $beta) (f64.const 0))
              (then (local.set $k ${K(1)}) (br $steps)))
            ;; p = A v alone (the product of a step whose predecessor left nothing to fuse with)
            (local.set $swap (local.get $vn)) (local.set $vn (local.get $v)) (local.set $v (local.get $swap))
            (local.set $swap (local.get $pn)) (local.set $pn (local.get $p)) (local.set $p (local.get $swap))
            (local.set $i0 ${K(1)})
            (local.set $o0 (i32.shl (i32.and ${K(1)} (i32.const -2)) (i32.const 3)))
            ${pass(false, true, 'mv')}
            (local.set $swap (local.get $vn)) (local.set $vn (local.get $v)) (local.set $v (local.get $swap))
            (local.set $swap (local.get $pn)) (local.set $pn (local.get $p)) (local.set $p (local.get $swap))))
        (local.set $beta ${f64(at('(local.get $betas)', K(0)))})
        ;; p ← β p, then w = p − (β/2)(vᵀp) v in p.
        (local.set $vp (f64.const 0))
        (local.set $i ${K(1)})
        (block $b_done (loop $b
          (br_if $b_done (i32.ge_s (local.get $i) (local.get $n)))
          (local.set $s (f64.mul (local.get $beta) ${f64(X('$p', '(local.get $i)'))}))
          (f64.store ${X('$p', '(local.get $i)')} (local.get $s))
          (local.set $vp (f64.add (local.get $vp) (f64.mul ${f64(X('$v', '(local.get $i)'))} (local.get $s))))
          (local.set $i (i32.add (local.get $i) (i32.const 1)))
          (br $b)))
        (local.set $kk (f64.mul (f64.mul (f64.const 0.5) (local.get $beta)) (local.get $vp)))
        ;; w = p − kk v, column k + 1 of the trailing triangle (rows ≥ k + 1) updated by it, and
        ;; from row k + 3 on the next reflector's sum of squares and copies taken from the updated
        ;; entries in the same trip (the separate passes down the column, one double a row, are gone).
        (local.set $vk ${f64(X('$v', K(1)))})
        (local.set $wk (f64.sub ${f64(X('$p', K(1)))} (f64.mul (local.get $kk) (local.get $vk))))
        (local.set $tail (f64.const 0))
        (local.set $i ${K(1)})
        (local.set $o ${K(3)})
        (if (i32.gt_s (local.get $o) (local.get $n)) (then (local.set $o (local.get $n))))
        (block $col_done (loop $col
          (br_if $col_done (i32.ge_s (local.get $i) (local.get $o)))
          ${columnEntry(false)}
          (br $col)))
        (local.set $row (i32.add (local.get $refl) (i32.mul ${K(1)} (local.get $rowBytes))))
        (block $colt_done (loop $colt
          (br_if $colt_done (i32.ge_s (local.get $i) (local.get $n)))
          ${columnEntry(true)}
          (br $colt)))
        (f64.store ${X('$p', K(0))} (f64.const 0))
        (f64.store ${X('$v', K(1))} (f64.const 0))
        (f64.store ${X('$p', K(1))} (f64.const 0))
        (local.set $i0 ${K(2)})
        (local.set $o0 (i32.shl (i32.and ${K(1)} (i32.const -2)) (i32.const 3)))
        (local.set $pending (i32.const 0))
        (if (i32.lt_s ${K(3)} (local.get $n))
          (then
            ${formNext()}
            (if (f64.ne (local.get $beta) (f64.const 0))
              (then
                ${pass(true, true, 'fused')}
                (local.set $swap (local.get $vn)) (local.set $vn (local.get $v)) (local.set $v (local.get $swap))
                (local.set $swap (local.get $pn)) (local.set $pn (local.get $p)) (local.set $p (local.get $swap))
                (local.set $pending (i32.const 1))))))
        (if (i32.eqz (local.get $pending))
          (then ${pass(true, false, 'up')}))
        (local.set $k ${K(1)})
        (br $steps)))
    (local.set $i (i32.const 0))
    (block $d_done (loop $dl
      (br_if $d_done (i32.ge_s (local.get $i) (local.get $n)))
      (f64.store ${at('(local.get $d)', '(local.get $i)')} ${f64(A('(local.get $i)', '(local.get $i)'))})
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $dl)))
    (if (i32.ge_s (local.get $n) (i32.const 2))
      (then
        (f64.store ${at('(local.get $e)', '(i32.sub (local.get $n) (i32.const 2))')}
          ${f64(A('(i32.sub (local.get $n) (i32.const 1))', '(i32.sub (local.get $n) (i32.const 2))'))})))
  )`;
}

/**
 * applyReflectors(z, ns, rows, n, refl, betas): every row r < rows (a multiple of ROW_TILE) of z
 * becomes row · H_{n−3} … H_0 (as applyReflectors in householderInverseIteration.ts; the
 * reflectors as rows of refl, written by tridiagonalise), z ← z − β_k (z · v_k) v_k one reflector after another.
 * ROW_TILE rows stay in cache, and one pass over them does two jobs: the update by reflector k
 * and, on each pair just updated (still in registers), the dot products with reflector k − 1.
 * Every z pair is loaded and stored once per reflector, and the dot products ride along in the
 * floating-point ports the update leaves idle: the update alone was bound near half their rate
 * (1.30–1.48× against two reflectors a pass with separate dot and update loops, orders 64–256,
 * docs/engine.md). Four rows keep the four coefficients, four sums, two reflector pairs and
 * the z pair in 11 registers; six rows, or two reflectors a pass, ran slower.
 */
function applyReflectors() {
  const R = ROW_TILE;
  const idx = [...Array(R).keys()];
  const zAt = (q) => `(i32.add (local.get $z${q}) (local.get $o))`;
  const row = (k) => at('(local.get $refl)', `(i32.mul ${k} (local.get $ns))`);
  const start = (first) => `(local.set $o (i32.shl (i32.and ${first} (i32.const -2)) (i32.const 3)))`;
  /** One pair of columns (imm bytes past $o): update by $va (if upd), dot with $vb (if dot). */
  const pair = (upd, dot, imm) => `
          ${upd ? `(local.set $x (v128.load offset=${imm} (i32.add (local.get $va) (local.get $o))))` : ''}
          ${dot ? `(local.set $y (v128.load offset=${imm} (i32.add (local.get $vb) (local.get $o))))` : ''}
          ${idx
            .map((q) =>
              upd
                ? `(local.set $w (f64x2.sub (v128.load offset=${imm} ${zAt(q)}) (f64x2.mul (local.get $c${q}) (local.get $x))))
          (v128.store offset=${imm} ${zAt(q)} (local.get $w))${dot ? `
          (local.set $s${q} (f64x2.add (local.get $s${q}) (f64x2.mul (local.get $y) (local.get $w))))` : ''}`
                : `(local.set $s${q} (f64x2.add (local.get $s${q}) (f64x2.mul (local.get $y) (v128.load offset=${imm} ${zAt(q)}))))`,
            )
            .join('\n          ')}`;
  /** Columns from $o to the row's end, two pairs a loop trip. */
  const pass = (upd, dot, label) => `
        ${dot ? idx.map((q) => `(local.set $s${q} (v128.const f64x2 0 0))`).join(' ') : ''}
        (block $${label}_done (loop $${label}
          (br_if $${label}_done (i32.ge_s (local.get $o) (local.get $end)))
          ${pair(upd, dot, 0)}
          (if (i32.lt_s (i32.add (local.get $o) (i32.const 16)) (local.get $end)) (then ${pair(upd, dot, 16)}))
          (local.set $o (i32.add (local.get $o) (i32.const 32)))
          (br $${label})))`;
  /** The coefficients β_k (z · v_k) of reflector k, splatted. */
  const coefficients = idx
    .map((q) => `(local.set $c${q} (f64x2.splat (f64.mul (local.get $beta) ${sumLanes(`(local.get $s${q})`)})))`)
    .join('\n        ');
  return `
  (func $applyReflectors (export "applyReflectors") (param $z i32) (param $ns i32) (param $rows i32) (param $n i32) (param $refl i32) (param $betas i32)
    (local $r i32) (local $k i32) (local $o i32) (local $end i32) (local $va i32) (local $vb i32) (local $rowBytes i32)
    (local $beta f64) (local $x v128) (local $y v128) (local $w v128)
    ${idx.map((q) => `(local $z${q} i32) (local $s${q} v128) (local $c${q} v128)`).join(' ')}
    (local.set $rowBytes (i32.shl (local.get $ns) (i32.const 3)))
    (local.set $end (local.get $rowBytes))
    (if (i32.lt_s (local.get $n) (i32.const 3)) (then (return)))
    (local.set $r (i32.const 0))
    (block $r_done (loop $rl
      (br_if $r_done (i32.ge_s (local.get $r) (local.get $rows)))
      ${idx.map((q) => `(local.set $z${q} (i32.add (local.get $z) (i32.mul (i32.add (local.get $r) (i32.const ${q})) (local.get $rowBytes))))`).join('\n      ')}
      ;; reflector n − 3: dot products alone
      (local.set $k (i32.sub (local.get $n) (i32.const 3)))
      (local.set $vb ${row('(local.get $k)')})
      ${start('(i32.add (local.get $k) (i32.const 1))')}
      ${pass(false, true, 'first')}
      (local.set $beta ${f64(at('(local.get $betas)', '(local.get $k)'))})
      ${coefficients}
      ;; update by reflector k with the dot products of reflector k − 1 (its columns start at k or k − 1)
      (block $k_done (loop $kl
        (br_if $k_done (i32.lt_s (local.get $k) (i32.const 1)))
        (local.set $va (local.get $vb))
        (local.set $vb (i32.sub (local.get $va) (local.get $rowBytes)))
        ${start('(local.get $k)')}
        ${pass(true, true, 'fused')}
        (local.set $k (i32.sub (local.get $k) (i32.const 1)))
        (local.set $beta ${f64(at('(local.get $betas)', '(local.get $k)'))})
        ${coefficients}
        (br $kl)))
      ;; reflector 0: update alone
      (local.set $va (local.get $vb))
      ${start('(i32.const 1)')}
      ${pass(true, false, 'last')}
      (local.set $r (i32.add (local.get $r) (i32.const ${R})))
      (br $rl)))
  )`;
}

/**
 * maxAbs(src, count) → max |src[i]| (NaN if any entry is NaN or infinite); scalePairs(at, count,
 * factor): at[i] ← factor · at[i] for i < count (even), in pairs, in place — at even orders the
 * caller copies its matrix straight into the reduction's rows (no staging copy; 1.27–1.31× for
 * the copy in at 128–192); packScaled(src, n, ns, dst, factor): dst[i·ns + j] = factor ·
 * src[i·n + j], zero in the padding column, for odd orders, whose rows need the padding;
 * unpackTransposed(z, ns, n, out): out[i·n + r] = z[r·ns + i]. The O(n²) moves into and out of
 * the kernels' layout.
 */
function moves() {
  return `
  (func $maxAbs (export "maxAbs") (param $src i32) (param $count i32) (result f64)
    (local $i i32) (local $m v128) (local $bad v128) (local $x f64)
    ;; pmax is one instruction (f64x2.max, with its NaN rules, is several on x64) but skips NaN:
    ;; x · 0 is NaN exactly for a NaN or infinite x, so $bad collects those.
    (local.set $m (v128.const f64x2 0 0))
    (local.set $bad (v128.const f64x2 0 0))
    (local.set $i (i32.const 0))
    (block $done (loop $l
      (br_if $done (i32.gt_s (i32.add (local.get $i) (i32.const 2)) (local.get $count)))
      (local.set $m (f64x2.pmax (local.get $m) (f64x2.abs (v128.load ${at('(local.get $src)', '(local.get $i)')}))))
      (local.set $bad (f64x2.add (local.get $bad) (f64x2.mul (v128.load ${at('(local.get $src)', '(local.get $i)')}) (v128.const f64x2 0 0))))
      (local.set $i (i32.add (local.get $i) (i32.const 2)))
      (br $l)))
    (local.set $x (f64.max (f64x2.extract_lane 0 (local.get $m)) (f64x2.extract_lane 1 (local.get $m))))
    (if (i32.lt_s (local.get $i) (local.get $count))
      (then (local.set $x (f64.max (local.get $x) (f64.abs ${f64(at('(local.get $src)', '(local.get $i)'))})))))
    (f64.add (local.get $x) ${sumLanes('(local.get $bad)')}))
  (func $scalePairs (export "scalePairs") (param $at i32) (param $count i32) (param $factor f64)
    (local $o i32) (local $end i32) (local $f v128)
    (local.set $f (f64x2.splat (local.get $factor)))
    (local.set $o (local.get $at))
    (local.set $end ${at('(local.get $at)', '(local.get $count)')})
    (block $done (loop $l
      (br_if $done (i32.ge_u (local.get $o) (local.get $end)))
      (v128.store (local.get $o) (f64x2.mul (local.get $f) (v128.load (local.get $o))))
      (local.set $o (i32.add (local.get $o) (i32.const 16)))
      (br $l))))
  (func $packScaled (export "packScaled") (param $src i32) (param $n i32) (param $ns i32) (param $dst i32) (param $factor f64)
    (local $i i32) (local $j i32) (local $from i32) (local $to i32)
    (local.set $i (i32.const 0))
    (block $i_done (loop $il
      (br_if $i_done (i32.ge_s (local.get $i) (local.get $n)))
      (local.set $from ${at('(local.get $src)', '(i32.mul (local.get $i) (local.get $n))')})
      (local.set $to ${at('(local.get $dst)', '(i32.mul (local.get $i) (local.get $ns))')})
      (local.set $j (i32.const 0))
      (block $j_done (loop $jl
        (br_if $j_done (i32.ge_s (local.get $j) (local.get $n)))
        (f64.store ${at('(local.get $to)', '(local.get $j)')} (f64.mul (local.get $factor) ${f64(at('(local.get $from)', '(local.get $j)'))}))
        (local.set $j (i32.add (local.get $j) (i32.const 1)))
        (br $jl)))
      (if (i32.lt_s (local.get $n) (local.get $ns)) (then (f64.store ${at('(local.get $to)', '(local.get $n)')} (f64.const 0))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $il))))
  ${unpackTransposed()}`;
}

/**
 * unpackTransposed(z, ns, n, out): out[i·n + r] = z[r·ns + i], the eigenvector rows of z into the
 * caller's columns. Eight rows of z at a time: each step loads a pair from each of them and writes
 * two runs of eight doubles of out (a cache line when 8 divides n), the pairs regrouped by unpacking shuffles.
 * One row at a time wrote out one double per line, a column at a stride of 8n bytes; at orders
 * like 192 and 256 such a column maps to a few of the cache's sets and missed on every store
 * (110 against 13 µs at 192 and 160). The rows left (fewer than eight) go one at a time.
 */
function unpackTransposed() {
  const B = 8;
  const qs = [...Array(B).keys()];
  const lo = '0 1 2 3 4 5 6 7 16 17 18 19 20 21 22 23';
  const hi = '8 9 10 11 12 13 14 15 24 25 26 27 28 29 30 31';
  return `(func $unpackTransposed (export "unpackTransposed") (param $z i32) (param $ns i32) (param $n i32) (param $out i32)
    (local $r i32) (local $i i32) (local $from i32) (local $to i32) (local $step i32) (local $o i32) (local $rowBytes i32)
    ${qs.map((q) => `(local $z${q} i32) (local $p${q} v128)`).join(' ')}
    (local.set $step (i32.shl (local.get $n) (i32.const 3)))
    (local.set $rowBytes (i32.shl (local.get $ns) (i32.const 3)))
    (local.set $r (i32.const 0))
    (block $b_done (loop $bl
      (br_if $b_done (i32.gt_s (i32.add (local.get $r) (i32.const ${B})) (local.get $n)))
      ${qs.map((q) => `(local.set $z${q} (i32.add (local.get $z) (i32.mul (i32.add (local.get $r) (i32.const ${q})) (local.get $rowBytes))))`).join('\n      ')}
      (local.set $to ${at('(local.get $out)', '(local.get $r)')})
      (local.set $o (i32.const 0))
      (local.set $i (i32.const 0))
      (block $i_done (loop $il
        (br_if $i_done (i32.gt_s (i32.add (local.get $i) (i32.const 2)) (local.get $n)))
        ${qs.map((q) => `(local.set $p${q} (v128.load (i32.add (local.get $z${q}) (local.get $o))))`).join(' ')}
        ${[0, 1, 2, 3].map((h) => `(v128.store offset=${16 * h} (local.get $to) (i8x16.shuffle ${lo} (local.get $p${2 * h}) (local.get $p${2 * h + 1})))`).join('\n        ')}
        (local.set $from (i32.add (local.get $to) (local.get $step)))
        ${[0, 1, 2, 3].map((h) => `(v128.store offset=${16 * h} (local.get $from) (i8x16.shuffle ${hi} (local.get $p${2 * h}) (local.get $p${2 * h + 1})))`).join('\n        ')}
        (local.set $to (i32.add (local.get $from) (local.get $step)))
        (local.set $o (i32.add (local.get $o) (i32.const 16)))
        (local.set $i (i32.add (local.get $i) (i32.const 2)))
        (br $il)))
      (if (i32.lt_s (local.get $i) (local.get $n))
        (then ${qs.map((q) => `(f64.store offset=${8 * q} (local.get $to) (f64.load (i32.add (local.get $z${q}) (local.get $o))))`).join(' ')}))
      (local.set $r (i32.add (local.get $r) (i32.const ${B})))
      (br $bl)))
    (block $r_done (loop $rl
      (br_if $r_done (i32.ge_s (local.get $r) (local.get $n)))
      (local.set $from ${at('(local.get $z)', '(i32.mul (local.get $r) (local.get $ns))')})
      (local.set $to ${at('(local.get $out)', '(local.get $r)')})
      (local.set $i (i32.const 0))
      (block $i1_done (loop $i1
        (br_if $i1_done (i32.ge_s (local.get $i) (local.get $n)))
        (f64.store (local.get $to) ${f64(at('(local.get $from)', '(local.get $i)'))})
        (local.set $to (i32.add (local.get $to) (local.get $step)))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $i1)))
      (local.set $r (i32.add (local.get $r) (i32.const 1)))
      (br $rl))))`;
}

/**
 * multiply(a, as, b, bs, c, cs, rows, inner, cols): c = a · b for a rows × inner, b inner × cols
 * (row-major, strides as, bs, cs in doubles), the products of the divide-and-conquer merges
 * (divideConquerTridiagonal.ts). Tiles of 4 rows × 4 columns: eight pairs of sums stay in
 * registers while the inner index runs, each step loading two pairs of b and four entries of a,
 * each entry into both lanes by one load64_splat (a scalar load and a splat were two instructions:
 * 1.2–1.26× on 96–192 products, the same bits; tiles of six rows or six columns ran out of
 * registers and were 0.4–0.7×).
 * rows and cols are rounded up to 4, so up to three more rows and columns are read and written.
 */
function multiply() {
  const idx = [0, 1, 2, 3];
  const acc = (q, h) => `$c${q}${h}`;
  return `
  (func $multiply (export "multiply")
    (param $a i32) (param $as i32) (param $b i32) (param $bs i32) (param $c i32) (param $cs i32) (param $rows i32) (param $inner i32) (param $cols i32)
    (local $i i32) (local $j i32) (local $l i32) (local $bp i32) (local $ap i32) (local $arow i32) (local $crow i32) (local $astep i32) (local $bstep i32) (local $cstep i32)
    (local $b0 v128) (local $b1 v128) (local $x v128)
    ${idx.map((q) => `(local ${acc(q, 0)} v128) (local ${acc(q, 1)} v128)`).join(' ')}
    (local.set $astep (i32.shl (local.get $as) (i32.const 3)))
    (local.set $bstep (i32.shl (local.get $bs) (i32.const 3)))
    (local.set $cstep (i32.shl (local.get $cs) (i32.const 3)))
    (local.set $i (i32.const 0))
    (block $i_done (loop $il
      (br_if $i_done (i32.ge_s (local.get $i) (local.get $rows)))
      (local.set $arow (i32.add (local.get $a) (i32.mul (local.get $i) (local.get $astep))))
      (local.set $crow (i32.add (local.get $c) (i32.mul (local.get $i) (local.get $cstep))))
      (local.set $j (i32.const 0))
      (block $j_done (loop $jl
        (br_if $j_done (i32.ge_s (local.get $j) (local.get $cols)))
        ${idx.map((q) => `(local.set ${acc(q, 0)} (v128.const f64x2 0 0)) (local.set ${acc(q, 1)} (v128.const f64x2 0 0))`).join('\n        ')}
        (local.set $bp (i32.add (local.get $b) (i32.shl (local.get $j) (i32.const 3))))
        (local.set $ap (local.get $arow))
        (local.set $l (local.get $inner))
        (block $l_done (loop $ll
          (br_if $l_done (i32.le_s (local.get $l) (i32.const 0)))
          (local.set $b0 (v128.load (local.get $bp)))
          (local.set $b1 (v128.load offset=16 (local.get $bp)))
          ${idx
            .map(
              (q) => `(local.set $x (v128.load64_splat ${q === 0 ? '(local.get $ap)' : `(i32.add (local.get $ap) (i32.mul (local.get $astep) (i32.const ${q})))`}))
          (local.set ${acc(q, 0)} (f64x2.add (local.get ${acc(q, 0)}) (f64x2.mul (local.get $x) (local.get $b0))))
          (local.set ${acc(q, 1)} (f64x2.add (local.get ${acc(q, 1)}) (f64x2.mul (local.get $x) (local.get $b1))))`,
            )
            .join('\n          ')}
          (local.set $ap (i32.add (local.get $ap) (i32.const 8)))
          (local.set $bp (i32.add (local.get $bp) (local.get $bstep)))
          (local.set $l (i32.sub (local.get $l) (i32.const 1)))
          (br $ll)))
        ${idx
          .map(
            (q) => `(v128.store (i32.add (local.get $crow) (i32.add (i32.shl (local.get $j) (i32.const 3)) (i32.mul (local.get $cstep) (i32.const ${q})))) (local.get ${acc(q, 0)}))
        (v128.store offset=16 (i32.add (local.get $crow) (i32.add (i32.shl (local.get $j) (i32.const 3)) (i32.mul (local.get $cstep) (i32.const ${q})))) (local.get ${acc(q, 1)}))`,
          )
          .join('\n        ')}
        (local.set $j (i32.add (local.get $j) (i32.const 4)))
        (br $jl)))
      (local.set $i (i32.add (local.get $i) (i32.const 4)))
      (br $il)))
  )`;
}

/**
 * $sumsAt(d, row, z2, split, k, pole, t, out), internal: the two halves of the secular function's
 * sum at λ = pole + t (secularRoots.ts): out[0] = Σ_{j≤split} z2_j r_j and out[1] = Σ_{j≤split}
 * z2_j r_j² with r_j = 1/((d_j − pole) − t), out[2], out[3] the same over split < j < k. The
 * differences are formed here from the poles (the same numbers as a row of offsets
 * (d_j − pole) − 0 minus t) and stored in `row` as they go: the iteration stops right after an
 * evaluation, so the root's row d_j − λ is then there already. Pairs of terms per operation, two
 * divisions in one.
 */
function secularSums() {
  const half = (name, from, to, s, ds) => `
    (local.set $j ${from})
    (local.set ${s} (v128.const f64x2 0 0))
    (local.set ${ds} (v128.const f64x2 0 0))
    (block $${name}_done (loop $${name}
      (br_if $${name}_done (i32.ge_s (i32.add (local.get $j) (i32.const 1)) ${to}))
      (local.set $r (f64x2.sub (f64x2.sub (v128.load ${at('(local.get $d)', '(local.get $j)')}) (local.get $pp)) (local.get $tt)))
      (v128.store ${at('(local.get $row)', '(local.get $j)')} (local.get $r))
      (local.set $r (f64x2.div (v128.const f64x2 1 1) (local.get $r)))
      (local.set $w (f64x2.mul (v128.load ${at('(local.get $z2)', '(local.get $j)')}) (local.get $r)))
      (local.set ${s} (f64x2.add (local.get ${s}) (local.get $w)))
      (local.set ${ds} (f64x2.add (local.get ${ds}) (f64x2.mul (local.get $w) (local.get $r))))
      (local.set $j (i32.add (local.get $j) (i32.const 2)))
      (br $${name})))
    (local.set $x (f64.const 0))
    (local.set $dx (f64.const 0))
    (if (i32.lt_s (local.get $j) ${to})
      (then
        (local.set $y (f64.sub (f64.sub ${f64(at('(local.get $d)', '(local.get $j)'))} (local.get $pole)) (local.get $t)))
        (f64.store ${at('(local.get $row)', '(local.get $j)')} (local.get $y))
        (local.set $y (f64.div (f64.const 1) (local.get $y)))
        (local.set $x (f64.mul ${f64(at('(local.get $z2)', '(local.get $j)'))} (local.get $y)))
        (local.set $dx (f64.mul (local.get $x) (local.get $y)))))`;
  return `
  (func $sumsAt (param $d i32) (param $row i32) (param $z2 i32) (param $split i32) (param $k i32) (param $pole f64) (param $t f64) (param $out i32)
    (local $j i32) (local $pp v128) (local $tt v128) (local $r v128) (local $w v128) (local $s v128) (local $ds v128) (local $x f64) (local $dx f64) (local $y f64)
    (local.set $pp (f64x2.splat (local.get $pole)))
    (local.set $tt (f64x2.splat (local.get $t)))
    ${half('left', '(i32.const 0)', '(i32.add (local.get $split) (i32.const 1))', '$s', '$ds')}
    (f64.store (local.get $out) (f64.add (local.get $x) ${sumLanes('(local.get $s)')}))
    (f64.store offset=8 (local.get $out) (f64.add (local.get $dx) ${sumLanes('(local.get $ds)')}))
    ${half('right', '(i32.add (local.get $split) (i32.const 1))', '(local.get $k)', '$s', '$ds')}
    (f64.store offset=16 (local.get $out) (f64.add (local.get $x) ${sumLanes('(local.get $s)')}))
    (f64.store offset=24 (local.get $out) (f64.add (local.get $dx) ${sumLanes('(local.get $ds)')}))
  )`;
}

/**
 * Internal, called by the per-merge kernels below: $ratiosAt(prod, gaps, d, from, to, pole):
 * prod_j ← prod_j · gaps_j / (d_j − pole) for from ≤ j < to, one row's factors of the
 * Gu–Eisenstat weights; $offsetsAt(gaps, d, k, pole, t): gaps_j ← (d_j − pole) − t, a root's row
 * of d_j − λ (secularRoots.ts); $cauchyRow(gaps, w, k, dst, index): x_j = w_j / gaps_j, then
 * dst[index[j]] = x_j / ‖x‖ (i32 indices; gaps is left holding x), one new vector
 * (divideConquerTridiagonal.ts).
 */
function vectorRows() {
  const G = (j) => at('(local.get $gaps)', j);
  return `
  (func $ratiosAt (param $prod i32) (param $gaps i32) (param $d i32) (param $from i32) (param $to i32) (param $pole f64)
    (local $j i32) (local $pp v128)
    (local.set $pp (f64x2.splat (local.get $pole)))
    (local.set $j (local.get $from))
    (block $done (loop $l
      (br_if $done (i32.ge_s (i32.add (local.get $j) (i32.const 1)) (local.get $to)))
      (v128.store ${at('(local.get $prod)', '(local.get $j)')}
        (f64x2.mul (v128.load ${at('(local.get $prod)', '(local.get $j)')})
          (f64x2.div (v128.load ${G('(local.get $j)')}) (f64x2.sub (v128.load ${at('(local.get $d)', '(local.get $j)')}) (local.get $pp)))))
      (local.set $j (i32.add (local.get $j) (i32.const 2)))
      (br $l)))
    (if (i32.lt_s (local.get $j) (local.get $to))
      (then
        (f64.store ${at('(local.get $prod)', '(local.get $j)')}
          (f64.mul ${f64(at('(local.get $prod)', '(local.get $j)'))}
            (f64.div ${f64(G('(local.get $j)'))} (f64.sub ${f64(at('(local.get $d)', '(local.get $j)'))} (local.get $pole))))))))
  (func $offsetsAt (param $gaps i32) (param $d i32) (param $k i32) (param $pole f64) (param $t f64)
    (local $j i32) (local $pp v128) (local $tt v128)
    (local.set $pp (f64x2.splat (local.get $pole)))
    (local.set $tt (f64x2.splat (local.get $t)))
    (local.set $j (i32.const 0))
    (block $done (loop $l
      (br_if $done (i32.ge_s (i32.add (local.get $j) (i32.const 1)) (local.get $k)))
      (v128.store ${G('(local.get $j)')} (f64x2.sub (f64x2.sub (v128.load ${at('(local.get $d)', '(local.get $j)')}) (local.get $pp)) (local.get $tt)))
      (local.set $j (i32.add (local.get $j) (i32.const 2)))
      (br $l)))
    (if (i32.lt_s (local.get $j) (local.get $k))
      (then (f64.store ${G('(local.get $j)')} (f64.sub (f64.sub ${f64(at('(local.get $d)', '(local.get $j)'))} (local.get $pole)) (local.get $t))))))
  (func $cauchyRow (param $gaps i32) (param $w i32) (param $k i32) (param $dst i32) (param $index i32)
    (local $j i32) (local $x v128) (local $s v128) (local $y f64) (local $t f64)
    ;; Pass 1 stores the quotients over gaps in pairs, pass 2 reads them back in the same pairs
    ;; (16-byte loads of 16-byte stores). Reading them back one double at a time cost about 5 ns
    ;; an entry (0.96 against 0.22 µs a call at k = 160, likely 8-byte loads of 16-byte stores not
    ;; forwardable), so an earlier version divided again in pass 2 instead.
    (local.set $s (v128.const f64x2 0 0))
    (local.set $j (i32.const 0))
    (block $done (loop $l
      (br_if $done (i32.ge_s (i32.add (local.get $j) (i32.const 1)) (local.get $k)))
      (local.set $x (f64x2.div (v128.load ${at('(local.get $w)', '(local.get $j)')}) (v128.load ${G('(local.get $j)')})))
      (v128.store ${G('(local.get $j)')} (local.get $x))
      (local.set $s (f64x2.add (local.get $s) (f64x2.mul (local.get $x) (local.get $x))))
      (local.set $j (i32.add (local.get $j) (i32.const 2)))
      (br $l)))
    (local.set $t ${sumLanes('(local.get $s)')})
    (if (i32.lt_s (local.get $j) (local.get $k))
      (then
        (local.set $y (f64.div ${f64(at('(local.get $w)', '(local.get $j)'))} ${f64(G('(local.get $j)'))}))
        (f64.store ${G('(local.get $j)')} (local.get $y))
        (local.set $t (f64.add (local.get $t) (f64.mul (local.get $y) (local.get $y))))))
    (local.set $t (f64.div (f64.const 1) (f64.sqrt (local.get $t))))
    (local.set $j (i32.const 0))
    (block $s_done (loop $sl
      (br_if $s_done (i32.ge_s (i32.add (local.get $j) (i32.const 1)) (local.get $k)))
      (local.set $x (f64x2.mul (f64x2.splat (local.get $t)) (v128.load ${G('(local.get $j)')})))
      (f64.store ${at('(local.get $dst)', `(i32.load ${at4('(local.get $index)', '(local.get $j)')})`)} (f64x2.extract_lane 0 (local.get $x)))
      (f64.store ${at('(local.get $dst)', `(i32.load offset=4 ${at4('(local.get $index)', '(local.get $j)')})`)} (f64x2.extract_lane 1 (local.get $x)))
      (local.set $j (i32.add (local.get $j) (i32.const 2)))
      (br $sl)))
    (if (i32.lt_s (local.get $j) (local.get $k))
      (then
        (f64.store ${at('(local.get $dst)', `(i32.load ${at4('(local.get $index)', '(local.get $j)')})`)}
          (f64.mul (local.get $t) ${f64(G('(local.get $j)'))})))))`;
}

/**
 * secularRoots(gaps, z2, d, k, args, origin, tau, out) → 1, or 0 if a root did not settle: every
 * root of one merge's secular equation, the iteration of secularRoots.ts step for step (the same
 * start, model root, bracket, stopping rule and step limit, each operation in the same order) in
 * one call instead of one call per evaluation of the sums, each of which crossed V8's generic
 * JS-to-WebAssembly wrapper. ρ is args[0]; the sums go through `out` (four doubles).
 */
function secularIteration() {
  const D = (i) => f64(at('(local.get $d)', i));
  const sums = '(call $sumsAt (local.get $d) (local.get $row) (local.get $z2) (local.get $i) (local.get $k) (local.get $pole) (local.get $t) (local.get $out))';
  const abs = (x) => `(f64.abs ${x})`;
  return `
  (func $modelRoot (param $invRho f64) (param $psi f64) (param $dpsi f64) (param $phi f64) (param $dphi f64) (param $a f64) (param $b f64) (param $t f64) (param $two i32) (result f64)
    ;; secularRoots.ts's modelRoot: the root of c + c1/(a − x) + c2/(b − x) between a and b, or NaN.
    (local $c1 f64) (local $c2 f64) (local $c f64) (local $qb f64) (local $q0 f64) (local $disc f64) (local $q f64) (local $x1 f64) (local $x2 f64)
    (local.set $c1 (f64.mul (f64.mul (local.get $dpsi) (f64.sub (local.get $a) (local.get $t))) (f64.sub (local.get $a) (local.get $t))))
    (if (i32.eqz (local.get $two))
      (then
        (local.set $c (f64.add (f64.sub (f64.add (local.get $invRho) (local.get $psi)) (f64.mul (local.get $dpsi) (f64.sub (local.get $a) (local.get $t)))) (local.get $phi)))
        (return (select (f64.add (local.get $a) (f64.div (local.get $c1) (local.get $c))) (f64.const nan) (f64.gt (local.get $c) (f64.const 0))))))
    (local.set $c2 (f64.mul (f64.mul (local.get $dphi) (f64.sub (local.get $b) (local.get $t))) (f64.sub (local.get $b) (local.get $t))))
    (local.set $c (f64.sub
      (f64.add (f64.sub (f64.add (local.get $invRho) (local.get $psi)) (f64.mul (local.get $dpsi) (f64.sub (local.get $a) (local.get $t)))) (local.get $phi))
      (f64.mul (local.get $dphi) (f64.sub (local.get $b) (local.get $t)))))
    (local.set $qb (f64.neg (f64.add (f64.add (f64.mul (local.get $c) (f64.add (local.get $a) (local.get $b))) (local.get $c1)) (local.get $c2))))
    (local.set $q0 (f64.add (f64.add (f64.mul (f64.mul (local.get $c) (local.get $a)) (local.get $b)) (f64.mul (local.get $c1) (local.get $b))) (f64.mul (local.get $c2) (local.get $a))))
    (if (f64.eq (local.get $c) (f64.const 0))
      (then (return (select (f64.const nan) (f64.div (f64.neg (local.get $q0)) (local.get $qb)) (f64.eq (local.get $qb) (f64.const 0))))))
    (local.set $disc (f64.sub (f64.mul (local.get $qb) (local.get $qb)) (f64.mul (f64.mul (f64.const 4) (local.get $c)) (local.get $q0))))
    (if (i32.eqz (f64.ge (local.get $disc) (f64.const 0))) (then (return (f64.const nan))))
    (local.set $q (f64.mul (f64.const -0.5)
      (f64.add (local.get $qb) (f64.mul (select (f64.const 1) (f64.const -1) (f64.ge (local.get $qb) (f64.const 0))) (f64.sqrt (local.get $disc))))))
    (local.set $x1 (f64.div (local.get $q) (local.get $c)))
    (local.set $x2 (select (f64.const nan) (f64.div (local.get $q0) (local.get $q)) (f64.eq (local.get $q) (f64.const 0))))
    (select (local.get $x1) (local.get $x2)
      (i32.and (f64.gt (local.get $x1) (f64.min (local.get $a) (local.get $b))) (f64.lt (local.get $x1) (f64.max (local.get $a) (local.get $b))))))
  (func $secularRoots (export "secularRoots") (param $gaps i32) (param $z2 i32) (param $d i32) (param $k i32) (param $args i32) (param $origin i32) (param $tau i32) (param $out i32) (result i32)
    (local $rho f64) (local $invRho f64) (local $zz f64) (local $i i32) (local $j i32) (local $row i32) (local $o i32) (local $stale i32) (local $two i32) (local $step i32) (local $settled i32)
    (local $lo f64) (local $hi f64) (local $t f64) (local $a f64) (local $b f64) (local $shift f64) (local $next f64) (local $pole f64)
    (local $psi f64) (local $dpsi f64) (local $phi f64) (local $dphi f64) (local $f f64) (local $noise f64)
    (local.set $rho (f64.load (local.get $args)))
    (local.set $invRho (f64.div (f64.const 1) (local.get $rho)))
    (local.set $zz (f64.const 0))
    (local.set $j (i32.const 0))
    (block $zz_done (loop $zzl
      (br_if $zz_done (i32.ge_s (local.get $j) (local.get $k)))
      (local.set $zz (f64.add (local.get $zz) ${f64(at('(local.get $z2)', '(local.get $j)'))}))
      (local.set $j (i32.add (local.get $j) (i32.const 1)))
      (br $zzl)))
    (local.set $i (i32.const 0))
    (block $roots_done (loop $roots
      (br_if $roots_done (i32.ge_s (local.get $i) (local.get $k)))
      (local.set $row ${at('(local.get $gaps)', '(i32.mul (local.get $i) (local.get $k))')})
      ;; The left half of the sum runs over poles 0..i, the right half over i+1..k−1; each
      ;; evaluation forms d_j − λ from the pole d_o and stores it in the root's row.
      (local.set $o (local.get $i))
      (local.set $stale (i32.const 0))
      (local.set $pole ${D('(local.get $i)')})
      (local.set $lo (f64.const 0))
      (local.set $two (i32.lt_s (local.get $i) (i32.sub (local.get $k) (i32.const 1))))
      (local.set $a (f64.const 0))
      (local.set $b (f64.const 0))
      (if (local.get $two)
        (then
          ;; Halfway between the poles; the sign of f there tells which pole is nearer.
          (local.set $shift (f64.sub ${D('(i32.add (local.get $i) (i32.const 1))')} (local.get $pole)))
          (local.set $hi (f64.mul (f64.const 0.5) (local.get $shift)))
          (local.set $t (local.get $hi))
          (local.set $b (local.get $shift))
          ${sums}
          (if (f64.lt (f64.add (f64.add (local.get $invRho) (f64.load (local.get $out))) (f64.load offset=16 (local.get $out))) (f64.const 0))
            (then
              ;; Nearer d_{i+1}: offsets from there; f and its halves at this point are the same.
              (local.set $o (i32.add (local.get $i) (i32.const 1)))
              (local.set $pole ${D('(local.get $o)')})
              (local.set $a (f64.sub ${D('(local.get $i)')} (local.get $pole)))
              (local.set $b (f64.const 0))
              (local.set $lo (f64.sub (local.get $hi) (local.get $shift)))
              (local.set $hi (f64.const 0))
              (local.set $t (local.get $lo))
              (local.set $stale (i32.const 1)))))
        (else
          (local.set $hi (f64.mul (local.get $rho) (local.get $zz)))
          (local.set $t (f64.mul (f64.const 0.5) (local.get $hi)))
          ${sums}))
      (local.set $settled (i32.const 0))
      (local.set $step (i32.const 0))
      (block $iter_done (loop $iter
        (br_if $iter_done (i32.ge_s (local.get $step) (i32.const ${MAX_SECULAR_STEPS})))
        (local.set $psi (f64.load (local.get $out)))
        (local.set $dpsi (f64.load offset=8 (local.get $out)))
        (local.set $phi (f64.load offset=16 (local.get $out)))
        (local.set $dphi (f64.load offset=24 (local.get $out)))
        (local.set $f (f64.add (f64.add (local.get $invRho) (local.get $psi)) (local.get $phi)))
        (if (f64.eq (local.get $f) (f64.const 0)) (then (local.set $settled (i32.const 1)) (br $iter_done)))
        (if (f64.lt (local.get $f) (f64.const 0)) (then (local.set $lo (local.get $t))) (else (local.set $hi (local.get $t))))
        ;; Rounding error of f: its terms' magnitudes (ψ < 0 < φ) and the ulp of τ times the slope.
        (local.set $noise (f64.mul (f64.const ${EPS})
          (f64.add (f64.mul (f64.const 8) (f64.add (f64.sub (local.get $invRho) (local.get $psi)) (local.get $phi)))
            (f64.mul ${abs('(local.get $t)')} (f64.add (local.get $dpsi) (local.get $dphi))))))
        (if (i32.or (f64.le ${abs('(local.get $f)')} (local.get $noise))
              (f64.le (f64.sub (local.get $hi) (local.get $lo)) (f64.mul (f64.const ${4 * EPS}) (f64.max ${abs('(local.get $lo)')} ${abs('(local.get $hi)')}))))
          (then (local.set $settled (i32.const 1)) (br $iter_done)))
        (local.set $next (call $modelRoot (local.get $invRho) (local.get $psi) (local.get $dpsi) (local.get $phi) (local.get $dphi) (local.get $a) (local.get $b) (local.get $t) (local.get $two)))
        (local.set $t (select (local.get $next) (f64.mul (f64.const 0.5) (f64.add (local.get $lo) (local.get $hi)))
          (i32.and (f64.gt (local.get $next) (local.get $lo)) (f64.lt (local.get $next) (local.get $hi)))))
        ${sums}
        (local.set $stale (i32.const 0))
        (local.set $step (i32.add (local.get $step) (i32.const 1)))
        (br $iter)))
      (if (i32.eqz (local.get $settled)) (then (return (i32.const 0))))
      (i32.store ${at4('(local.get $origin)', '(local.get $i)')} (local.get $o))
      (f64.store ${at('(local.get $tau)', '(local.get $i)')} (local.get $t))
      ;; The row of the last evaluation is d_j − λ_i, unless the first one, from d_i, settled at once after the switch to d_{i+1}.
      (if (local.get $stale) (then (call $offsetsAt (local.get $row) (local.get $d) (local.get $k) (local.get $pole) (local.get $t))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $roots)))
    (i32.const 1))`;
}

/**
 * vectorWeights(gaps, d, k, args, zhat): the squared Gu–Eisenstat weights of one merge,
 * ẑ_j² = −gaps[k−1][j]/ρ (ρ = args[0]) times every root row's ratios (divideConquerTridiagonal.ts
 * says which pole each row pairs with); cauchyRows(gaps, w, k, dst, ds, index): every new vector
 * row i < k by $cauchyRow into dst + i·ds (ds in doubles). One call per merge each instead of
 * one per row.
 */
function mergeRows() {
  const D = (i) => f64(at('(local.get $d)', i));
  return `
  (func $vectorWeights (export "vectorWeights") (param $gaps i32) (param $d i32) (param $k i32) (param $args i32) (param $zhat i32)
    (local $rho f64) (local $i i32) (local $j i32) (local $row i32)
    (local.set $rho (f64.load (local.get $args)))
    (local.set $row ${at('(local.get $gaps)', '(i32.mul (i32.sub (local.get $k) (i32.const 1)) (local.get $k))')})
    (local.set $j (i32.const 0))
    (block $j_done (loop $jl
      (br_if $j_done (i32.ge_s (local.get $j) (local.get $k)))
      (f64.store ${at('(local.get $zhat)', '(local.get $j)')} (f64.div (f64.neg ${f64(at('(local.get $row)', '(local.get $j)'))}) (local.get $rho)))
      (local.set $j (i32.add (local.get $j) (i32.const 1)))
      (br $jl)))
    (local.set $i (i32.const 0))
    (block $i_done (loop $il
      (br_if $i_done (i32.ge_s (i32.add (local.get $i) (i32.const 1)) (local.get $k)))
      (local.set $row ${at('(local.get $gaps)', '(i32.mul (local.get $i) (local.get $k))')})
      (call $ratiosAt (local.get $zhat) (local.get $row) (local.get $d) (i32.const 0) (i32.add (local.get $i) (i32.const 1)) ${D('(i32.add (local.get $i) (i32.const 1))')})
      (call $ratiosAt (local.get $zhat) (local.get $row) (local.get $d) (i32.add (local.get $i) (i32.const 1)) (local.get $k) ${D('(local.get $i)')})
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $il))))
  (func $cauchyRows (export "cauchyRows") (param $gaps i32) (param $w i32) (param $k i32) (param $dst i32) (param $ds i32) (param $index i32)
    (local $i i32)
    (local.set $i (i32.const 0))
    (block $i_done (loop $il
      (br_if $i_done (i32.ge_s (local.get $i) (local.get $k)))
      (call $cauchyRow ${at('(local.get $gaps)', '(i32.mul (local.get $i) (local.get $k))')} (local.get $w) (local.get $k)
        ${at('(local.get $dst)', '(i32.mul (local.get $i) (local.get $ds))')} (local.get $index))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $il))))`;
}

/**
 * leafEigen(d, e, m, q, order) → 1, or 0 on non-finite input or no convergence: the eigenpairs
 * of one small piece of the divide and conquer (order m, diagonal d, off-diagonal e with
 * e[m−1] = 0), the implicit QR of tridiagonalValuesVectors (tridiagonalValues.ts) step for step
 * — the same deflation test, iteration limit, Wilkinson shift and chase, each operation in the
 * same order — with q (m × m, stride m) set to the identity first and every rotation applied to
 * its rows k, k + 1 in pairs of doubles. Then, as solveLeaf did: order (i32) gets the insertion
 * sort of the values (stable), d the values ascending (e is the scratch). √(x² + z²) takes
 * $hypot where the square could underflow or overflow.
 */
function leafQr() {
  const D = (i) => f64(at('(local.get $d)', i));
  const E = (i) => f64(at('(local.get $e)', i));
  const abs = (x) => `(f64.abs ${x})`;
  const I = (i, plus) => `(i32.add ${i} (i32.const ${plus}))`;
  const l = (name) => `(local.get $${name})`;
  const rowOf = (k) => at(l('q'), `(i32.mul ${k} ${l('m')})`);
  return `
  (func $hypot (param $x f64) (param $z f64) (result f64)
    ;; √(x² + z²) scaled by the larger magnitude (as V8's Math.hypot does for two arguments).
    (local $big f64) (local $u f64) (local $v f64)
    (local.set $big (f64.max (f64.abs (local.get $x)) (f64.abs (local.get $z))))
    (if (f64.eq (local.get $big) (f64.const 0)) (then (return (f64.const 0))))
    (local.set $u (f64.div (f64.abs (local.get $x)) (local.get $big)))
    (local.set $v (f64.div (f64.abs (local.get $z)) (local.get $big)))
    (f64.mul (f64.sqrt (f64.add (f64.mul (local.get $u) (local.get $u)) (f64.mul (local.get $v) (local.get $v)))) (local.get $big)))
  (func $rotationLength (param $x f64) (param $z f64) (result f64)
    (local $r2 f64)
    (local.set $r2 (f64.add (f64.mul (local.get $x) (local.get $x)) (f64.mul (local.get $z) (local.get $z))))
    (if (result f64) (i32.and (f64.gt (local.get $r2) (f64.const 1e-280)) (f64.lt (local.get $r2) (f64.const 1e280)))
      (then (f64.sqrt (local.get $r2)))
      (else (call $hypot (local.get $x) (local.get $z)))))
  (func $leafChase (param $d i32) (param $e i32) (param $lo i32) (param $hi i32) (param $q i32) (param $m i32)
    ;; One implicit shifted QR sweep on the unreduced window [lo, hi] (chaseValues).
    (local $delta f64) (local $root f64) (local $denom f64) (local $mu f64) (local $x f64) (local $z f64) (local $r f64) (local $c f64) (local $s f64)
    (local $a f64) (local $b f64) (local $cc f64) (local $dm f64) (local $bb f64) (local $k i32) (local $o i32) (local $end i32) (local $rk i32) (local $rk1 i32)
    (local $cv v128) (local $sv v128) (local $p v128) (local $p1 v128) (local $y f64) (local $y1 f64)
    ;; Wilkinson shift: the eigenvalue of the trailing 2 × 2 nearer d[hi].
    (local.set $dm ${D(l('hi'))})
    (local.set $bb ${E(I(l('hi'), -1))})
    (local.set $delta (f64.mul (f64.const 0.5) (f64.sub ${D(I(l('hi'), -1))} (local.get $dm))))
    (local.set $root (call $rotationLength (local.get $delta) (local.get $bb)))
    (local.set $denom (select (f64.add (local.get $delta) (local.get $root)) (f64.sub (local.get $delta) (local.get $root)) (f64.ge (local.get $delta) (f64.const 0))))
    (local.set $mu (select (local.get $dm) (f64.sub (local.get $dm) (f64.div (f64.mul (local.get $bb) (local.get $bb)) (local.get $denom))) (f64.eq (local.get $denom) (f64.const 0))))
    (local.set $x (f64.sub ${D(l('lo'))} (local.get $mu)))
    (local.set $z ${E(l('lo'))})
    (local.set $end (i32.shl (local.get $m) (i32.const 3)))
    (local.set $k (local.get $lo))
    (block $k_done (loop $kl
      (br_if $k_done (i32.ge_s (local.get $k) (local.get $hi)))
      ;; $rotationLength written out: around a call V8 saves the chase's live doubles (it keeps no
      ;; floating-point register across WebAssembly calls), on every rotation (1.01–1.09× the leaves).
      (local.set $r (f64.add (f64.mul (local.get $x) (local.get $x)) (f64.mul (local.get $z) (local.get $z))))
      (local.set $r (if (result f64) (i32.and (f64.gt (local.get $r) (f64.const 1e-280)) (f64.lt (local.get $r) (f64.const 1e280)))
        (then (f64.sqrt (local.get $r)))
        (else (call $hypot (local.get $x) (local.get $z)))))
      (local.set $c (select (f64.const 1) (f64.div (local.get $x) (local.get $r)) (f64.eq (local.get $r) (f64.const 0))))
      (local.set $s (select (f64.const 0) (f64.div (local.get $z) (local.get $r)) (f64.eq (local.get $r) (f64.const 0))))
      (if (i32.gt_s (local.get $k) (local.get $lo)) (then (f64.store ${at(l('e'), I(l('k'), -1))} (local.get $r))))
      (local.set $a ${D(l('k'))})
      (local.set $b ${E(l('k'))})
      (local.set $cc ${D(I(l('k'), 1))})
      (f64.store ${at(l('d'), l('k'))}
        (f64.add (f64.add (f64.mul (f64.mul (local.get $c) (local.get $c)) (local.get $a)) (f64.mul (f64.mul (f64.mul (f64.const 2) (local.get $c)) (local.get $s)) (local.get $b)))
          (f64.mul (f64.mul (local.get $s) (local.get $s)) (local.get $cc))))
      (f64.store ${at(l('d'), I(l('k'), 1))}
        (f64.add (f64.sub (f64.mul (f64.mul (local.get $s) (local.get $s)) (local.get $a)) (f64.mul (f64.mul (f64.mul (f64.const 2) (local.get $c)) (local.get $s)) (local.get $b)))
          (f64.mul (f64.mul (local.get $c) (local.get $c)) (local.get $cc))))
      (f64.store ${at(l('e'), l('k'))}
        (f64.add (f64.mul (f64.mul (local.get $c) (local.get $s)) (f64.sub (local.get $cc) (local.get $a)))
          (f64.mul (f64.sub (f64.mul (local.get $c) (local.get $c)) (f64.mul (local.get $s) (local.get $s))) (local.get $b))))
      (if (i32.lt_s (local.get $k) (i32.sub (local.get $hi) (i32.const 1)))
        (then
          (local.set $z (f64.mul (local.get $s) ${E(I(l('k'), 1))}))
          (f64.store ${at(l('e'), I(l('k'), 1))} (f64.mul ${E(I(l('k'), 1))} (local.get $c)))
          (local.set $x ${E(l('k'))})))
      ;; Rows k, k + 1 of q: (c q_k + s q_k+1, c q_k+1 − s q_k), two entries at a time.
      (local.set $rk ${rowOf(l('k'))})
      (local.set $rk1 (i32.add (local.get $rk) (local.get $end)))
      (local.set $cv (f64x2.splat (local.get $c)))
      (local.set $sv (f64x2.splat (local.get $s)))
      (local.set $o (i32.const 0))
      (block $o_done (loop $ol
        (br_if $o_done (i32.gt_s (i32.add (local.get $o) (i32.const 16)) (local.get $end)))
        (local.set $p (v128.load (i32.add (local.get $rk) (local.get $o))))
        (local.set $p1 (v128.load (i32.add (local.get $rk1) (local.get $o))))
        (v128.store (i32.add (local.get $rk) (local.get $o)) (f64x2.add (f64x2.mul (local.get $cv) (local.get $p)) (f64x2.mul (local.get $sv) (local.get $p1))))
        (v128.store (i32.add (local.get $rk1) (local.get $o)) (f64x2.sub (f64x2.mul (local.get $cv) (local.get $p1)) (f64x2.mul (local.get $sv) (local.get $p))))
        (local.set $o (i32.add (local.get $o) (i32.const 16)))
        (br $ol)))
      (if (i32.lt_s (local.get $o) (local.get $end))
        (then
          (local.set $y (f64.load (i32.add (local.get $rk) (local.get $o))))
          (local.set $y1 (f64.load (i32.add (local.get $rk1) (local.get $o))))
          (f64.store (i32.add (local.get $rk) (local.get $o)) (f64.add (f64.mul (local.get $c) (local.get $y)) (f64.mul (local.get $s) (local.get $y1))))
          (f64.store (i32.add (local.get $rk1) (local.get $o)) (f64.sub (f64.mul (local.get $c) (local.get $y1)) (f64.mul (local.get $s) (local.get $y))))))
      (local.set $k (i32.add (local.get $k) (i32.const 1)))
      (br $kl))))
  (func $leafEigen (export "leafEigen") (param $d i32) (param $e i32) (param $m i32) (param $q i32) (param $order i32) (result i32)
    (local $i i32) (local $j i32) (local $hi i32) (local $lo i32) (local $iter i32) (local $norm f64) (local $floor f64) (local $x f64) (local $oi i32)
    ;; q = I
    (local.set $i (i32.const 0))
    (block $z_done (loop $zl
      (br_if $z_done (i32.ge_s (local.get $i) (i32.mul (local.get $m) (local.get $m))))
      (f64.store ${at(l('q'), l('i'))} (f64.const 0))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $zl)))
    (local.set $i (i32.const 0))
    (block $id_done (loop $idl
      (br_if $id_done (i32.ge_s (local.get $i) (local.get $m)))
      (f64.store ${at(l('q'), `(i32.mul (local.get $i) ${I(l('m'), 1)})`)} (f64.const 1))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $idl)))
    ;; deflatingQr: ‖T‖_∞, its finiteness, the floor of the deflation test.
    (local.set $norm (f64.const 0))
    (local.set $i (i32.const 0))
    (block $n_done (loop $nl
      (br_if $n_done (i32.ge_s (local.get $i) (local.get $m)))
      (local.set $x ${abs(D(l('i')))})
      (if (i32.gt_s (local.get $i) (i32.const 0)) (then (local.set $x (f64.add (local.get $x) ${abs(E(I(l('i'), -1)))}))))
      (if (i32.lt_s (local.get $i) (i32.sub (local.get $m) (i32.const 1))) (then (local.set $x (f64.add (local.get $x) ${abs(E(l('i')))}))))
      (local.set $norm (f64.max (local.get $norm) (local.get $x)))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $nl)))
    (if (i32.eqz (f64.lt (f64.abs (local.get $norm)) (f64.const inf))) (then (return (i32.const 0))))
    (local.set $floor (f64.add (f64.const 1e-300) (f64.mul (f64.const ${EPS * 1e-3}) (local.get $norm))))
    (local.set $hi (i32.sub (local.get $m) (i32.const 1)))
    (local.set $iter (i32.const 0))
    (block $qr_done (loop $qr
      (br_if $qr_done (i32.le_s (local.get $hi) (i32.const 0)))
      (if (i32.gt_s (local.get $iter) (i32.mul (i32.const 30) (local.get $m))) (then (return (i32.const 0))))
      (block $top_done (loop $top
        (br_if $top_done (i32.le_s (local.get $hi) (i32.const 0)))
        (br_if $top_done (i32.eqz (f64.le ${abs(E(I(l('hi'), -1)))}
          (f64.add (f64.mul (f64.const ${EPS}) (f64.add ${abs(D(I(l('hi'), -1)))} ${abs(D(l('hi')))})) (local.get $floor)))))
        (f64.store ${at(l('e'), I(l('hi'), -1))} (f64.const 0))
        (local.set $hi (i32.sub (local.get $hi) (i32.const 1)))
        (br $top)))
      (br_if $qr_done (i32.eqz (local.get $hi)))
      (local.set $lo (i32.sub (local.get $hi) (i32.const 1)))
      (block $lo_done (loop $lol
        (br_if $lo_done (i32.le_s (local.get $lo) (i32.const 0)))
        (br_if $lo_done (i32.eqz (f64.gt ${abs(E(I(l('lo'), -1)))}
          (f64.add (f64.mul (f64.const ${EPS}) (f64.add ${abs(D(I(l('lo'), -1)))} ${abs(D(l('lo')))})) (local.get $floor)))))
        (local.set $lo (i32.sub (local.get $lo) (i32.const 1)))
        (br $lol)))
      (if (i32.gt_s (local.get $lo) (i32.const 0)) (then (f64.store ${at(l('e'), I(l('lo'), -1))} (f64.const 0))))
      (call $leafChase (local.get $d) (local.get $e) (local.get $lo) (local.get $hi) (local.get $q) (local.get $m))
      (local.set $iter (i32.add (local.get $iter) (i32.const 1)))
      (br $qr)))
    ;; Insertion sort of the indices by value (as solveLeaf), then the values in that order.
    (local.set $i (i32.const 0))
    (block $s_done (loop $sl
      (br_if $s_done (i32.ge_s (local.get $i) (local.get $m)))
      (local.set $x ${D(l('i'))})
      (local.set $j (local.get $i))
      (block $m_done (loop $ml
        (br_if $m_done (i32.le_s (local.get $j) (i32.const 0)))
        (local.set $oi (i32.load ${at4(l('order'), I(l('j'), -1))}))
        (br_if $m_done (i32.eqz (f64.gt ${D(l('oi'))} (local.get $x))))
        (i32.store ${at4(l('order'), l('j'))} (local.get $oi))
        (local.set $j (i32.sub (local.get $j) (i32.const 1)))
        (br $ml)))
      (i32.store ${at4(l('order'), l('j'))} (local.get $i))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $sl)))
    (local.set $i (i32.const 0))
    (block $v_done (loop $vl
      (br_if $v_done (i32.ge_s (local.get $i) (local.get $m)))
      (f64.store ${at(l('e'), l('i'))} ${D(`(i32.load ${at4(l('order'), l('i'))})`)})
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $vl)))
    (local.set $i (i32.const 0))
    (block $w_done (loop $wl
      (br_if $w_done (i32.ge_s (local.get $i) (local.get $m)))
      (f64.store ${at(l('d'), l('i'))} ${E(l('i'))})
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $wl)))
    (i32.const 1))`;
}

/**
 * copyRows(from, fs, fromRows, to, ts, toRows, count, cols): for q < count, `cols` doubles of row
 * fromRows[q] (i32) of the matrix at `from` (stride fs) to row toRows[q] of the one at `to`
 * (stride ts): the merges' gathers of rows (divideConquerTridiagonal.ts), one call per batch.
 */
function copyRows() {
  return `
  (func $copyRows (export "copyRows") (param $from i32) (param $fs i32) (param $fromRows i32) (param $to i32) (param $ts i32) (param $toRows i32) (param $count i32) (param $cols i32)
    (local $q i32) (local $j i32) (local $src i32) (local $dst i32)
    (local.set $q (i32.const 0))
    (block $q_done (loop $ql
      (br_if $q_done (i32.ge_s (local.get $q) (local.get $count)))
      (local.set $src (i32.add (local.get $from) (i32.shl (i32.mul (i32.load ${`(i32.add (local.get $fromRows) (i32.shl (local.get $q) (i32.const 2)))`}) (local.get $fs)) (i32.const 3))))
      (local.set $dst (i32.add (local.get $to) (i32.shl (i32.mul (i32.load ${`(i32.add (local.get $toRows) (i32.shl (local.get $q) (i32.const 2)))`}) (local.get $ts)) (i32.const 3))))
      (local.set $j (i32.const 0))
      (block $j_done (loop $jl
        (br_if $j_done (i32.ge_s (i32.add (local.get $j) (i32.const 1)) (local.get $cols)))
        (v128.store ${at('(local.get $dst)', '(local.get $j)')} (v128.load ${at('(local.get $src)', '(local.get $j)')}))
        (local.set $j (i32.add (local.get $j) (i32.const 2)))
        (br $jl)))
      (if (i32.lt_s (local.get $j) (local.get $cols))
        (then (f64.store ${at('(local.get $dst)', '(local.get $j)')} ${f64(at('(local.get $src)', '(local.get $j)'))})))
      (local.set $q (i32.add (local.get $q) (i32.const 1)))
      (br $ql))))`;
}

/** The whole module: one exported memory (grown by the caller) and the kernels. */
export function eigenKernelsWat() {
  return `(module
  (memory (export "memory") 1)
${tridiagonalise()}
${applyReflectors()}
${moves()}
${multiply()}
${secularSums()}
${vectorRows()}
${secularIteration()}
${mergeRows()}
${leafQr()}
${copyRows()}
)
`;
}
