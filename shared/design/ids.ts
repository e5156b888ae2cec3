// Ids for parts, conductors and scenarios: a readable prefix plus 8 base-36 characters
// (36^8 ≈ 2.8e12 values, so two editors adding parts at once practically never collide).
// Pure: no crypto or Node APIs, so it runs the same in the browser, the server and tests.

/** What every id in a design must look like (also used by the schema). */
export const ID_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_-]{0,63}$/

const ALPHABET = '0123456789abcdefghijklmnopqrstuvwxyz'
const SUFFIX_LENGTH = 8

/**
 * A new id such as `fuse-k3j9x2ab`.
 * @example newId('bat') // 'bat-0f3kz91q'
 */
export function newId(prefix: string, random: () => number = Math.random): string {
  const cleanPrefix = prefix.replace(/[^A-Za-z0-9_-]/g, '').replace(/^[_-]+/, '').slice(0, 40) || 'id'
  let suffix = ''
  for (let i = 0; i < SUFFIX_LENGTH; i++) {
    suffix += ALPHABET[Math.floor(random() * ALPHABET.length) % ALPHABET.length]
  }
  return `${cleanPrefix}-${suffix}`
}

/** An id not yet in `taken` (e.g. when pasting parts into a design). */
export function newUniqueId(prefix: string, taken: ReadonlySet<string>, random: () => number = Math.random): string {
  for (;;) {
    const id = newId(prefix, random)
    if (!taken.has(id)) return id
  }
}
