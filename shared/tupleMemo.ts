/**
 * A memo keyed by a short tuple of primitives (size id, material, temperature…), stored as nested
 * Maps so that a look-up builds no key string: the analysis asks the same few questions once per
 * conductor or device, tens of thousands of times in a big design. Keys compare as Map keys do
 * (SameValueZero). Holds at most `maxEntries` values, then starts again empty.
 * @example
 * const memo = new TupleMemo<number>()
 * memo.get(['awg-10', 'copper', 30]) ?? memo.set(['awg-10', 'copper', 30], 0.0033)
 */
export class TupleMemo<V> {
  private root = new Map<unknown, unknown>()
  private size = 0

  constructor(private readonly maxEntries = 4096) {}

  /** The value stored for exactly these keys (same length as when set), or undefined. */
  get(keys: readonly unknown[]): V | undefined {
    let level: Map<unknown, unknown> | undefined = this.root
    const last = keys.length - 1
    for (let i = 0; i < last && level; i++) level = level.get(keys[i]) as Map<unknown, unknown> | undefined
    return level?.get(keys[last]) as V | undefined
  }

  /** Stores `value` for these keys and returns it. */
  set(keys: readonly unknown[], value: V): V {
    if (this.size >= this.maxEntries) {
      this.root = new Map()
      this.size = 0
    }
    let level = this.root
    const last = keys.length - 1
    for (let i = 0; i < last; i++) {
      let next = level.get(keys[i]) as Map<unknown, unknown> | undefined
      if (!next) level.set(keys[i], (next = new Map()))
      level = next
    }
    if (!level.has(keys[last])) this.size++
    level.set(keys[last], value)
    return value
  }
}
