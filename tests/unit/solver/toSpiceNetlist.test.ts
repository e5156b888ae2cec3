import { describe, expect, it } from 'vitest'
import { spiceCurrentProbe, toSpiceNetlist } from '../../../shared/spice/toSpiceNetlist'

describe('toSpiceNetlist', () => {
  const deck = toSpiceNetlist(
    {
      nodeCount: 6,
      nodeNames: ['battery −', 'battery +', 'bus +'],
      elements: [
        { kind: 'vsource', id: 'house bank', pos: 1, neg: 0, voltageV: 12.8, resistanceOhm: 0.004 },
        { kind: 'resistor', id: 'main+', a: 1, b: 2, resistanceOhm: 0.0005 },
        { kind: 'cpower', id: 'inverter', pos: 2, neg: 0, powerW: 1200, minVoltageV: 10.5 },
        { kind: 'cpower', id: 'solar', pos: 2, neg: 0, powerW: -300, minVoltageV: 10 },
        { kind: 'isource', id: 'pump', from: 2, to: 0, currentA: 4 },
        { kind: 'resistor', id: 'spare', a: 3, b: 4, resistanceOhm: 2 },
        { kind: 'resistor', id: 'bad', a: 4, b: 5, resistanceOhm: -1 },
      ],
    },
    { title: 'Van\nsecond line' },
  )
  const lines = deck.split('\n')

  it('writes a battery as EMF plus series resistance through an internal node', () => {
    expect(lines).toContain('VB0 xb0 n0 DC 12.8')
    expect(lines).toContain('RB0 n1 xb0 0.004')
    expect(spiceCurrentProbe({ kind: 'vsource', id: 'b', pos: 1, neg: 0, voltageV: 1, resistanceOhm: 1 }, 0)).toEqual({ vector: 'vb0#branch', sign: -1 })
  })

  it('writes constant power as a behavioural source with the resistive fallback below Vmin', () => {
    expect(lines).toContain('B2 n2 n0 I = V(n2,n0) >= 10.5 ? 1200/V(n2,n0) : V(n2,n0)*1200/110.25')
    expect(lines).toContain('B3 n2 n0 I = V(n2,n0) >= 10 ? (-300)/V(n2,n0) : V(n2,n0)*(-300)/100')
    expect(lines).toContain('I4 n2 n0 DC 4')
  })

  it('ties every island to ground, leaves invalid elements out, keeps the title on one line', () => {
    expect(lines[0]).toBe('* Van')
    expect(lines).toContain('* node n2: bus +')
    expect(lines).toContain('* node n0: battery ?') // comments stay ASCII
    expect(lines).toContain('VGND0 n0 0 DC 0')
    expect(lines).toContain('VGND1 n3 0 DC 0') // the floating "spare" island
    expect(deck).toContain('* left out (invalid, or no current can flow): bad')
    expect(deck).not.toMatch(/^R6 /m)
  })

  it('ends with an op analysis, 12-digit prints, rusage and quit 0', () => {
    const control = lines.slice(lines.indexOf('.control'))
    expect(control.slice(0, 4)).toEqual(['.control', 'set numdgt=12', 'op', 'print all'])
    expect(control).toContain('print vb0#branch @r1[i] @b2[i] @b3[i] @i4[current] @r5[i]')
    expect(control.slice(-5)).toEqual(['rusage all', 'quit 0', '.endc', '.end', ''])
  })
})
