// Regression guard for speed work on the analysis: the whole result (findings with their ids, values
// and messages, conductor and device summaries, every scenario's currents, voltages and terminal
// voltages) for every design in examples/, the demo design and a generated 300-part design must stay
// exactly what the committed snapshot holds. The snapshot was written once by the analysis before the
// speed work (commit history of this file); the primary evidence that those figures are right stays the
// ngspice comparisons (tests/reference) and the hand-worked and published-table tests beside this file.
// After a deliberate change of results, regenerate with `npx vitest run --project unit -u <this file>`
// and say in the commit why the figures moved.
import { readdirSync, readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../../shared/analysis'
import { createDemoDesign } from '../../../shared/design/demo'
import { parseDesign, type Design } from '../../../shared/design/schema'
import { generatedDesign } from '../../helpers/generatedDesign'

function load(name: string): Design {
  const r = parseDesign(JSON.parse(readFileSync(`examples/${name}`, 'utf8')))
  if (!r.ok) throw new Error(`${name}: ${JSON.stringify(r.errors)}`)
  return r.design
}

/**
 * The result as plain JSON (the lazily built parts of a scenario result included, as a client sees them),
 * without the findings' `source` texts: those name each rule's standard, are fixed per rule, change with
 * the rules' wording (checked by tests/reference/readme) and say nothing about the figures guarded here.
 */
const plain = (design: Design, coordination = true) =>
  JSON.parse(JSON.stringify(analyzeDesign(design, { coordination }), (key, value) => (key === 'source' ? undefined : value)))

describe('analysis result snapshot (regression guard)', () => {
  // bad-design.json is deliberately invalid (it shows the parser's messages): nothing to analyse.
  const examples = readdirSync('examples').filter((n) => n.endsWith('.json') && n !== 'bad-design.json').sort()

  it('covers the example files', () => {
    expect(examples.length).toBeGreaterThanOrEqual(9)
  })

  for (const name of examples) {
    it(`examples/${name}: the same result as the snapshot`, async () => {
      const result = { withCoordination: plain(load(name)), withoutCoordination: plain(load(name), false).findings }
      await expect(`${JSON.stringify(result, null, 1)}\n`).toMatchFileSnapshot(`./__snapshots__/result.${name}`)
    })
  }

  it('demo design: the same result as the snapshot', async () => {
    await expect(`${JSON.stringify(plain(createDemoDesign()), null, 1)}\n`).toMatchFileSnapshot('./__snapshots__/result.demo.json')
  })

  it('generated 200-part design (meshed negatives, three scenarios): the same result as the snapshot', async () => {
    const result = plain(generatedDesign(200))
    // Every figure of the big design; its terminals record only as a count (the examples cover those values).
    for (const s of result.scenarios) s.terminals = Object.keys(s.terminals).length
    await expect(`${JSON.stringify(result, null, 1)}\n`).toMatchFileSnapshot('./__snapshots__/result.generated-200.json')
  })
})
