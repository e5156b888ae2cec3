// The generic circuit form the DC solver works on. A design compiler turns batteries, conductors,
// fuses, converters and loads into these four element kinds; node numbers are 0..nodeCount-1.

/** Resistance between nodes a and b; its current is reported flowing a → b. */
export interface ResistorElement {
  kind: 'resistor'
  id: string
  a: number
  b: number
  resistanceOhm: number
}

/**
 * Thevenin source (a battery): EMF `voltageV` from neg to pos behind `resistanceOhm` (> 0).
 * Its current is reported leaving `pos` into the circuit (positive when it discharges).
 */
export interface VoltageSourceElement {
  kind: 'vsource'
  id: string
  pos: number
  neg: number
  voltageV: number
  resistanceOhm: number
}

/** Ideal current source: `currentA` flows from → to through the source, i.e. out of `to` into the circuit. */
export interface CurrentSourceElement {
  kind: 'isource'
  id: string
  from: number
  to: number
  currentA: number
}

/**
 * Constant power P drawn pos → neg (P < 0 delivers). Below `minVoltageV` it behaves as the
 * resistance Vmin²/P (the usual ZIP-load practice) so the current stays defined near 0 V.
 */
export interface ConstantPowerElement {
  kind: 'cpower'
  id: string
  pos: number
  neg: number
  powerW: number
  minVoltageV: number
}

export type CircuitElement = ResistorElement | VoltageSourceElement | CurrentSourceElement | ConstantPowerElement

export interface Circuit {
  nodeCount: number
  nodeNames?: string[]
  elements: CircuitElement[]
}

export type SolverProblem =
  /** Island with no voltage source: not solved, its voltages and currents are reported as 0. */
  | { kind: 'floating'; nodes: number[]; elementIds: string[] }
  /**
   * A source whose terminals are joined by (almost) 0 Ω: through resistors below the short
   * threshold, or so hard that its terminal voltage fell below 10 % of its EMF while discharging.
   */
  | { kind: 'shorted-source'; elementIds: string[] }
  /**
   * Sources in a loop that fight: in an island with several sources one discharges while another
   * is driven backwards by more than 10 % of the largest EMF (I·R) or by more than a set current.
   */
  | { kind: 'source-loop'; elementIds: string[] }
  /**
   * Newton did not reach the tolerances, or a constant-power element ended below its minimum
   * voltage (its demand cannot be supplied: the result is its resistive fallback). `residualA` is
   * the worst KCL residual, or the current the starved loads miss compared with P/V.
   */
  | {
      kind: 'not-converged'
      elementIds: string[]
      residualA: number
      /** 'iterations': Newton stopped short; 'below-minimum-voltage': solved, but loads are starved. */
      cause?: 'iterations' | 'below-minimum-voltage'
    }
  /** Non-finite or non-positive resistance, bad node number, ...: the element is left out (open). */
  | { kind: 'invalid-element'; elementIds: string[]; message: string }

export interface Island {
  referenceNode: number
  nodes: number[]
  hasSource: boolean
}

export interface OperatingPoint {
  status: 'ok' | 'not-converged'
  /** Per node, relative to its island's reference node; 0 for floating islands. */
  nodeVoltageV: Float64Array
  /** Per element in `circuit.elements` order, with each kind's sign convention. */
  elementCurrentA: Float64Array
  /**
   * Power absorbed at the element's terminals (passive convention): resistors and loads positive,
   * a discharging source negative. Sums to zero over every solved island.
   */
  elementPowerW: Float64Array
  iterations: number
  islands: Island[]
  problems: SolverProblem[]
}
