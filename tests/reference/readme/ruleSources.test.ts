import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { RULES } from '../../../shared/analysis/rules'
import { RULE_SOURCES_HEADING, ruleSourcesMarkdown } from '../../../shared/analysis/ruleSources'
import { PROTECTION_RULES } from '../../../shared/protection/checks'

// README.md's "Where each engineering rule comes from" is generated from the code's own source
// strings; it must match them exactly. To refresh it, replace the section with ruleSourcesMarkdown().

describe('README rule sources', () => {
  const readme = readFileSync('README.md', 'utf8')
  const start = readme.indexOf(RULE_SOURCES_HEADING)

  it('holds the generated section, unchanged, up to the next level-2 heading', () => {
    expect(start).toBeGreaterThan(0)
    const next = readme.indexOf('\n## ', start + RULE_SOURCES_HEADING.length)
    const section = readme.slice(start, next < 0 ? undefined : next + 1)
    expect(section).toBe(ruleSourcesMarkdown())
  })

  it('names every rule id with a non-empty source', () => {
    const text = ruleSourcesMarkdown()
    for (const id of [...RULES.map((r) => r.id), ...PROTECTION_RULES.map((r) => r.ruleId)]) expect(text).toContain(`| \`${id}\` |`)
    for (const line of text.split('\n').filter((l) => l.startsWith('| `'))) expect(line.split(' | ')[2].trim().length).toBeGreaterThan(5)
  })
})
