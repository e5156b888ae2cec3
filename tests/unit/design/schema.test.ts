import { describe, expect, it } from 'vitest'
import { PART_CATALOGUE, PART_TYPE_LIST, partTerminals } from '../../../shared/design/catalogue'
import { createDemoDesign, createEmptyDesign } from '../../../shared/design/demo'
import { PART_TYPES, parseDesign, type DesignSettings } from '../../../shared/design/schema'
import demoFile from '../../../examples/demo-expedition-truck.json'
import floatingFile from '../../../examples/floating-part.json'
import sailboatFile from '../../../examples/sailboat-24v.json'
import vanFile from '../../../examples/small-van-12v.json'

const EXAMPLES: Record<string, unknown> = {
  'demo-expedition-truck.json': demoFile,
  'small-van-12v.json': vanFile,
  'sailboat-24v.json': sailboatFile,
  'floating-part.json': floatingFile,
}

describe('parseDesign accepts', () => {
  it('examples/demo-expedition-truck.json as exactly the built-in demo', () => {
    expect(parseDesign(demoFile)).toEqual({ ok: true, design: createDemoDesign() })
  })

  it('the demo design unchanged', () => {
    const demo = createDemoDesign()
    const result = parseDesign(demo)
    expect(result).toEqual({ ok: true, design: demo })
  })

  it.each(Object.keys(EXAMPLES))('examples/%s', (name) => {
    const result = parseDesign(EXAMPLES[name])
    expect(result.ok ? [] : result.errors).toEqual([])
  })

  it.each([12, 24, 48] as const)('an empty %i V design', (nominalVoltageV) => {
    const empty = createEmptyDesign({ name: 'New boat', nominalVoltageV, profile: 'marine' })
    const result = parseDesign(empty)
    expect(result.ok).toBe(true)
    expect(empty.scenarios).toHaveLength(1)
    expect(empty.id).toMatch(/^design-[0-9a-z]{8}$/)
  })

  it('a design written by hand with only the required fields, filling documented defaults', () => {
    const result = parseDesign({
      format: 'ampwright.design', version: 1, id: 'minimal', name: 'Minimal',
      settings: { nominalVoltageV: 12, profile: 'building' },
      parts: [{ id: 'f', type: 'fuse', position: { x: 0, y: 0 },
        params: { family: 'blade-regular', ratingA: 10, dcVoltageRatingV: 32, interruptingRatingA: 1000, ignitionProtected: false } }],
      conductors: [],
      scenarios: [{ id: 's', name: 'Normal' }],
    })
    if (!result.ok) throw new Error(JSON.stringify(result.errors))
    expect(result.design.settings).toEqual({ nominalVoltageV: 12, unitSystem: 'metric', profile: 'building', defaultAmbientC: 30 })
    expect(result.design.parts[0]).toMatchObject({ label: '', params: { closed: true, resistanceOhm: 0.001 } })
    expect(result.design.scenarios[0]).toEqual({ id: 's', name: 'Normal', sunOn: false, chargerOn: false, loads: {} })
  })
})

describe('catalogue', () => {
  const settingsFor = (nominalVoltageV: 12 | 24 | 48): DesignSettings => ({ nominalVoltageV, unitSystem: 'metric', profile: 'vehicle', defaultAmbientC: 30 })

  it('covers every part type exactly once', () => {
    expect([...PART_TYPE_LIST].sort()).toEqual([...PART_TYPES].sort())
    for (const type of PART_TYPES) expect(PART_CATALOGUE[type].type).toBe(type)
  })

  it.each(PART_TYPES.flatMap((type) => ([12, 24, 48] as const).map((v) => [type, v] as const)))('defaults of %s at %i V are valid params', (type, v) => {
    const info = PART_CATALOGUE[type]
    const params = info.defaultParams(settingsFor(v))
    const parsed = info.paramsSchema.safeParse(params)
    expect(parsed.success ? [] : parsed.error.issues).toEqual([])
    expect(info.label.length).toBeGreaterThan(0)
    expect(info.description.length).toBeGreaterThan(10)
  })

  it('gives a default battery bank the system voltage (12.8 V LFP modules in series)', () => {
    for (const v of [12, 24, 48] as const) {
      const p = PART_CATALOGUE.battery.defaultParams(settingsFor(v))
      expect(p.seriesCount * 12).toBe(v)
    }
  })

  it('has unique terminal ids per type, each with a polarity and side', () => {
    for (const type of PART_TYPES) {
      const ids = PART_CATALOGUE[type].terminals.map((t) => t.id)
      expect(new Set(ids).size, type).toBe(ids.length)
      expect(ids.length, type).toBeGreaterThanOrEqual(2)
    }
  })

  it('limits bus-bar and fuse-panel terminals to the studs and ways the part has', () => {
    const bar = { type: 'bus-bar' as const, params: { ratingA: 100, polarity: 'negative', studs: 3 } }
    expect(partTerminals(bar).map((t) => [t.id, t.polarity])).toEqual([['a', 'negative'], ['b', 'negative'], ['c', 'negative']])
    const panel = { type: 'fuse-panel' as const, params: { ways: 2 } }
    expect(partTerminals(panel).map((t) => t.id)).toEqual(['in-pos', 'in-neg', 'out1', 'out2', 'neg'])
  })
})
