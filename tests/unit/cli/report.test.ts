import { describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../../shared/design/demo'
import { CAUTION, designCautions } from '../../../server/cli/report'
import { renderTable } from '../../../server/cli/table'

describe('designCautions', () => {
  it('adds the lithium note for an LFP bank', () => {
    const cautions = designCautions(createDemoDesign())
    expect(cautions[0]).toBe(CAUTION)
    expect(cautions.some((c) => c.startsWith('Lithium batteries:'))).toBe(true)
  })

  it('warns of high-voltage PV from the cold-morning open-circuit voltage', () => {
    const design = createDemoDesign()
    const array = design.parts.find((p) => p.id === 'roof-array')!
    if (array.type !== 'pv-array') throw new Error('demo changed')
    // NEC 690.7 coefficient method (standards.md §6), by hand: 2 modules: 2 × 24.6 × (1 − 0.0028 × (−25 − 25))
    // = 49.2 × 1.14 = 56.1 V, under 60 V: no caution. 3 modules: 73.8 × 1.14 = 84.1 V: caution.
    expect(designCautions(design).some((c) => c.startsWith('High-voltage PV'))).toBe(false)
    array.params.modulesPerString = 3
    expect(designCautions(design)).toContain('High-voltage PV: Roof array, 3 × 2 modules can reach 84 V DC open circuit on a cold ' +
      'morning; treat its wiring as a shock hazard and use PV-rated disconnects and fuses.')
  })
})

describe('renderTable', () => {
  it('aligns columns and wraps long cells inside their column', () => {
    const text = renderTable([{ header: 'A', maxWidth: 5 }, { header: 'LONG', maxWidth: 8 }], [['x', 'one two three'], ['yy', 'z']])
    expect(text.split('\n')).toEqual([
      'A   LONG',
      '--  --------',
      'x   one two',
      '    three',
      'yy  z',
    ])
  })

  it('breaks a word longer than its column', () => {
    expect(renderTable([{ header: 'H', maxWidth: 4 }], [['abcdefghij']]).split('\n')).toEqual(['H', '----', 'abcd', 'efgh', 'ij'])
  })
})
