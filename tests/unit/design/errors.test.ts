import { describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../../shared/design/demo'
import { parseDesign } from '../../../shared/design/schema'
import bad from '../../../examples/bad-design.json'

// Bad input must come back as field paths with sentences a person can act on, never a throw.

const errorsOf = (input: unknown) => {
  const result = parseDesign(input)
  return result.ok ? [] : result.errors
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- tests reshape the document freely, as a file could
type Loose = any

/** The demo with one change applied (a deep copy, so cases stay independent). */
function demoWith(change: (d: Loose) => void): unknown {
  const design: Loose = structuredClone(createDemoDesign())
  change(design)
  return design
}

describe('examples/bad-design.json', () => {
  it('reports every planted mistake at its exact path, with its message', () => {
    expect(errorsOf(bad)).toEqual([
      { path: 'name', message: 'Enter the design name' },
      { path: 'settings.nominalVoltageV', message: 'Choose a system voltage of 12, 24 or 48 V' },
      { path: 'settings.profile', message: 'Choose the installation profile: marine, vehicle, building' },
      { path: 'parts[0].params.capacityAh', message: 'Capacity per battery must be at least 1 Ah' },
      { path: 'parts[1].type', message: expect.stringMatching(/^Choose a part type: battery, pv-array, .*load$/) },
      { path: 'parts[2].params.hoursPerDay', message: 'Hours per day must be at most 24 h' },
      { path: 'conductors[0].sizeId', message: 'Choose a conductor size such as awg-10 or mm2-16' },
      { path: 'conductors[0].lengthM', message: 'Length must be more than 0 m' },
      { path: 'scenarios', message: 'Add at least one scenario' },
    ])
  })
})

describe('field errors on an otherwise valid design', () => {
  const cases: [string, (d: Loose) => void, string, string][] = [
    ['missing capacity', (d) => delete d.parts[5].params.capacityAh, 'parts[5].params.capacityAh', 'Enter the capacity per battery (Ah)'],
    ['capacity as text', (d) => (d.parts[5].params.capacityAh = '200'), 'parts[5].params.capacityAh', 'Capacity per battery must be a number'],
    ['fractional series count', (d) => (d.parts[5].params.seriesCount = 1.5), 'parts[5].params.seriesCount', 'Batteries in series must be a whole number'],
    ['unknown chemistry', (d) => (d.parts[5].params.chemistry = 'lead'), 'parts[5].params.chemistry',
      'Choose the battery chemistry: lfp, agm, flooded, gel, nmc'],
    ['positive Voc coefficient', (d) => (d.parts[0].params.vocTempCoeffPctPerC = 0.3), 'parts[0].params.vocTempCoeffPctPerC',
      'Voc temperature coefficient must be at most 0 %/°C'],
    ['Vmp above Voc', (d) => (d.parts[0].params.moduleVmpV = 30), 'parts[0].params.moduleVmpV',
      'Voltage at maximum power must be below the open-circuit voltage'],
    ['surge below continuous', (d) => (d.parts[14].params.surgeW = 1000), 'parts[14].params.surgeW', 'Surge output must be at least the continuous output'],
    ['panel ways and ratings disagree', (d) => (d.parts[16].params.ways = 5), 'parts[16].params.wayRatingsA',
      'Give one fuse rating per way (5 ways, 6 ratings)'],
    ['constant-current load without a current', (d) => delete d.parts[19].params.currentA, 'parts[19].params.currentA',
      'Enter the current (A) for a constant-current load'],
    ['unknown device family', (d) => (d.parts[6].params.family = 'mystery'), 'parts[6].params.family',
      expect.stringMatching(/^Choose a protective-device family: .*class-t/) as unknown as string],
    ['negative length', (d) => (d.conductors[3].lengthM = -1), 'conductors[3].lengthM', 'Length must be more than 0 m'],
    ['odd insulation rating', (d) => (d.conductors[3].insulationRatingC = 80), 'conductors[3].insulationRatingC',
      'Choose an insulation rating: 60, 75, 90, 105, 125, 200 °C'],
    ['bundle of zero', (d) => (d.conductors[3].bundledCount = 0), 'conductors[3].bundledCount', 'Conductors in the bundle must be at least 1'],
    ['missing terminal ref', (d) => delete d.conductors[3].to, 'conductors[3].to', 'Required'],
    ['bad id', (d) => (d.parts[2].id = 'has space'), 'parts[2].id', 'An id is 1–64 letters, digits, "-" or "_", starting with a letter or digit'],
    ['scenario level above 1', (d) => (d.scenarios[0].loads.fridge.level = 1.5), 'scenarios[0].loads.fridge.level', 'Load level must be at most 1'],
    ['scenario loads as a list', (d) => (d.scenarios[0].loads = []), 'scenarios[0].loads', 'List loads as an object keyed by part id'],
    ['parts not a list', (d) => (d.parts = {}), 'parts', 'Must be a list'],
    ['wrong format marker', (d) => (d.format = 'something.else'), 'format', 'Not an Ampwright design (format must be "ampwright.design")'],
  ]
  it.each(cases)('%s', (_name, change, path, message) => {
    expect(errorsOf(demoWith(change))).toEqual([{ path, message }])
  })

  it('answers non-objects with one error at the document', () => {
    for (const input of [null, 42, 'design', [], true, undefined]) {
      expect(errorsOf(input)).toEqual([{ path: '', message: 'A design must be a JSON object' }])
    }
  })

  it('refuses an absurd number of parts before solving anything', () => {
    const many = demoWith((d) => (d.parts = Array.from({ length: 2001 }, (_, i) => ({ ...d.parts[20], id: `p${i}` }))))
    expect(errorsOf(many)).toContainEqual({ path: 'parts', message: 'A design holds at most 2000 parts' })
  })
})
