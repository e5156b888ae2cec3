import { describe, expect, it } from 'vitest'
import { migrateDesign } from '../../../shared/design/migrate'
import { DESIGN_FORMAT_VERSION, parseDesign } from '../../../shared/design/schema'

// A version-0 document (the pre-release layout), written out by hand, and the version-1 document
// it must become: renamed and nested fields, the format marker, settings and schema defaults.
const V0_DOCUMENT = {
  version: 0,
  name: 'Old dinghy',
  systemVoltage: 12,
  profile: 'marine',
  components: [
    { id: 'bat', kind: 'battery', label: 'Battery', x: 10, y: 20,
      props: { chemistry: 'agm', nominalVoltageV: 12, capacityAh: 60, internalResistanceOhm: 0.006, seriesCount: 1, parallelCount: 1 } },
    { id: 'lamp', kind: 'load', label: 'Lamp', x: 300, y: 20,
      props: { model: 'power', powerW: 10, duty: 'continuous', critical: false, hoursPerDay: 3 } },
  ],
  wires: [
    { id: 'w1', from: 'bat.pos', to: 'lamp.pos', gauge: 'awg-16', lengthM: 2 },
    { id: 'w2', from: 'lamp.neg', to: 'bat.neg', gauge: 'awg-16', lengthM: 2 },
  ],
}

describe('migrateDesign', () => {
  it('upgrades a v0 document to the v1 layout', () => {
    const result = parseDesign(V0_DOCUMENT)
    if (!result.ok) throw new Error(JSON.stringify(result.errors))
    expect(result.migratedFrom).toBe(0)
    expect(result.design).toEqual({
      format: 'ampwright.design', version: 1, id: 'imported-design', name: 'Old dinghy',
      settings: { nominalVoltageV: 12, unitSystem: 'metric', profile: 'marine', defaultAmbientC: 30 },
      parts: [
        { id: 'bat', type: 'battery', label: 'Battery', position: { x: 10, y: 20 }, params: V0_DOCUMENT.components[0].props },
        { id: 'lamp', type: 'load', label: 'Lamp', position: { x: 300, y: 20 }, params: V0_DOCUMENT.components[1].props },
      ],
      conductors: [
        { id: 'w1', label: '', from: { partId: 'bat', terminal: 'pos' }, to: { partId: 'lamp', terminal: 'pos' }, sizeId: 'awg-16',
          lengthM: 2, material: 'copper', insulationRatingC: 105, installation: 'free-air', bundledCount: 1, ambientC: null, sheathed: false },
        { id: 'w2', label: '', from: { partId: 'lamp', terminal: 'neg' }, to: { partId: 'bat', terminal: 'neg' }, sizeId: 'awg-16',
          lengthM: 2, material: 'copper', insulationRatingC: 105, installation: 'free-air', bundledCount: 1, ambientC: null, sheathed: false },
      ],
      // v0 had no scenarios when "cases" was absent: one with every load on is created.
      scenarios: [{ id: 'scenario-1', name: 'All loads on', sunOn: false, chargerOn: false, loads: { lamp: { on: true, level: 1 } } }],
    })
  })

  it('turns v0 "cases" into scenarios', () => {
    const result = parseDesign({ ...V0_DOCUMENT, cases: [{ name: 'Dark', on: ['lamp'] }, { name: 'Off', on: [] }] })
    if (!result.ok) throw new Error(JSON.stringify(result.errors))
    expect(result.design.scenarios.map((s) => [s.id, s.name, Object.keys(s.loads)])).toEqual([
      ['scenario-1', 'Dark', ['lamp']], ['scenario-2', 'Off', []]])
  })

  it('reports v0 mistakes at their v1 paths after upgrading', () => {
    const broken = { ...V0_DOCUMENT, wires: [{ id: 'w1', from: 'bat.pos', to: 'lamp.top', gauge: 'awg-16', lengthM: 2 }] }
    expect(parseDesign(broken)).toEqual({ ok: false, errors: [
      { path: 'conductors[0].to.terminal', message: 'A load has no terminal "top" (this one has: pos, neg)' }] })
  })

  it('leaves a current-version document as it is', () => {
    const doc = { format: 'ampwright.design', version: DESIGN_FORMAT_VERSION, name: 'x' }
    expect(migrateDesign(doc)).toEqual({ ok: true, design: doc, fromVersion: DESIGN_FORMAT_VERSION })
  })

  it('refuses documents from a newer version, without guessing', () => {
    expect(migrateDesign({ format: 'ampwright.design', version: DESIGN_FORMAT_VERSION + 1 })).toEqual({ ok: false, errors: [{
      path: 'version',
      message: `This design uses format version ${DESIGN_FORMAT_VERSION + 1}, newer than this app reads (${DESIGN_FORMAT_VERSION}); update Ampwright to open it` }] })
  })

  it.each([[undefined], ['1'], [1.5], [-1]])('refuses version %j', (version) => {
    expect(migrateDesign({ format: 'ampwright.design', version })).toEqual({ ok: false, errors: [
      { path: 'version', message: 'Format version must be a whole number such as 1' }] })
  })

  it('does not take an unmarked object for a v0 design', () => {
    expect(migrateDesign({ name: 'some other JSON' })).toEqual({ ok: false, errors: [
      { path: 'format', message: 'Not an Ampwright design (format must be "ampwright.design")' }] })
  })

  it('survives malformed v0 content and lets the schema report it', () => {
    const result = parseDesign({ version: 0, name: 'x', systemVoltage: 12, components: 'nope', wires: [7], cases: [null] })
    expect(result.ok).toBe(false)
    if (!result.ok) expect(result.errors.map((e) => e.path)).toEqual(['parts', 'conductors[0]', 'scenarios[0]'])
  })
})
