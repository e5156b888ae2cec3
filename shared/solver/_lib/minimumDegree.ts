// Minimum-degree ordering on the elimination graph. Radial networks (trees with a few meshed
// return paths) eliminate leaf-first with almost no fill, so this simple form is close to linear.
// Adjacency lists live in one typed-array pool (no per-node arrays for the garbage collector),
// degree buckets are doubly linked lists, adjacency checks scan the shorter list, and deletions
// are lazy, so a bus bar with thousands of branches costs O(1) per eliminated branch.

/** Elimination order for a symmetric graph in CSR form (`ptr`, `idx`; self-loops ignored). */
export function minimumDegreeOrder(n: number, ptr: Int32Array, idx: Int32Array): Int32Array {
  let pool = new Int32Array(Math.max(16, 2 * idx.length + 4 * n))
  const start = new Int32Array(n)
  const len = new Int32Array(n)
  const cap = new Int32Array(n)
  const stamp = new Int32Array(n).fill(-1)
  let top = 0
  for (let i = 0; i < n; i++) {
    start[i] = top
    stamp[i] = i
    for (let p = ptr[i]; p < ptr[i + 1]; p++) {
      const j = idx[p]
      if (stamp[j] !== i) {
        stamp[j] = i
        pool[top++] = j
      }
    }
    len[i] = top - start[i]
    cap[i] = len[i] + 2
    top = start[i] + cap[i]
  }

  const append = (i: number, y: number): void => {
    if (len[i] === cap[i]) {
      const newCap = 2 * cap[i] + 2
      if (top + newCap > pool.length) {
        const grown = new Int32Array(Math.max(2 * pool.length, top + newCap))
        grown.set(pool)
        pool = grown
      }
      pool.copyWithin(top, start[i], start[i] + len[i])
      start[i] = top
      cap[i] = newCap
      top += newCap
    }
    pool[start[i] + len[i]++] = y
  }
  const adjacent = (x: number, y: number): boolean => {
    const shortList = len[x] <= len[y] ? x : y
    const other = shortList === x ? y : x
    const end = start[shortList] + len[shortList]
    for (let k = start[shortList]; k < end; k++) if (pool[k] === other) return true
    return false
  }

  // Degree buckets as doubly linked lists.
  const degree = new Int32Array(n)
  const head = new Int32Array(n + 1).fill(-1)
  const next = new Int32Array(n)
  const prev = new Int32Array(n)
  const insert = (v: number): void => {
    const d = degree[v]
    prev[v] = -1
    next[v] = head[d]
    if (head[d] >= 0) prev[head[d]] = v
    head[d] = v
  }
  const remove = (v: number): void => {
    if (prev[v] >= 0) next[prev[v]] = next[v]
    else head[degree[v]] = next[v]
    if (next[v] >= 0) prev[next[v]] = prev[v]
  }
  for (let i = n - 1; i >= 0; i--) {
    degree[i] = len[i]
    insert(i)
  }

  const eliminated = new Uint8Array(n)
  const deadEntries = new Int32Array(n)
  const live = new Int32Array(n)
  const order = new Int32Array(n)
  let minDegree = 0
  for (let k = 0; k < n; k++) {
    while (head[minDegree] < 0) minDegree++
    const v = head[minDegree]
    remove(v)
    order[k] = v
    eliminated[v] = 1
    let liveCount = 0
    for (let p = start[v]; p < start[v] + len[v]; p++) {
      const x = pool[p]
      if (!eliminated[x]) live[liveCount++] = x
    }
    for (let i = 0; i < liveCount; i++) {
      const x = live[i]
      remove(x)
      degree[x]--
      deadEntries[x]++
    }
    // Eliminating v joins its neighbours into a clique (the fill of Gaussian elimination).
    for (let i = 0; i < liveCount; i++) {
      const x = live[i]
      for (let j = i + 1; j < liveCount; j++) {
        const y = live[j]
        if (!adjacent(x, y)) {
          append(x, y)
          append(y, x)
          degree[x]++
          degree[y]++
        }
      }
    }
    for (let i = 0; i < liveCount; i++) {
      const x = live[i]
      if (deadEntries[x] * 2 > len[x]) {
        let w = start[x]
        const end = start[x] + len[x]
        for (let p = start[x]; p < end; p++) if (!eliminated[pool[p]]) pool[w++] = pool[p]
        len[x] = w - start[x]
        deadEntries[x] = 0
      }
      insert(x)
      if (degree[x] < minDegree) minDegree = degree[x]
    }
    len[v] = 0
  }
  return order
}
