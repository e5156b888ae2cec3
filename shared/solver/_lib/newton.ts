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

/**
 * Everything one solve works on. The steps below are module functions over this state rather than
 * closures made per solve: each is then compiled once with its own type feedback and stays optimised
 * from one solve to the next (closures made per call ran their 17 000-node loops unoptimised).
 */
interface NewtonRun {
  sys: NodalSystem
  t: ElementTable
  nodeV: Float64Array
  options: NewtonOptions
  rhs: Float64Array
  x: Float64Array
  residual: Float64Array
  absSum: Float64Array
  cpowers: number[]
  start: Float64Array
  step: Float64Array
  /** Newton iterations so far. */
  used: number
  /** Largest KCL residual at the present voltages. */
  residualA: number
}

export function solveNodal(sys: NodalSystem, t: ElementTable, nodeV: Float64Array, options: NewtonOptions): NewtonOutcome {
  const { n } = sys
  const cpowers: number[] = []
  for (let e = 0; e < t.m; e++) if (t.active[e] && t.kind[e] === CPOWER) cpowers.push(e)
  const run: NewtonRun = {
    sys, t, nodeV, options,
    rhs: new Float64Array(n), x: new Float64Array(n), residual: new Float64Array(n), absSum: new Float64Array(n),
    cpowers, start: new Float64Array(nodeV.length), step: new Float64Array(n), used: 0, residualA: 0,
  }
  const { x } = run

  // Start from the no-load voltages: the high-voltage branch a supplied constant-power load sits on.
  assemble(run, Linearisation.NoLoad)
  x.set(run.rhs)
  if (!factor(run, Linearisation.NoLoad) || !solveInto(run, x)) {
    nodeV.fill(0)
    return { converged: false, iterations: 1, residualA: computeResidual(run, nodeV), badNodes: overTolerance(run), factored: false }
  }
  setUnknowns(run, nodeV, x)
  run.residualA = computeResidual(run, nodeV)

  if (cpowers.length === 0) {
    // Linear: the factorisation is exact; refine against rounding (A δ = −r, r = KCL residual).
    refineLinear(run)
    const badNodes = overTolerance(run)
    return { converged: badNodes.length === 0, iterations: 1, residualA: run.residualA, badNodes, factored: true }
  }

  if (newton(run)) return { converged: true, iterations: run.used, residualA: run.residualA, badNodes: [], factored: true }
  // Past the nose of the loads' P–V curve there is no high-voltage solution: restart from the
  // collapsed state, where the loads sit on their resistive fallback, and keep the better result.
  const firstV = nodeV.slice()
  const firstResidualA = computeResidual(run, nodeV)
  assemble(run, Linearisation.Collapsed)
  x.set(run.rhs)
  if (factor(run, Linearisation.Collapsed) && solveInto(run, x)) {
    setUnknowns(run, nodeV, x)
    run.residualA = computeResidual(run, nodeV)
    if (newton(run)) return { converged: true, iterations: run.used, residualA: run.residualA, badNodes: [], factored: true }
  }
  run.residualA = computeResidual(run, nodeV)
  if (!(run.residualA <= firstResidualA)) {
    nodeV.set(firstV)
    run.residualA = computeResidual(run, nodeV)
  }
  return { converged: false, iterations: run.used, residualA: run.residualA, badNodes: overTolerance(run), factored: true }
}

/** Stamps the matrix and right-hand side for one linearisation of the constant-power elements. */
function assemble(run: NewtonRun, mode: Linearisation): void {
  const { sys, t, nodeV, rhs } = run
  const { n, unknownOfNode } = sys
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

/** Only the Newton Jacobian may be indefinite; the no-load and secant matrices are conductance matrices. */
function factor(run: NewtonRun, mode: Linearisation): boolean {
  const { sys } = run
  return ldlNumeric(sys.factor, sys.ap, sys.ai, sys.ax, sys.diagAbs, mode !== Linearisation.Newton) < 0
}

function solveInto(run: NewtonRun, b: Float64Array): boolean {
  ldlSolve(run.sys.factor, b)
  return allFinite(run.sys.n, b)
}

function allFinite(n: number, b: Float64Array): boolean {
  for (let k = 0; k < n; k++) if (!Number.isFinite(b[k])) return false
  return true
}

/** KCL residual per unknown (and the sum of |currents| meeting there) at voltages v; returns the largest. */
function computeResidual(run: NewtonRun, v: Float64Array): number {
  const { t, residual, absSum } = run
  const { n, unknownOfNode } = run.sys
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

function withinTolerance(run: NewtonRun): boolean {
  const { residual, absSum, options } = run
  for (let k = 0; k < run.sys.n; k++) {
    if (!(Math.abs(residual[k]) <= options.toleranceA + RELATIVE_RESIDUAL * absSum[k])) return false
  }
  return true
}

function overTolerance(run: NewtonRun): number[] {
  const { residual, absSum, options } = run
  const { n, nodeOfUnknown } = run.sys
  const nodes: number[] = []
  for (let k = 0; k < n; k++) {
    if (!(Math.abs(residual[k]) <= options.toleranceA + RELATIVE_RESIDUAL * absSum[k])) nodes.push(nodeOfUnknown[k])
  }
  return nodes
}

function setUnknowns(run: NewtonRun, v: Float64Array, values: Float64Array): void {
  const { n, nodeOfUnknown } = run.sys
  for (let k = 0; k < n; k++) v[nodeOfUnknown[k]] = values[k]
}

/** Up to two passes of iterative refinement of a linear solve. */
function refineLinear(run: NewtonRun): void {
  const { x, residual, nodeV } = run
  const { n, nodeOfUnknown } = run.sys
  for (let pass = 0; pass < 2 && !withinTolerance(run); pass++) {
    for (let k = 0; k < n; k++) x[k] = -residual[k]
    if (!solveInto(run, x)) break
    for (let k = 0; k < n; k++) nodeV[nodeOfUnknown[k]] += x[k]
    run.residualA = computeResidual(run, nodeV)
  }
}

/** Damped Newton from the present voltages; true when converged. Counts iterations in `run.used`. */
function newton(run: NewtonRun): boolean {
  const { x, rhs, options } = run
  for (let iteration = 1; iteration <= options.maxIterations; iteration++) {
    run.used++
    assemble(run, Linearisation.Newton)
    if (!factor(run, Linearisation.Newton)) {
      assemble(run, Linearisation.Secant)
      if (!factor(run, Linearisation.Secant)) return false
    }
    x.set(rhs)
    if (!solveInto(run, x)) return false
    const largest = takeStep(run)
    const alpha = lineSearch(run, stepLimit(run))
    if (alpha * largest <= options.toleranceV && withinTolerance(run)) return true
  }
  return false
}

/** The full Newton step per unknown (into run.step); returns its largest size. */
function takeStep(run: NewtonRun): number {
  const { x, step, nodeV } = run
  const { n, nodeOfUnknown } = run.sys
  let largest = 0
  for (let k = 0; k < n; k++) {
    step[k] = x[k] - nodeV[nodeOfUnknown[k]]
    largest = Math.max(largest, Math.abs(step[k]))
  }
  return largest
}

/** Step limiting: no load's voltage moves by more than half its present value in one step. */
function stepLimit(run: NewtonRun): number {
  const { t, step, nodeV, cpowers } = run
  const { unknownOfNode } = run.sys
  let alpha = 1
  for (const e of cpowers) {
    const up = unknownOfNode[t.p[e]]
    const uq = unknownOfNode[t.q[e]]
    const dv = Math.abs((up >= 0 ? step[up] : 0) - (uq >= 0 ? step[uq] : 0))
    const limit = STEP_LIMIT * Math.max(Math.abs(nodeV[t.p[e]] - nodeV[t.q[e]]), t.extra[e])
    if (dv * alpha > limit) alpha = limit / dv
  }
  return alpha
}

/**
 * Backtracking on the KCL residual from `alpha`; the last, shortest step is taken even if it does not
 * help. Leaves the voltages at the step taken and returns its length.
 */
function lineSearch(run: NewtonRun, alpha: number): number {
  const { start, step, nodeV } = run
  const { n, nodeOfUnknown } = run.sys
  start.set(nodeV)
  const previous = run.residualA
  for (let halving = 0; ; halving++) {
    for (let k = 0; k < n; k++) nodeV[nodeOfUnknown[k]] = start[nodeOfUnknown[k]] + alpha * step[k]
    run.residualA = computeResidual(run, nodeV)
    // Near the answer the residual is rounding noise: a step that lands within tolerance is taken.
    if (run.residualA <= previous || halving === LINE_SEARCH_HALVINGS || withinTolerance(run)) break
    alpha /= 2
  }
  return alpha
}
