// Used by the tests of the SVG export (unit and API) to prove the output well-formed.
// A small strict XML well-formedness check (XML 1.0 §2.1): one root element, every tag closed in
// order, attributes quoted and unique, only the five predefined or numeric entity references.
// Enough for the SVG we emit; it returns the first problem found, or null.

const NAME = '[A-Za-z_:][-A-Za-z0-9_:.]*'
const ATTRIBUTE = new RegExp(`\\s+(${NAME})\\s*=\\s*("[^"<]*"|'[^'<]*')`, 'y')
const ENTITY = /&(?:amp|lt|gt|quot|apos|#[0-9]+|#x[0-9A-Fa-f]+);/y

function checkText(text: string, at: number): string | null {
  for (let i = 0; i < text.length; i++) {
    if (text[i] === '<') return `unexpected "<" at ${at + i}`
    if (text[i] === '&') {
      ENTITY.lastIndex = i
      if (!ENTITY.test(text)) return `bad entity reference at ${at + i}`
    }
  }
  return null
}

export function xmlWellFormedError(xml: string): string | null {
  let i = 0
  const stack: string[] = []
  let roots = 0
  const prolog = /^<\?xml[^?]*\?>/.exec(xml)
  if (prolog) i = prolog[0].length
  while (i < xml.length) {
    const lt = xml.indexOf('<', i)
    const text = xml.slice(i, lt < 0 ? xml.length : lt)
    if (stack.length === 0 && text.trim() !== '') return `text outside the root element at ${i}`
    const textError = checkText(text, i)
    if (textError) return textError
    if (lt < 0) break
    if (xml.startsWith('<!--', lt)) {
      const end = xml.indexOf('-->', lt)
      if (end < 0) return 'unclosed comment'
      i = end + 3
      continue
    }
    const close = new RegExp(`</(${NAME})\\s*>`, 'y')
    close.lastIndex = lt
    const closing = close.exec(xml)
    if (closing) {
      const open = stack.pop()
      if (open !== closing[1]) return `</${closing[1]}> closes <${open ?? 'nothing'}> at ${lt}`
      i = close.lastIndex
      continue
    }
    const name = new RegExp(`<(${NAME})`, 'y')
    name.lastIndex = lt
    const opening = name.exec(xml)
    if (!opening) return `malformed tag at ${lt}`
    let j = name.lastIndex
    const seen = new Set<string>()
    for (;;) {
      ATTRIBUTE.lastIndex = j
      const attribute = ATTRIBUTE.exec(xml)
      if (!attribute) break
      if (seen.has(attribute[1])) return `duplicate attribute ${attribute[1]} at ${j}`
      seen.add(attribute[1])
      const valueError = checkText(attribute[2].slice(1, -1), j)
      if (valueError) return valueError
      j = ATTRIBUTE.lastIndex
    }
    const end = /\s*(\/?)>/y
    end.lastIndex = j
    const ending = end.exec(xml)
    if (!ending) return `malformed tag <${opening[1]}> at ${lt}`
    if (stack.length === 0) roots += 1
    if (roots > 1) return 'more than one root element'
    if (ending[1] !== '/') stack.push(opening[1])
    i = end.lastIndex
  }
  if (stack.length > 0) return `unclosed <${stack[stack.length - 1]}>`
  if (roots !== 1) return 'no root element'
  return null
}
