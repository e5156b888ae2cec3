import { describe, expect, it } from 'vitest'
import { PART_CATALOGUE } from '../../../shared/design/catalogue'
import { PART_TYPES, parseDesign } from '../../../shared/design/schema'
import doc from '../../../docs/design-format.md?raw'

// docs/design-format.md must keep up with the schema: every part type, parameter and terminal is
// described, and its minimal example is a valid design.

/** The section of the page about one part type: from its heading to the next heading. */
function sectionOf(type: string): string {
  const start = doc.search(new RegExp(`^### .*\`${type}\``, 'm'))
  if (start < 0) return ''
  const rest = doc.slice(start + 4)
  const end = rest.search(/^##/m)
  return end < 0 ? rest : rest.slice(0, end)
}

describe('docs/design-format.md', () => {
  it.each(PART_TYPES)('describes every parameter and terminal of %s', (type) => {
    const section = sectionOf(type)
    expect(section, `no section for ${type}`).not.toBe('')
    const shape = PART_CATALOGUE[type].paramsSchema.shape as Record<string, unknown>
    for (const key of Object.keys(shape)) expect(section, `${type}.${key}`).toContain(`\`${key}\``)
    for (const terminal of PART_CATALOGUE[type].terminals) expect(section, `${type} terminal ${terminal.id}`).toMatch(new RegExp(`\`${terminal.id}\`|${terminal.id.replace(/\d$/, '')}`))
  })

  it('gives a minimal example that parses', () => {
    const json = /```json\n([\s\S]*?)```/.exec(doc)?.[1]
    expect(json).toBeDefined()
    const result = parseDesign(JSON.parse(json!))
    expect(result.ok ? [] : result.errors).toEqual([])
  })
})
