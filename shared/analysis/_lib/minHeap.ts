/** Binary min-heap of (key, item) pairs on typed arrays: O(log n) push and pop. */
export class MinHeap {
  private keys: Float64Array
  private items: Int32Array
  size = 0

  constructor(capacity = 64) {
    this.keys = new Float64Array(Math.max(4, capacity))
    this.items = new Int32Array(Math.max(4, capacity))
  }

  push(key: number, item: number): void {
    if (this.size === this.keys.length) this.grow()
    let i = this.size++
    while (i > 0) {
      const parent = (i - 1) >> 1
      if (this.keys[parent] <= key) break
      this.keys[i] = this.keys[parent]
      this.items[i] = this.items[parent]
      i = parent
    }
    this.keys[i] = key
    this.items[i] = item
  }

  /** Removes the smallest; returns its item (call only when size > 0). */
  pop(): number {
    const top = this.items[0]
    const key = this.keys[--this.size]
    const item = this.items[this.size]
    let i = 0
    for (;;) {
      let child = 2 * i + 1
      if (child >= this.size) break
      if (child + 1 < this.size && this.keys[child + 1] < this.keys[child]) child++
      if (this.keys[child] >= key) break
      this.keys[i] = this.keys[child]
      this.items[i] = this.items[child]
      i = child
    }
    this.keys[i] = key
    this.items[i] = item
    return top
  }

  private grow(): void {
    const keys = new Float64Array(this.keys.length * 2)
    const items = new Int32Array(this.items.length * 2)
    keys.set(this.keys)
    items.set(this.items)
    this.keys = keys
    this.items = items
  }
}
