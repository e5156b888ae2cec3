// Sparse LDLᵀ for symmetric matrices after the elimination-tree method of T. A. Davis,
// "Algorithm 849: A concise sparse Cholesky factorization package" (ACM TOMS 31(4), 2005).
// The matrix is given already permuted, as its upper triangle (diagonal included) in CSC form.
// The symbolic part (elimination tree, column counts) is computed once and reused by every
// numeric factorisation of a Newton loop.

export interface LdlSymbolic {
  n: number
  parent: Int32Array
  /** Column pointers of L (strictly lower part). */
  lp: Int32Array
}

export interface LdlFactor {
  symbolic: LdlSymbolic
  li: Int32Array
  lx: Float64Array
  d: Float64Array
  /** Work arrays kept between factorisations. */
  y: Float64Array
  pattern: Int32Array
  flag: Int32Array
  lnz: Int32Array
}

export function ldlSymbolic(n: number, ap: Int32Array, ai: Int32Array): LdlSymbolic {
  const parent = new Int32Array(n)
  const flag = new Int32Array(n)
  const lnz = new Int32Array(n)
  for (let k = 0; k < n; k++) {
    parent[k] = -1
    flag[k] = k
    for (let p = ap[k]; p < ap[k + 1]; p++) {
      for (let i = ai[p]; i < k && flag[i] !== k; i = parent[i]) {
        if (parent[i] === -1) parent[i] = k
        lnz[i]++
        flag[i] = k
      }
    }
  }
  const lp = new Int32Array(n + 1)
  for (let k = 0; k < n; k++) lp[k + 1] = lp[k] + lnz[k]
  return { n, parent, lp }
}

export function createFactor(symbolic: LdlSymbolic): LdlFactor {
  const { n, lp } = symbolic
  return {
    symbolic,
    li: new Int32Array(lp[n]),
    lx: new Float64Array(lp[n]),
    d: new Float64Array(n),
    y: new Float64Array(n),
    pattern: new Int32Array(n),
    flag: new Int32Array(n),
    lnz: new Int32Array(n),
  }
}

/**
 * Numeric factorisation A = L D Lᵀ. Returns -1 on success, else the column whose pivot is not
 * safely positive (D[k] ≤ relPivot · |diagScale[k]|) — the caller then changes the linearisation.
 * With `perturb`, such a pivot is replaced by its diagonal scale instead (static pivoting): for a
 * matrix known to be positive semi-definite this only happens on a part of the network that no
 * conductance ties to its reference, whose voltage is then set to 0 rather than left undefined.
 */
export function ldlNumeric(
  factor: LdlFactor,
  ap: Int32Array,
  ai: Int32Array,
  ax: Float64Array,
  diagScale: Float64Array,
  perturb = false,
  relPivot = 1e-13,
): number {
  const { symbolic, li, lx, d, y, pattern, flag, lnz } = factor
  const { n, parent, lp } = symbolic
  for (let k = 0; k < n; k++) {
    y[k] = 0
    let top = n
    flag[k] = k
    lnz[k] = 0
    for (let p = ap[k]; p < ap[k + 1]; p++) {
      let i = ai[p]
      y[i] += ax[p]
      let len = 0
      for (; flag[i] !== k; i = parent[i]) {
        pattern[len++] = i
        flag[i] = k
      }
      while (len > 0) pattern[--top] = pattern[--len]
    }
    let dk = y[k]
    y[k] = 0
    for (; top < n; top++) {
      const i = pattern[top]
      const yi = y[i]
      y[i] = 0
      const p2 = lp[i] + lnz[i]
      let p = lp[i]
      for (; p < p2; p++) y[li[p]] -= lx[p] * yi
      const lki = yi / d[i]
      dk -= lki * yi
      li[p] = k
      lx[p] = lki
      lnz[i]++
    }
    if (!(dk > relPivot * diagScale[k])) {
      if (!perturb || !Number.isFinite(dk)) return k
      dk = diagScale[k] > 0 ? diagScale[k] : 1
    }
    d[k] = dk
  }
  return -1
}

/**
 * Solves L D Lᵀ x = b in place. The three sweeps are functions of their own, each compiled with its
 * own type feedback: with the loops inline, the code the engine optimised while the first loop ran
 * met the later ones without feedback and was dropped on every solve.
 */
export function ldlSolve(factor: LdlFactor, x: Float64Array): void {
  const { li, lx, d } = factor
  const { n, lp } = factor.symbolic
  forwardSweep(n, lp, li, lx, x)
  divideBy(n, d, x)
  backwardSweep(n, lp, li, lx, x)
}

/** x ← D⁻¹ x. */
function divideBy(n: number, d: Float64Array, x: Float64Array): void {
  for (let j = 0; j < n; j++) x[j] /= d[j]
}

/** x ← L⁻¹ x (unit lower triangle, by columns). */
function forwardSweep(n: number, lp: Int32Array, li: Int32Array, lx: Float64Array, x: Float64Array): void {
  for (let j = 0; j < n; j++) {
    const xj = x[j]
    if (xj !== 0) for (let p = lp[j]; p < lp[j + 1]; p++) x[li[p]] -= lx[p] * xj
  }
}

/** x ← L⁻ᵀ x. */
function backwardSweep(n: number, lp: Int32Array, li: Int32Array, lx: Float64Array, x: Float64Array): void {
  for (let j = n - 1; j >= 0; j--) {
    let xj = x[j]
    for (let p = lp[j]; p < lp[j + 1]; p++) xj -= lx[p] * x[li[p]]
    x[j] = xj
  }
}
