// Generated radial DC systems (an invented test scenario, not a real design): a bank of parallel
// batteries, a main fuse and bus pair, feeders to sub-panels, and loads hung from each sub-panel
// either directly or along daisy chains; every positive run has its own negative return, and a
// share of load negatives is also bonded to a chassis node or to each other (meshed returns).
import type { Circuit, CircuitElement } from '../../shared/solver/circuit'

export interface RadialOptions {
  loads: number
  seed: number
  /** Parallel batteries (default 2). */
  batteries?: number
  /** Share of loads whose negative is also bonded to chassis or to another load (default 0.08). */
  meshedShare?: number
  /** Total load power (default 1500 W). */
  totalW?: number
}

/** Small deterministic PRNG (mulberry32) so every run builds the same circuit. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0
  return () => {
    a = (a + 0x6d2b79f5) >>> 0
    let t = a
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}

export function radialCircuit(options: RadialOptions): Circuit {
  const random = seededRandom(options.seed)
  const between = (lo: number, hi: number) => lo + (hi - lo) * random()
  const elements: CircuitElement[] = []
  let nodeCount = 1 // node 0: first battery's negative, the reference
  const node = () => nodeCount++
  const wire = (id: string, a: number, b: number, resistanceOhm: number) =>
    elements.push({ kind: 'resistor', id, a, b, resistanceOhm })
  const nominalV = 12.8
  const loads = Math.max(1, options.loads)
  const totalW = options.totalW ?? 1500

  // Battery bank: slightly different EMFs and internal resistances, each on its own cables.
  const mainPos = node()
  const negBus = node()
  for (let k = 0; k < (options.batteries ?? 2); k++) {
    const pos = node()
    const neg = k === 0 ? 0 : node()
    elements.push({ kind: 'vsource', id: `bat${k}`, pos, neg, voltageV: between(13.1, 13.3), resistanceOhm: between(0.003, 0.006) })
    wire(`bat${k}.pos`, pos, mainPos, between(0.0003, 0.0006))
    if (neg !== 0) wire(`bat${k}.neg`, neg, 0, between(0.0003, 0.0006))
  }
  const posBus = node()
  wire('mainFuse', mainPos, posBus, 0.0002)
  wire('mainNeg', negBus, 0, 0.0004)
  const chassis = node()
  wire('chassisBond', chassis, 0, 0.001)
  // A charge source delivering constant power onto the buses (P < 0 delivers).
  elements.push({ kind: 'cpower', id: 'charger', pos: posBus, neg: negBus, powerW: -200, minVoltageV: 10 })

  const feeders = Math.max(1, Math.round(Math.sqrt(loads) / 2))
  const loadNegs: number[] = []
  const feederOfLoad: number[] = []
  const firstLoadOfFeeder: number[] = []
  let made = 0
  for (let f = 0; f < feeders; f++) {
    const count = Math.floor(((f + 1) * loads) / feeders) - Math.floor((f * loads) / feeders)
    const feederA = (totalW * count) / loads / nominalV
    const fusePos = node()
    const subPos = node()
    const subNeg = node()
    wire(`f${f}.fuse`, posBus, fusePos, 0.0005)
    wire(`f${f}.pos`, fusePos, subPos, (between(0.005, 0.015) * nominalV) / feederA)
    wire(`f${f}.neg`, subNeg, negBus, (between(0.005, 0.015) * nominalV) / feederA)
    let parentPos = subPos
    let parentNeg = subNeg
    firstLoadOfFeeder.push(made)
    for (let k = 0; k < count; k++, made++) {
      // 40 % of loads continue a daisy chain from the previous load, the rest start at the panel.
      if (random() >= 0.4) {
        parentPos = subPos
        parentNeg = subNeg
      }
      const powerW = (totalW / loads) * between(0.3, 1.7)
      const loadA = powerW / nominalV
      const pos = node()
      const neg = node()
      const runOhm = (between(0.005, 0.015) * nominalV) / loadA / 4
      wire(`L${made}.pos`, parentPos, pos, runOhm)
      wire(`L${made}.neg`, neg, parentNeg, runOhm)
      const kind = random()
      if (kind < 0.45) wire(`L${made}`, pos, neg, (nominalV * nominalV) / powerW)
      else if (kind < 0.65) elements.push({ kind: 'isource', id: `L${made}`, from: pos, to: neg, currentA: loadA })
      else elements.push({ kind: 'cpower', id: `L${made}`, pos, neg, powerW, minVoltageV: 9 })
      loadNegs.push(neg)
      feederOfLoad.push(f)
      parentPos = pos
      parentNeg = neg
    }
  }
  // Meshed negative returns: bonds to chassis and cross-links between load negatives of one panel
  // (loads mounted near each other share a return; long cross-links across the system are not typical).
  const meshedShare = options.meshedShare ?? 0.08
  firstLoadOfFeeder.push(made)
  for (let k = 0; k < loadNegs.length; k++) {
    if (random() >= meshedShare) continue
    const f = feederOfLoad[k]
    const first = firstLoadOfFeeder[f]
    const other = first + Math.floor(random() * (firstLoadOfFeeder[f + 1] - first))
    if (random() < 0.5) wire(`bond${k}`, loadNegs[k], chassis, between(0.005, 0.05))
    else wire(`link${k}`, loadNegs[k], loadNegs[other], between(0.005, 0.05))
  }
  return { nodeCount, elements }
}
