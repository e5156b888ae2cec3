import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { makeConductor, makePart } from '../../../shared/design/builder'
import { createDemoDesign, createEmptyDesign } from '../../../shared/design/demo'
import type { Design } from '../../../shared/design/schema'
import { buildBillOfMaterials } from '../../../shared/export/billOfMaterials'
import { buildSpares, sparesFromEdit } from '../../../shared/export/spares'

const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0)

describe('buildBillOfMaterials', () => {
  const demo = createDemoDesign()
  const bom = buildBillOfMaterials(demo, { wasteAllowancePct: 10 })

  it("sums conductor lengths to the design's conductors, by size too", () => {
    expect(sum(bom.conductors.map((c) => c.runs))).toBe(demo.conductors.length)
    expect(sum(bom.conductors.map((c) => c.lengthM))).toBeCloseTo(sum(demo.conductors.map((c) => c.lengthM)), 9)
    for (const sizeId of new Set(demo.conductors.map((c) => c.sizeId))) {
      const fromDesign = sum(demo.conductors.filter((c) => c.sizeId === sizeId).map((c) => c.lengthM))
      expect(sum(bom.conductors.filter((c) => c.sizeId === sizeId).map((c) => c.lengthM))).toBeCloseTo(fromDesign, 9)
    }
  })

  it('adds the waste allowance, rounded up to half metres (worked by hand)', () => {
    // Demo: 16 AWG red runs are radio+ 7 m and USB+ 1.5 m = 8.5 m; +10 % = 9.35 m → order 9.5 m.
    const red16 = bom.conductors.find((c) => c.sizeId === 'awg-16' && c.colour === 'red')!
    expect(red16).toMatchObject({ runs: 2, lengthM: 8.5, orderLengthM: 9.5, material: 'tinned-copper' })
  })

  it('counts a terminal for every conductor end, by size', () => {
    expect(sum(bom.terminals.map((t) => t.quantity))).toBe(2 * demo.conductors.length)
    expect(bom.terminals.find((t) => t.sizeId === 'awg-2/0')!.quantity).toBe(2 * demo.conductors.filter((c) => c.sizeId === 'awg-2/0').length)
  })

  it('lists fuses and breakers by family and rating, panel ways included', () => {
    const fuseParts = demo.parts.filter((p) => p.type === 'fuse').length
    const panelWays = 6
    expect(sum(bom.devices.map((d) => d.quantity))).toBe(fuseParts + panelWays)
    // Panel ways [10, 10, 15, 10, 10, 5] A, regular blade fuses: four of 10 A.
    expect(bom.devices.find((d) => d.family === 'blade-regular' && d.ratingA === 10)!.quantity).toBe(4)
    expect(bom.devices.find((d) => d.family === 'strip-bolt-down' && d.ratingA === 60)!.quantity).toBe(2)
    // Batteries count units: the house bank is 2 in series.
    expect(bom.parts.find((p) => p.type === 'battery' && p.description.startsWith('LFP'))!.quantity).toBe(2)
    expect(bom.parts.find((p) => p.type === 'pv-array')!.quantity).toBe(6)
    expect(bom.parts.some((p) => p.type === 'fuse' || p.type === 'breaker')).toBe(false)
  })

  it('keeps conductor totals equal to the design for random conductor sets (property)', () => {
    const base = createEmptyDesign({ name: 'p', nominalVoltageV: 12, profile: 'vehicle' })
    fc.assert(
      fc.property(
        fc.array(fc.record({ size: fc.constantFrom('awg-10', 'awg-4', 'mm2-6' as const), length: fc.double({ min: 0.01, max: 50, noNaN: true }),
          colour: fc.constantFrom('red', 'black', undefined), pct: fc.integer({ min: 0, max: 30 }) }), { maxLength: 30 }),
        (runs) => {
          const design: Design = { ...base, conductors: runs.map((r, i) => makeConductor(`c${i}`, '', 'a.pos', 'b.pos', r.size, r.length, { colour: r.colour })) }
          const pct = runs[0]?.pct ?? 10
          const out = buildBillOfMaterials(design, { wasteAllowancePct: pct })
          // Each line is rounded to the millimetre: at most 0.5 mm off per line.
          const diff = Math.abs(sum(out.conductors.map((c) => c.lengthM)) - sum(runs.map((r) => r.length)))
          expect(diff).toBeLessThanOrEqual(0.0005 * out.conductors.length + 1e-9)
          expect(sum(out.conductors.map((c) => c.runs))).toBe(runs.length)
          for (const line of out.conductors) expect(line.orderLengthM).toBeGreaterThanOrEqual(line.lengthM * (1 + pct / 100) - 1e-6)
        },
      ),
    )
  })
})

describe('buildBillOfMaterials with a library device', () => {
  it('lists a device copied from the library under its own name, apart from the generic family at the same rating', () => {
    const design = createEmptyDesign({ name: 'Library device line', nominalVoltageV: 12, profile: 'vehicle' })
    const band = { minMeltPoints: [{ currentA: 20, timeS: 100 }, { currentA: 150, timeS: 0.01 }],
      maxClearPoints: [{ currentA: 30, timeS: 100 }, { currentA: 200, timeS: 0.01 }] }
    const customDevice = { name: 'Workshop time-delay fuse 15 A', kind: 'fuse' as const, ratingA: 15, timeDelay: true, source: 'user datasheet points', ...band }
    design.parts.push(
      makePart(design.settings, 'fuse', 'generic', 'Generic 15 A', { x: 0, y: 0 }, { family: 'blade-regular', ratingA: 15 }),
      makePart(design.settings, 'fuse', 'library', 'Library 15 A', { x: 0, y: 200 }, { family: 'blade-regular', ratingA: 15, customDevice }),
    )
    const lines = buildBillOfMaterials(design).devices
    expect(lines).toHaveLength(2)
    expect(lines.find((l) => l.libraryDeviceName)).toMatchObject({ familyLabel: 'Workshop time-delay fuse 15 A (library device)', ratingA: 15, quantity: 1 })
    expect(lines.find((l) => !l.libraryDeviceName)).toMatchObject({ family: 'blade-regular', ratingA: 15, quantity: 1 })
  })
})

describe('buildSpares', () => {
  const demo = createDemoDesign()
  const bom = buildBillOfMaterials(demo)
  const spares = buildSpares(bom)

  it('covers every fuse family and rating in use', () => {
    const used = new Set<string>()
    for (const p of demo.parts) {
      if (p.type === 'fuse') used.add(`${p.params.family}|${p.params.ratingA}`)
      if (p.type === 'fuse-panel') p.params.wayRatingsA.forEach((r) => used.add(`${p.params.family}|${r}`))
    }
    expect(new Set(spares.map((s) => `${s.family}|${s.ratingA}`))).toEqual(used)
    expect(spares.every((s) => s.quantity >= 1)).toBe(true)
  })

  it('carries two of a rating used often (common practice: three or more) and flags hard-to-find ratings', () => {
    expect(spares.find((s) => s.family === 'blade-regular' && s.ratingA === 10)).toMatchObject({ inUse: 4, quantity: 2 })
    expect(spares.find((s) => s.family === 'blade-regular' && s.ratingA === 5)).toMatchObject({ inUse: 1, quantity: 1, hardToFind: false })
    const settings = demo.settings
    const odd: Design = { ...demo, parts: [...demo.parts, makePart(settings, 'fuse', 'odd', 'Odd fuse', { x: 0, y: 0 }, { family: 'blade-regular', ratingA: 12 })] }
    const oddSpare = buildSpares(buildBillOfMaterials(odd)).find((s) => s.ratingA === 12)!
    expect(oddSpare.hardToFind).toBe(true)
    expect(oddSpare.note).toContain('hard to find')
  })

  it('takes an edited list and recomputes labels and flags', () => {
    const edited = sparesFromEdit([{ family: 'class-t', ratingA: 300, quantity: 0, note: 'carried by the owner' }], bom)
    expect(edited[0]).toMatchObject({ familyLabel: 'Class T fuse', inUse: 1, quantity: 0, hardToFind: false, note: 'carried by the owner' })
  })
})
