import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { analyzeDesign, compileCircuit } from '../../../shared/analysis'
import type { Circuit } from '../../../shared/solver/circuit'
import { solveOperatingPoint } from '../../../shared/solver/solveOperatingPoint'
import { CONDUCTOR_SIZE_IDS } from '../../../shared/conductors/sizes'
import type { Conductor, Part } from '../../../shared/design/schema'
import { designOf, expectAllFinite, part, settingsFor, wire } from './helpers'

// Random radial systems like real ones: bank → main fuse → bus → branch fuses → loads, returns to a
// negative bus (some branches return straight to the bank: meshed negatives), optional solar branch.
const branchArb = fc.record({
  model: fc.constantFrom('power', 'current', 'resistance') as fc.Arbitrary<'power' | 'current' | 'resistance'>,
  amount: fc.double({ min: 0.5, max: 40, noNaN: true }),
  sizeId: fc.constantFrom(...CONDUCTOR_SIZE_IDS),
  lengthM: fc.double({ min: 0.1, max: 30, noNaN: true }),
  fuseA: fc.constantFrom(5, 10, 15, 20, 30),
  closed: fc.boolean(),
  on: fc.boolean(),
  level: fc.double({ min: 0, max: 1, noNaN: true }),
  directReturn: fc.boolean(),
})
const systemArb = fc.record({
  voltage: fc.constantFrom(12, 24, 48) as fc.Arbitrary<12 | 24 | 48>,
  profile: fc.constantFrom('marine', 'vehicle', 'building') as fc.Arbitrary<'marine' | 'vehicle' | 'building'>,
  internalOhm: fc.double({ min: 0.0005, max: 0.05, noNaN: true }),
  parallel: fc.integer({ min: 1, max: 4 }),
  branches: fc.array(branchArb, { minLength: 1, maxLength: 8 }),
  solar: fc.option(fc.record({ strings: fc.integer({ min: 1, max: 4 }), modules: fc.integer({ min: 1, max: 4 }), sun: fc.boolean() }), { nil: undefined }),
})

type GeneratedSystem = typeof systemArb extends fc.Arbitrary<infer T> ? T : never

function build(sys: GeneratedSystem) {
  const s = settingsFor(sys.profile, sys.voltage)
  const parts: Part[] = [
    part('battery', 'bank', { nominalVoltageV: 12.8, seriesCount: sys.voltage / 12, parallelCount: sys.parallel, internalResistanceOhm: sys.internalOhm }, s),
    part('fuse', 'main', { family: 'class-t', ratingA: 200, interruptingRatingA: 20000, dcVoltageRatingV: 125 }, s),
    part('bus-bar', 'bus', {}, s), part('bus-bar', 'negbus', { polarity: 'negative' }, s),
  ]
  const conductors: Conductor[] = [
    wire('feed', 'bank.pos', 'main.line', 'awg-2/0', 0.1), wire('trunk', 'main.load', 'bus.a', 'awg-2/0', 1),
    wire('ret', 'negbus.a', 'bank.neg', 'awg-2/0', 1),
  ]
  const loads: Record<string, { on: boolean; level: number }> = {}
  sys.branches.forEach((b, i) => {
    const amount = b.model === 'power' ? { powerW: b.amount * 10 } : b.model === 'current' ? { currentA: b.amount } : { resistanceOhm: b.amount / 4 }
    parts.push(part('fuse', `f${i}`, { ratingA: b.fuseA, closed: b.closed }, s), part('load', `l${i}`, { model: b.model, ...amount }, s))
    conductors.push(
      wire(`t${i}`, 'bus.b', `f${i}.line`, 'awg-10', 0.1),
      wire(`p${i}`, `f${i}.load`, `l${i}.pos`, b.sizeId, b.lengthM),
      wire(`n${i}`, `l${i}.neg`, b.directReturn ? 'bank.neg' : 'negbus.b', b.sizeId, b.lengthM),
    )
    loads[`l${i}`] = { on: b.on, level: b.level }
  })
  if (sys.solar) {
    parts.push(
      part('pv-array', 'pv', { modulesPerString: sys.solar.modules, strings: sys.solar.strings }, s),
      part('charge-controller', 'mppt', {}, s),
    )
    conductors.push(
      wire('pv-p', 'pv.pos', 'mppt.pv-pos', 'awg-10', 5), wire('pv-n', 'pv.neg', 'mppt.pv-neg', 'awg-10', 5),
      wire('out-p', 'mppt.bat-pos', 'bus.c', 'awg-6', 1), wire('out-n', 'mppt.bat-neg', 'negbus.c', 'awg-6', 1),
    )
  }
  return designOf({
    profile: sys.profile, nominalVoltageV: sys.voltage, parts, conductors,
    scenarios: [
      { id: 'run', name: 'Running', sunOn: sys.solar?.sun ?? false, chargerOn: false, loads },
      { id: 'start', name: 'Start', sunOn: false, chargerOn: false, loads, motorStart: true },
    ],
  })
}

/** Largest KCL residual over the nodes, A: the element currents read back per the solver's sign conventions. */
function kclResidualA(circuit: Circuit, currents: Float64Array): { residual: number; scale: number } {
  const net = new Float64Array(circuit.nodeCount)
  let scale = 1
  circuit.elements.forEach((el, e) => {
    const i = currents[e]
    scale = Math.max(scale, Math.abs(i))
    if (el.kind === 'resistor') { net[el.a] -= i; net[el.b] += i }
    else if (el.kind === 'vsource') { net[el.pos] += i; net[el.neg] -= i }
    else if (el.kind === 'isource') { net[el.to] += i; net[el.from] -= i }
    else { net[el.pos] -= i; net[el.neg] += i }
  })
  return { residual: Math.max(0, ...net.map(Math.abs)), scale }
}

describe('properties of the analysis on random valid designs (fast-check)', () => {
  it('never throws, never returns NaN or Infinity, and findings are well formed', () => {
    fc.assert(
      fc.property(systemArb, (sys) => {
        const result = analyzeDesign(build(sys))
        expectAllFinite(result)
        expect(result.findings.some((f) => f.ruleId === 'analysis-failed')).toBe(false)
        for (const f of result.findings) {
          expect(f.id.startsWith(`${f.ruleId}:`)).toBe(true)
          expect(f.source.length).toBeGreaterThan(0)
        }
      }),
      { numRuns: 40 },
    )
  }, 120_000)

  it('KCL holds at every node of every compiled scenario that converged', () => {
    fc.assert(
      fc.property(systemArb, (sys) => {
        const design = build(sys)
        for (const scenario of design.scenarios) {
          const { circuit } = compileCircuit(design, scenario)
          const op = solveOperatingPoint(circuit)
          if (op.status !== 'ok') continue
          const { residual, scale } = kclResidualA(circuit, op.elementCurrentA)
          expect(residual).toBeLessThanOrEqual(1e-6 * scale)
        }
      }),
      { numRuns: 60 },
    )
  }, 120_000)

  it('power balances in every converged scenario (Σ absorbed = 0)', () => {
    fc.assert(
      fc.property(systemArb, (sys) => {
        const design = build(sys)
        const { circuit } = compileCircuit(design, design.scenarios[0])
        const op = solveOperatingPoint(circuit)
        if (op.status !== 'ok') return
        const total = op.elementPowerW.reduce((s, p) => s + p, 0)
        const scale = op.elementPowerW.reduce((s, p) => s + Math.abs(p), 1)
        expect(Math.abs(total)).toBeLessThanOrEqual(1e-6 * scale)
      }),
      { numRuns: 40 },
    )
  }, 120_000)
})
