import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../../shared/design/demo'
import { parseDesign } from '../../../shared/design/schema'

// Property tests (fast-check): whatever arrives from a file, a request or a peer, parseDesign
// answers with a result object and never throws.

function expectWellFormed(result: ReturnType<typeof parseDesign>) {
  if (result.ok) return
  expect(result.errors.length).toBeGreaterThan(0)
  for (const error of result.errors) {
    expect(typeof error.path).toBe('string')
    expect(error.message.length).toBeGreaterThan(0)
  }
}

describe('parseDesign never throws', () => {
  it('on arbitrary JSON values', () => {
    fc.assert(fc.property(fc.jsonValue(), (value) => expectWellFormed(parseDesign(value))), { numRuns: 500 })
  })

  it('on arbitrary JSON under a valid format marker (either version)', () => {
    const doc = fc.record({ format: fc.constant('ampwright.design'), version: fc.constantFrom(0, 1) }).chain((head) =>
      fc.dictionary(fc.constantFrom('id', 'name', 'settings', 'parts', 'conductors', 'scenarios', 'components', 'wires', 'cases'),
        fc.jsonValue()).map((rest) => ({ ...rest, ...head })))
    fc.assert(fc.property(doc, (value) => expectWellFormed(parseDesign(value))), { numRuns: 500 })
  })

  it('on the demo with any one field replaced by arbitrary JSON', () => {
    const demo = createDemoDesign()
    const paths: (string | number)[][] = []
    const walk = (node: unknown, path: (string | number)[]) => {
      paths.push(path)
      if (node && typeof node === 'object') {
        for (const [key, child] of Object.entries(node)) walk(child, [...path, Array.isArray(node) ? Number(key) : key])
      }
    }
    walk(demo, [])
    fc.assert(
      fc.property(fc.constantFrom(...paths.filter((p) => p.length > 0)), fc.jsonValue(), (path, replacement) => {
        const copy = structuredClone(demo) as unknown as Record<string | number, any>
        let parent = copy
        for (const key of path.slice(0, -1)) parent = parent[key]
        parent[path[path.length - 1]] = replacement
        expectWellFormed(parseDesign(copy))
      }),
      { numRuns: 300 },
    )
  }, 30_000)

  it('on objects with prototype-polluting keys', () => {
    const hostile = JSON.parse('{"format":"ampwright.design","version":1,"__proto__":{"ok":true},"constructor":{"prototype":{}}}')
    expectWellFormed(parseDesign(hostile))
    expect(({} as Record<string, unknown>).ok).toBeUndefined()
  })
})
