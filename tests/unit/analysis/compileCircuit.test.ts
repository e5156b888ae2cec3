import { describe, expect, it } from 'vitest'
import { compileCircuit } from '../../../shared/analysis'
import { solveOperatingPoint } from '../../../shared/solver/solveOperatingPoint'
import { designOf, part, simpleBranch, wire } from './helpers'

describe('compileCircuit', () => {
  it('maps a battery to its Thevenin source: EMF and R scale with series × parallel', () => {
    const design = designOf({
      parts: [part('battery', 'bank', { nominalVoltageV: 12.8, internalResistanceOhm: 0.004, seriesCount: 2, parallelCount: 4 })],
      conductors: [],
    })
    const { circuit } = compileCircuit(design, design.scenarios[0])
    // 2 × 12.8 = 25.6 V; 0.004 × 2 / 4 = 0.002 Ω (series add, parallel divide; standards.md §7)
    expect(circuit.elements).toEqual([{ kind: 'vsource', id: 'p:bank', pos: 0, neg: 1, voltageV: 25.6, resistanceOhm: 0.002 }])
  })

  it('keeps element ↔ part/conductor ids and drops an open fuse', () => {
    const closed = simpleBranch()
    const c = compileCircuit(closed, closed.scenarios[0])
    expect(c.owners.map((o) => `${o.kind}:${o.id}`).sort()).toEqual(['conductor:feed', 'conductor:neg', 'conductor:pos', 'part:bank', 'part:fuse', 'part:pump'])
    const open = simpleBranch({ fuse: { closed: false } })
    const o = compileCircuit(open, open.scenarios[0])
    expect(o.owners.some((x) => x.id === 'fuse')).toBe(false)
    expect(o.problems.map((p) => p.kind)).toEqual(['no-supply'])
  })

  it('joins every bus stud into one node and the controller negatives into one', () => {
    const design = designOf({
      parts: [part('bus-bar', 'bus'), part('charge-controller', 'mppt')],
      conductors: [],
    })
    const { nodes } = compileCircuit(design, design.scenarios[0])
    const node = (k: string) => nodes.nodeOf.get(k)
    expect(new Set(['a', 'b', 'c', 'd', 'e', 'f'].map((t) => node(`bus:${t}`))).size).toBe(1)
    expect(node('mppt:pv-neg')).toBe(node('mppt:bat-neg'))
    expect(node('mppt:pv-pos')).not.toBe(node('mppt:bat-pos'))
  })

  it('loads follow their model and scenario level', () => {
    const design = designOf({
      parts: [
        part('battery', 'bank'), part('load', 'p', { model: 'power', powerW: 100 }), part('load', 'i', { model: 'current', currentA: 4 }),
        part('load', 'r', { model: 'resistance', resistanceOhm: 6 }),
      ],
      conductors: ['p', 'i', 'r'].flatMap((id) => [wire(`${id}-p`, `bank.pos`, `${id}.pos`, 'awg-10', 1), wire(`${id}-n`, `${id}.neg`, 'bank.neg', 'awg-10', 1)]),
      scenarios: [{ id: 'half', name: 'Half', sunOn: false, chargerOn: false, loads: { p: { on: true, level: 0.5 }, i: { on: true, level: 0.5 }, r: { on: true, level: 0.5 } } }],
    })
    const { circuit, partElement } = compileCircuit(design, design.scenarios[0])
    expect(circuit.elements[partElement.get('p')!]).toMatchObject({ kind: 'cpower', powerW: 50 })
    expect(circuit.elements[partElement.get('i')!]).toMatchObject({ kind: 'isource', currentA: 2 })
    expect(circuit.elements[partElement.get('r')!]).toMatchObject({ kind: 'resistor', resistanceOhm: 12 })
  })

  it('sun on: the PV conductors carry Imp × strings and the controller delivers min(P·η, rated × V)', () => {
    const design = designOf({
      parts: [
        part('battery', 'bank'),
        part('pv-array', 'array', { moduleVocV: 22, moduleIscA: 6, moduleVmpV: 18, moduleImpA: 5.5, modulesPerString: 1, strings: 2 }),
        part('charge-controller', 'mppt', { maxPvVoltageV: 50, maxPvCurrentA: 30, outputCurrentA: 30, efficiency: 0.95, mppt: true }),
      ],
      conductors: [
        wire('pv-p', 'array.pos', 'mppt.pv-pos', 'awg-10', 5), wire('pv-n', 'array.neg', 'mppt.pv-neg', 'awg-10', 5),
        wire('out-p', 'mppt.bat-pos', 'bank.pos', 'awg-8', 1), wire('out-n', 'mppt.bat-neg', 'bank.neg', 'awg-8', 1),
      ],
    })
    const compiled = compileCircuit(design, design.scenarios[0])
    const op = solveOperatingPoint(compiled.circuit)
    expect(op.status).toBe('ok')
    const current = (id: string) => op.elementCurrentA[compiled.conductorElement.get(id)!]
    // Imp × strings = 5.5 × 2 = 11 A out of the array, back on the negative.
    expect(current('pv-p')).toBeCloseTo(11, 9)
    expect(current('pv-n')).toBeCloseTo(-11, 9)
    // P = 18 V × 11 A × 0.95 = 188.1 W (under 30 A × 12 V = 360 W) delivered into the bank.
    const out = compiled.circuit.elements[compiled.partElement.get('mppt')!]
    expect(out).toMatchObject({ kind: 'cpower', powerW: -188.1 })
  })
})

describe('compileCircuit: DC-DC charger', () => {
  it('draws I_out × V_nominal ÷ η from its input and pushes I_out into its output', () => {
    const design = designOf({
      parts: [
        part('battery', 'start', { nominalVoltageV: 12.8 }), part('battery', 'house', { nominalVoltageV: 12.8 }),
        part('dc-dc-charger', 'dcdc', { outputCurrentA: 20, efficiency: 0.9, inputMinV: 11 }),
      ],
      conductors: [
        wire('in-p', 'start.pos', 'dcdc.in-pos', 'awg-8', 1), wire('in-n', 'dcdc.in-neg', 'start.neg', 'awg-8', 1),
        wire('out-p', 'dcdc.out-pos', 'house.pos', 'awg-8', 1), wire('out-n', 'dcdc.out-neg', 'house.neg', 'awg-8', 1),
      ],
      scenarios: [{ id: 'drive', name: 'Driving', sunOn: false, chargerOn: false, loads: { dcdc: { on: true, level: 1 } } }],
    })
    const compiled = compileCircuit(design, design.scenarios[0])
    const input = compiled.circuit.elements.find((e) => e.id === 'p:dcdc#in')
    // 20 A × 12 V ÷ 0.9 = 266.67 W
    expect(input).toMatchObject({ kind: 'cpower', minVoltageV: 11 })
    expect((input as { powerW: number }).powerW).toBeCloseTo(266.667, 3)
    const op = solveOperatingPoint(compiled.circuit)
    expect(op.status).toBe('ok')
    // out-p runs from the charger's output to the house bank: +20 A in its from → to direction.
    expect(op.elementCurrentA[compiled.conductorElement.get('out-p')!]).toBeCloseTo(20, 9)
  })
})
