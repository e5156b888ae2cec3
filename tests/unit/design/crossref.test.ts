import { describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../../shared/design/demo'
import { parseDesign } from '../../../shared/design/schema'

// References that only make sense together: unique ids, conductor ends on real terminals of the
// right part type, scenario loads naming loads or inverters.

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- tests reshape the document freely, as a file could
type Loose = any

const errorsOf = (change: (d: Loose) => void) => {
  const design: Loose = structuredClone(createDemoDesign())
  change(design)
  const result = parseDesign(design)
  return result.ok ? [] : result.errors
}

describe('cross-reference checks', () => {
  it('reports a part id used twice at the second use', () => {
    expect(errorsOf((d) => (d.parts[3].id = d.parts[1].id))).toContainEqual({
      path: 'parts[3].id', message: 'Id "mppt" is already used by parts[1]' })
  })

  it('keeps part and conductor ids apart (one id selects one thing on the canvas)', () => {
    expect(errorsOf((d) => (d.conductors[0].id = 'house-bank'))).toEqual([
      { path: 'conductors[0].id', message: 'Id "house-bank" is already used by parts[5]' }])
  })

  it('reports a conductor end on a missing part', () => {
    expect(errorsOf((d) => (d.conductors[2].to.partId = 'ghost'))).toEqual([
      { path: 'conductors[2].to.partId', message: 'No part has the id "ghost"' }])
  })

  it('reports a terminal the part type does not have, listing the ones it has', () => {
    expect(errorsOf((d) => (d.conductors[0].from.terminal = 'out1'))).toEqual([
      { path: 'conductors[0].from.terminal', message: 'A solar array has no terminal "out1" (this one has: pos, neg)' }])
  })

  it('reports a bus-bar stud beyond the bar\'s stud count', () => {
    expect(errorsOf((d) => (d.parts[9].params.studs = 4))).toEqual([
      { path: 'conductors[9].from.terminal', message: 'A bus bar has no terminal "e" (this one has: a, b, c, d)' }])
  })

  it('reports a fuse-panel way beyond the panel\'s ways', () => {
    const errors = errorsOf((d) => {
      d.parts[16].params.ways = 5
      d.parts[16].params.wayRatingsA = [10, 10, 15, 10, 10]
    })
    expect(errors).toEqual([{ path: 'conductors[32].from.terminal', message: 'A fuse panel has no terminal "out6" (this one has: in-pos, in-neg, out1, out2, out3, out4, out5, neg)' }])
  })

  it('reports a conductor from a terminal to itself', () => {
    expect(errorsOf((d) => (d.conductors[0].to = { ...d.conductors[0].from }))).toEqual([
      { path: 'conductors[0].to', message: 'A conductor must join two different terminals' }])
  })

  it('reports scenario loads that are not loads or inverters, or do not exist', () => {
    const errors = errorsOf((d) => {
      d.scenarios[1].loads['house-bank'] = { on: true, level: 1 }
      d.scenarios[1].loads['pump 2'] = { on: true, level: 1 }
    })
    expect(errors).toEqual([
      { path: 'scenarios[1].loads["house-bank"]', message: '"house-bank" is a battery bank; scenarios switch only loads, inverters and chargers' },
      { path: 'scenarios[1].loads["pump 2"]', message: 'No part has the id "pump 2"' },
    ])
  })

  it('reports duplicate scenario ids and names (names select scenarios on the command line)', () => {
    const errors = errorsOf((d) => {
      d.scenarios[1].id = d.scenarios[0].id
      d.scenarios[2].name = 'night, ALL loads'
    })
    expect(errors).toEqual([
      { path: 'scenarios[1].id', message: 'Id "night-all-loads" is already used by scenarios[0]' },
      { path: 'scenarios[2].name', message: 'Another scenario (scenarios[0]) is already called "night, ALL loads"' },
    ])
  })
})
