// Damped Newton on the nodal equations. Linear circuits take one factorisation (plus iterative
// refinement if the KCL residual is above tolerance). Constant-power elements are linearised
// around the last voltages; if the Jacobian loses positive definiteness (a load past the nose of
// its P–V curve) that iteration uses the secant conductance P/V² instead, which always factors.
import { ldlNumeric, ldlSolve } from './ldl'
import { CPOWER, ISOURCE, RESISTOR, VSOURCE, constantPowerCurrent, flowPtoQ, type ElementTable } from './elementTable'
import { stampConductance, type NodalSystem } from './nodalSystem'

export interface NewtonOptions {
  maxIterations: number
  toleranceV: number
  toleranceA: number
}

export interface NewtonOutcome {
  converged: boolean
  iterations: number
  /** Largest KCL residual over the unknown nodes at the returned voltages. */
  residualA: number
  /** Nodes whose residual is above tolerance (empty when converged). */
  badNodes: number[]
  /** False when even the first (no-load) factorisation failed; the voltages are then all 0. */
  factored: boolean
}

/** Rounding allowance: a node's residual may also be this fraction of the currents meeting there. */
const RELATIVE_RESIDUAL = 1e-10
/** A Newton step may change a load's voltage by at most this fraction of max(|V|, Vmin). */
const STEP_LIMIT = 0.5
const LINE_SEARCH_HALVINGS = 8
/**
 * Conductance from every unknown node to its island's reference, as SPICE's GMIN (1e-12 S):
 * it keeps a node reached only through a load of 0 W, or only through loads at no-load, from
 * making the matrix singular. It leaks 1e-11 A at 10 V, far below any tolerance used here.
 */
const GMIN_S = 1e-12

const enum Linearisation {
  NoLoad,
  Newton,
  Secant,
  /** Every consuming constant-power element as its low-voltage resistance Vmin²/P: the collapsed state. */
  Collapsed,
}

export function solveNodal(sys: NodalSystem, t: ElementTable, nodeV: Float64Array, options: NewtonOptions): NewtonOutcome {
  const { n, unknownOfNode, nodeOfUnknown } = sys
  const rhs = new Float64Array(n)
  const x = new Float64Array(n)
  const residual = new Float64Array(n)
  const absSum = new Float64Array(n)
  const cpowers: number[] = []
  for (let e = 0; e < t.m; e++) if (t.active[e] && t.kind[e] === CPOWER) cpowers.push(e)

  const assemble = (mode: Linearisation): void => {
    sys.ax.fill(0)
    sys.diagAbs.fill(0)
    rhs.fill(0)
    for (let k = 0; k < n; k++) {
      sys.ax[sys.ap[k]] += GMIN_S // the diagonal is the first slot of every column
      sys.diagAbs[k] += GMIN_S
    }
    for (let e = 0; e < t.m; e++) {
      if (!t.active[e]) continue
      let g = 0
      let j = 0 // flow p→q = g·(Vp − Vq) + j
      const kind = t.kind[e]
      if (kind === RESISTOR) g = t.value[e]
      else if (kind === VSOURCE) {
        g = t.value[e]
        j = -t.extra[e] * t.value[e]
      } else if (kind === ISOURCE) j = t.value[e]
      else if (mode === Linearisation.Collapsed) {
        if (t.value[e] > 0) g = t.value[e] / (t.extra[e] * t.extra[e])
      } else if (mode !== Linearisation.NoLoad) {
        const v0 = nodeV[t.p[e]] - nodeV[t.q[e]]
        const powerW = t.value[e]
        const vMin = t.extra[e]
        if (v0 < vMin) {
          if (mode === Linearisation.Newton || powerW > 0) g = powerW / (vMin * vMin)
          else j = constantPowerCurrent(powerW, vMin, v0)
        } else if (mode === Linearisation.Newton) {
          g = -powerW / (v0 * v0)
          j = (2 * powerW) / v0
        } else if (powerW > 0) g = powerW / (v0 * v0)
        else j = powerW / v0
      }
      if (g !== 0) stampConductance(sys, e, g)
      if (j !== 0) {
        const up = unknownOfNode[t.p[e]]
        const uq = unknownOfNode[t.q[e]]
        if (up >= 0) rhs[up] -= j
        if (uq >= 0) rhs[uq] += j
      }
    }
  }

  // Only the Newton Jacobian may be indefinite; the no-load and secant matrices are conductance matrices.
  const factor = (mode: Linearisation): boolean =>
    ldlNumeric(sys.factor, sys.ap, sys.ai, sys.ax, sys.diagAbs, mode !== Linearisation.Newton) < 0

  const solveInto = (b: Float64Array): boolean => {
    ldlSolve(sys.factor, b)
    for (let k = 0; k < n; k++) if (!Number.isFinite(b[k])) return false
    return true
  }

  const computeResidual = (v: Float64Array): number => {
    residual.fill(0)
    absSum.fill(0)
    for (let e = 0; e < t.m; e++) {
      if (!t.active[e]) continue
      const flow = flowPtoQ(t, e, v[t.p[e]] - v[t.q[e]])
      const size = flow < 0 ? -flow : flow
      const up = unknownOfNode[t.p[e]]
      const uq = unknownOfNode[t.q[e]]
      if (up >= 0) {
        residual[up] += flow
        absSum[up] += size
      }
      if (uq >= 0) {
        residual[uq] -= flow
        absSum[uq] += size
      }
    }
    let worst = 0
    for (let k = 0; k < n; k++) worst = Math.max(worst, Math.abs(residual[k]))
    return worst
  }

  const withinTolerance = (): boolean => {
    for (let k = 0; k < n; k++) {
      if (!(Math.abs(residual[k]) <= options.toleranceA + RELATIVE_RESIDUAL * absSum[k])) return false
    }
    return true
  }

  const overTolerance = (): number[] => {
    const nodes: number[] = []
    for (let k = 0; k < n; k++) {
      if (!(Math.abs(residual[k]) <= options.toleranceA + RELATIVE_RESIDUAL * absSum[k])) nodes.push(nodeOfUnknown[k])
    }
    return nodes
  }

  const setUnknowns = (v: Float64Array, values: Float64Array): void => {
    for (let k = 0; k < n; k++) v[nodeOfUnknown[k]] = values[k]
  }

  // Start from the no-load voltages: the high-voltage branch a supplied constant-power load sits on.
  assemble(Linearisation.NoLoad)
  x.set(rhs)
  if (!factor(Linearisation.NoLoad) || !solveInto(x)) {
    nodeV.fill(0)
    return { converged: false, iterations: 1, residualA: computeResidual(nodeV), badNodes: overTolerance(), factored: false }
  }
  setUnknowns(nodeV, x)
  let residualA = computeResidual(nodeV)

  if (cpowers.length === 0) {
    // Linear: the factorisation is exact; refine against rounding (A δ = −r, r = KCL residual).
    for (let pass = 0; pass < 2 && !withinTolerance(); pass++) {
      for (let k = 0; k < n; k++) x[k] = -residual[k]
      if (!solveInto(x)) break
      for (let k = 0; k < n; k++) nodeV[nodeOfUnknown[k]] += x[k]
      residualA = computeResidual(nodeV)
    }
    const badNodes = overTolerance()
    return { converged: badNodes.length === 0, iterations: 1, residualA, badNodes, factored: true }
  }

  const start = new Float64Array(nodeV.length)
  const step = new Float64Array(n)
  let used = 0
  /** Damped Newton from the present voltages; true when converged. Counts iterations in `used`. */
  const newton = (): boolean => {
    for (let iteration = 1; iteration <= options.maxIterations; iteration++) {
      used++
      assemble(Linearisation.Newton)
      if (!factor(Linearisation.Newton)) {
        assemble(Linearisation.Secant)
        if (!factor(Linearisation.Secant)) return false
      }
      x.set(rhs)
      if (!solveInto(x)) return false
      let largest = 0
      for (let k = 0; k < n; k++) {
        step[k] = x[k] - nodeV[nodeOfUnknown[k]]
        largest = Math.max(largest, Math.abs(step[k]))
      }
      // Step limiting: no load's voltage moves by more than half its present value in one step.
      let alpha = 1
      for (const e of cpowers) {
        const up = unknownOfNode[t.p[e]]
        const uq = unknownOfNode[t.q[e]]
        const dv = Math.abs((up >= 0 ? step[up] : 0) - (uq >= 0 ? step[uq] : 0))
        const limit = STEP_LIMIT * Math.max(Math.abs(nodeV[t.p[e]] - nodeV[t.q[e]]), t.extra[e])
        if (dv * alpha > limit) alpha = limit / dv
      }
      // Backtracking on the KCL residual; the last, shortest step is taken even if it does not help.
      start.set(nodeV)
      const previous = residualA
      for (let halving = 0; ; halving++) {
        for (let k = 0; k < n; k++) nodeV[nodeOfUnknown[k]] = start[nodeOfUnknown[k]] + alpha * step[k]
        residualA = computeResidual(nodeV)
        // Near the answer the residual is rounding noise: a step that lands within tolerance is taken.
        if (residualA <= previous || halving === LINE_SEARCH_HALVINGS || withinTolerance()) break
        alpha /= 2
      }
      if (alpha * largest <= options.toleranceV && withinTolerance()) return true
    }
    return false
  }

  if (newton()) return { converged: true, iterations: used, residualA, badNodes: [], factored: true }
  // Past the nose of the loads' P–V curve there is no high-voltage solution: restart from the
  // collapsed state, where the loads sit on their resistive fallback, and keep the better result.
  const firstV = nodeV.slice()
  const firstResidualA = computeResidual(nodeV)
  assemble(Linearisation.Collapsed)
  x.set(rhs)
  if (factor(Linearisation.Collapsed) && solveInto(x)) {
    setUnknowns(nodeV, x)
    residualA = computeResidual(nodeV)
    if (newton()) return { converged: true, iterations: used, residualA, badNodes: [], factored: true }
  }
  residualA = computeResidual(nodeV)
  if (!(residualA <= firstResidualA)) {
    nodeV.set(firstV)
    residualA = computeResidual(nodeV)
  }
  return { converged: false, iterations: used, residualA, badNodes: overTolerance(), factored: true }
}
