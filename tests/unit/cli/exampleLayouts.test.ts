// The demo design and the shipped examples are the first drawings users see: no two parts may overlap
// on the canvas or the exported drawing (boxes from the one shared node geometry, with a small gap).
import { readdirSync, readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../../shared/design/demo'
import { nodeGeometry } from '../../../shared/design/nodeGeometry'
import type { Design } from '../../../shared/design/schema'

const GAP_PX = 16

function overlappingPairs(design: Design): string[] {
  const boxes = design.parts.map((part) => ({ id: part.id, ...part.position, ...nodeGeometry(part) }))
  const pairs: string[] = []
  boxes.forEach((a, i) => boxes.slice(i + 1).forEach((b) => {
    const apart = a.x + a.width + GAP_PX <= b.x || b.x + b.width + GAP_PX <= a.x
      || a.y + a.height + GAP_PX <= b.y || b.y + b.height + GAP_PX <= a.y
    if (!apart) pairs.push(`${a.id} × ${b.id}`)
  }))
  return pairs
}

describe('layouts of the demo and the examples', () => {
  it('the demo design has no overlapping parts', () => {
    expect(overlappingPairs(createDemoDesign())).toEqual([])
  })

  const files = readdirSync('examples').filter((name) => name.endsWith('.json'))
  it.each(files)('%s has no overlapping parts', (name) => {
    expect(overlappingPairs(JSON.parse(readFileSync(`examples/${name}`, 'utf8')) as Design)).toEqual([])
  })
})
