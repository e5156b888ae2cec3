import { describe, expect, it } from 'vitest'
import { xmlWellFormedError } from '../../../shared/export/xmlWellFormed'

// The checker itself, against the XML 1.0 well-formedness constraints it claims to test (§2.1, §3.1, §4.1).
describe('xmlWellFormedError', () => {
  it('accepts well-formed documents', () => {
    expect(xmlWellFormedError('<?xml version="1.0"?>\n<a x="1"><b/><c>t &amp; &#x3c; u</c></a>')).toBeNull()
  })
  it.each([
    ['<a><b></a></b>', 'closes'],
    ['<a x="1" x="2"/>', 'duplicate'],
    ['<a>AT&T</a>', 'entity'],
    ['<a x=1/>', 'malformed'],
    ['<a/><b/>', 'more than one root'],
    ['<a>', 'unclosed'],
    ['<a x="<"/>', 'malformed'],
  ])('rejects %s', (xml, problem) => {
    expect(xmlWellFormedError(xml)).toContain(problem)
  })
})
