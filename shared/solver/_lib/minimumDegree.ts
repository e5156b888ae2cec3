// Minimum-degree ordering on the elimination graph. Radial networks (trees with a few meshed
// return paths) eliminate leaf-first with almost no fill, so this simple form is close to linear.
// Adjacency checks scan the shorter list and deletions are lazy, so a bus bar with thousands of
// branches costs O(1) per eliminated branch rather than O(degree).

/** Elimination order for a symmetric graph in CSR form (`ptr`, `idx`; self-loops ignored). */
export function minimumDegreeOrder(n: number, ptr: Int32Array, idx: Int32Array): Int32Array {
  const adj: number[][] = new Array(n)
  const degree = new Int32Array(n)
  const stamp = new Int32Array(n).fill(-1)
  for (let i = 0; i < n; i++) {
    const list: number[] = []
    stamp[i] = i
    for (let p = ptr[i]; p < ptr[i + 1]; p++) {
      const j = idx[p]
      if (stamp[j] !== i) {
        stamp[j] = i
        list.push(j)
      }
    }
    adj[i] = list
    degree[i] = list.length
  }
  const eliminated = new Uint8Array(n)
  const deadEntries = new Int32Array(n)
  const buckets: number[][] = Array.from({ length: n + 1 }, () => [])
  for (let i = n - 1; i >= 0; i--) buckets[degree[i]].push(i)
  let minDegree = 0
  const order = new Int32Array(n)
  const live: number[] = []

  const adjacent = (x: number, y: number): boolean => {
    const [short, other] = adj[x].length <= adj[y].length ? [adj[x], y] : [adj[y], x]
    for (let k = 0; k < short.length; k++) if (short[k] === other) return true
    return false
  }

  for (let k = 0; k < n; k++) {
    let v = -1
    for (;;) {
      while (buckets[minDegree].length === 0) minDegree++
      const candidate = buckets[minDegree].pop() as number
      if (!eliminated[candidate] && degree[candidate] === minDegree) {
        v = candidate
        break
      }
    }
    order[k] = v
    eliminated[v] = 1
    live.length = 0
    for (const x of adj[v]) if (!eliminated[x]) live.push(x)
    for (const x of live) {
      degree[x]--
      deadEntries[x]++
    }
    // Eliminating v joins its neighbours into a clique (the fill of Gaussian elimination).
    for (let i = 0; i < live.length; i++) {
      const x = live[i]
      for (let j = i + 1; j < live.length; j++) {
        const y = live[j]
        if (!adjacent(x, y)) {
          adj[x].push(y)
          adj[y].push(x)
          degree[x]++
          degree[y]++
        }
      }
    }
    for (const x of live) {
      if (deadEntries[x] * 2 > adj[x].length) {
        adj[x] = adj[x].filter((y) => !eliminated[y])
        deadEntries[x] = 0
      }
      buckets[degree[x]].push(x)
      if (degree[x] < minDegree) minDegree = degree[x]
    }
    adj[v] = []
  }
  return order
}
