// The analysis of whole designs cross-checked with ngspice (independent SPICE simulator, Debian
// package): every scenario of the demo and example designs is compiled, exported with toSpiceNetlist,
// and the conductor currents the analysis reports must match ngspice's within 0.1 % (floor 1 µA).
// Fault currents: a 0.1 µΩ link across the fault in the batteries-only circuit, read back in ngspice.
import { readdirSync, readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { analyzeDesign, compileCircuit, FAULT_STUDY_SCENARIO, protectionTopology } from '../../../shared/analysis'
import { protectiveDevices } from '../../../shared/analysis/_lib/devices'
import { createDemoDesign } from '../../../shared/design/demo'
import { parseDesign, type Design } from '../../../shared/design/schema'
import { spiceCurrentProbe, toSpiceNetlist } from '../../../shared/spice/toSpiceNetlist'
import type { Circuit } from '../../../shared/solver/circuit'
import { runNgspice } from '../../helpers/ngspice'

const REL = 1e-3
const FLOOR_A = 1e-6

function exampleDesigns(): Design[] {
  const dir = join(__dirname, '../../../examples')
  const designs = [createDemoDesign()]
  for (const file of readdirSync(dir).filter((f) => f.endsWith('.json'))) {
    const parsed = parseDesign(JSON.parse(readFileSync(join(dir, file), 'utf8')))
    if (parsed.ok) designs.push(parsed.design)
  }
  return designs
}

describe('analysis vs ngspice', () => {
  const designs = exampleDesigns()

  it('has designs to check', () => {
    expect(designs.length).toBeGreaterThanOrEqual(2)
  })

  for (const design of designs) {
    it(`conductor currents of every scenario of "${design.name}" within 0.1 %`, () => {
      const result = analyzeDesign(design)
      for (const scenario of design.scenarios) {
        const compiled = compileCircuit(design, scenario)
        const reported = result.scenarios.find((s) => s.id === scenario.id)!
        if (reported.status !== 'ok') continue
        const spice = runNgspice(toSpiceNetlist(compiled.circuit, { title: `${design.name}: ${scenario.name}` }))
        for (const c of reported.conductors) {
          const e = compiled.conductorElement.get(c.id)
          if (e === undefined) continue
          const probe = spiceCurrentProbe(compiled.circuit.elements[e], e)
          const printed = spice.vectors.get(probe.vector)
          expect(printed, `${scenario.id} ${c.id}`).toBeDefined()
          const reference = probe.sign * (printed as number)
          expect(Math.abs(c.currentA - reference), `${scenario.id} ${c.id}`).toBeLessThanOrEqual(Math.max(REL * Math.abs(reference), FLOOR_A))
        }
      }
    })
  }

  it('prospective fault current at every device of the demo design within 0.1 %', () => {
    const design = createDemoDesign()
    const result = analyzeDesign(design)
    const compiled = compileCircuit(design, FAULT_STUDY_SCENARIO)
    // The bank each device is fed from (the demo has a starter battery beside the house bank).
    const topology = protectionTopology(design, compiled.nodes, protectiveDevices(design))
    let checked = 0
    for (const device of result.devices) {
      if (device.faultCurrentA <= 0) continue
      const part = design.parts.find((p) => p.id === device.partId)!
      const loadTerminal = part.type === 'fuse-panel' ? `out${device.id.split('#way')[1]}` : 'load'
      const node = compiled.nodes.nodeOf.get(`${device.partId}:${loadTerminal}`)!
      const bankNeg = compiled.nodes.nodeOf.get(`${topology.devices.get(device.id)!.sourcePartId}:neg`)!
      // A bolted fault: 0.1 µΩ between the device's load terminal and the bank's negative.
      const faulted: Circuit = { ...compiled.circuit, elements: [...compiled.circuit.elements, { kind: 'resistor', id: 'fault', a: node, b: bankNeg, resistanceOhm: 1e-7 }] }
      const index = faulted.elements.length - 1
      const spice = runNgspice(toSpiceNetlist(faulted, { title: `fault at ${device.id}` }))
      const probe = spiceCurrentProbe(faulted.elements[index], index)
      const reference = Math.abs(spice.vectors.get(probe.vector) as number)
      expect(Math.abs(device.faultCurrentA - reference), device.id).toBeLessThanOrEqual(REL * reference)
      checked++
    }
    expect(checked).toBeGreaterThan(0)
  })
})
