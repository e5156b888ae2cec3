import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ID_PATTERN, newId, newUniqueId } from '../../../shared/design/ids'
import { formatIssuePath } from '../../../shared/design/issues'

describe('newId', () => {
  it('is the prefix, a dash and 8 base-36 characters, accepted by the schema\'s id pattern', () => {
    fc.assert(fc.property(fc.string({ maxLength: 50 }), (prefix) => {
      const id = newId(prefix)
      expect(id).toMatch(ID_PATTERN)
      expect(id).toMatch(/-[0-9a-z]{8}$/)
    }))
  })

  it('uses the random source it is given (so tests can pin it)', () => {
    expect(newId('fuse', () => 0)).toBe('fuse-00000000')
    expect(newId('fuse', () => 0.9999999)).toBe('fuse-zzzzzzzz')
  })

  it('keeps clear of ids already taken', () => {
    const values = [0, 0, 0, 0, 0, 0, 0, 0, 0.5, 0, 0, 0, 0, 0, 0, 0]
    let i = 0
    expect(newUniqueId('bus', new Set(['bus-00000000']), () => values[i++ % values.length])).toBe('bus-i0000000')
  })
})

describe('formatIssuePath', () => {
  it.each([
    [[], ''],
    [['name'], 'name'],
    [['parts', 3, 'params', 'capacityAh'], 'parts[3].params.capacityAh'],
    [['scenarios', 0, 'loads', 'pump-1', 'level'], 'scenarios[0].loads["pump-1"].level'],
    [[0, 'x'], '[0].x'],
  ] as [PropertyKey[], string][])('%j → %s', (path, text) => {
    expect(formatIssuePath(path)).toBe(text)
  })
})
