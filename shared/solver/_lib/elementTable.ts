// Elements flattened into typed arrays so the Newton loop runs without object look-ups.
import type { CircuitElement } from '../circuit'
import { firstNode, secondNode } from './validateElements'

export const RESISTOR = 0
export const VSOURCE = 1
export const ISOURCE = 2
export const CPOWER = 3
const KIND_CODE = { resistor: RESISTOR, vsource: VSOURCE, isource: ISOURCE, cpower: CPOWER } as const

export interface ElementTable {
  m: number
  kind: Uint8Array
  /** First and second terminal: a/b, pos/neg, from/to. */
  p: Int32Array
  q: Int32Array
  /** Conductance 1/R (resistor, vsource), current (isource) or power (cpower). */
  value: Float64Array
  /** EMF (vsource) or minimum voltage (cpower). */
  extra: Float64Array
  /** 1 for elements in a solved island. */
  active: Uint8Array
}

export function buildElementTable(elements: CircuitElement[], active: Uint8Array): ElementTable {
  const m = elements.length
  const table: ElementTable = {
    m,
    kind: new Uint8Array(m),
    p: new Int32Array(m),
    q: new Int32Array(m),
    value: new Float64Array(m),
    extra: new Float64Array(m),
    active,
  }
  for (let e = 0; e < m; e++) {
    if (!active[e]) continue
    const element = elements[e]
    table.kind[e] = KIND_CODE[element.kind]
    table.p[e] = firstNode(element)
    table.q[e] = secondNode(element)
    switch (element.kind) {
      case 'resistor':
        table.value[e] = 1 / element.resistanceOhm
        break
      case 'vsource':
        table.value[e] = 1 / element.resistanceOhm
        table.extra[e] = element.voltageV
        break
      case 'isource':
        table.value[e] = element.currentA
        break
      case 'cpower':
        table.value[e] = element.powerW
        table.extra[e] = element.minVoltageV
        break
    }
  }
  return table
}

/** Current of a constant-power element at voltage v: P/V above Vmin, V·P/Vmin² below (ZIP practice). */
export function constantPowerCurrent(powerW: number, minVoltageV: number, v: number): number {
  return v >= minVoltageV ? powerW / v : (v * powerW) / (minVoltageV * minVoltageV)
}

/** Current from terminal p to terminal q through element e when V(p) − V(q) = v. */
export function flowPtoQ(t: ElementTable, e: number, v: number): number {
  switch (t.kind[e]) {
    case RESISTOR:
      return v * t.value[e]
    case VSOURCE:
      return (v - t.extra[e]) * t.value[e]
    case ISOURCE:
      return t.value[e]
    default:
      return constantPowerCurrent(t.value[e], t.extra[e], v)
  }
}

/** Current in the element's reported sign convention (a vsource reports the current leaving pos). */
export function reportedCurrent(t: ElementTable, e: number, v: number): number {
  const flow = flowPtoQ(t, e, v)
  return t.kind[e] === VSOURCE ? -flow : flow
}
