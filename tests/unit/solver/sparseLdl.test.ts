// The sparse LDLᵀ with minimum-degree ordering against plain dense Gaussian elimination.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { createFactor, ldlNumeric, ldlSolve, ldlSymbolic } from '../../../shared/solver/_lib/ldl'
import { minimumDegreeOrder } from '../../../shared/solver/_lib/minimumDegree'
import { buildNodalSystem } from '../../../shared/solver/_lib/nodalSystem'
import { prepareNetwork } from '../../../shared/solver/_lib/prepareNetwork'
import type { CircuitElement } from '../../../shared/solver/circuit'
import { radialCircuit } from '../../helpers/radialCircuit'

function denseSolve(a: number[][], b: number[]): number[] {
  const n = b.length
  const m = a.map((row, i) => [...row, b[i]])
  for (let k = 0; k < n; k++) {
    let p = k
    for (let i = k + 1; i < n; i++) if (Math.abs(m[i][k]) > Math.abs(m[p][k])) p = i
    ;[m[k], m[p]] = [m[p], m[k]]
    for (let i = k + 1; i < n; i++) {
      const f = m[i][k] / m[k][k]
      for (let j = k; j <= n; j++) m[i][j] -= f * m[k][j]
    }
  }
  const x = new Array<number>(n).fill(0)
  for (let i = n - 1; i >= 0; i--) {
    let s = m[i][n]
    for (let j = i + 1; j < n; j++) s -= m[i][j] * x[j]
    x[i] = s / m[i][i]
  }
  return x
}

describe('sparse LDLᵀ on a minimum-degree order', () => {
  it('a star (bus bar with many branches) eliminates leaves first with no fill', () => {
    // Hub 0 joined to 1..5: leaves have degree 1 and go first, so L holds one entry per branch (5).
    const ptr = Int32Array.from([0, 5, 6, 7, 8, 9, 10])
    const idx = Int32Array.from([1, 2, 3, 4, 5, 0, 0, 0, 0, 0])
    const order = minimumDegreeOrder(6, ptr, idx)
    expect([...order.slice(0, 4)].every((node) => node !== 0)).toBe(true)
    const pinv = new Int32Array(6)
    order.forEach((node, k) => (pinv[node] = k))
    const ap = [0]
    const ai: number[] = []
    for (let c = 0; c < 6; c++) {
      for (let node = 0; node < 6; node++) {
        const joined = node === order[c] || (node === 0) !== (order[c] === 0)
        if (joined && pinv[node] <= c) ai.push(pinv[node])
      }
      ap.push(ai.length)
    }
    expect(ldlSymbolic(6, Int32Array.from(ap), Int32Array.from(ai)).lp[6]).toBe(5)
  })

  it('solves random conductance matrices like dense elimination', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 25 }).chain((n) =>
          fc.tuple(
            fc.constant(n),
            fc.array(fc.tuple(fc.nat(n - 1), fc.nat(n - 1), fc.double({ min: 1e-3, max: 1e3, noNaN: true })), { maxLength: 3 * n }),
            fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: n, maxLength: n }),
          ),
        ),
        ([n, edges, b]) => {
          // Conductance matrix: every node grounded by 1 S plus random branches: positive definite.
          const a = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)))
          const neighbours: number[][] = Array.from({ length: n }, () => [])
          for (const [i, j, g] of edges) {
            if (i === j) continue
            a[i][i] += g
            a[j][j] += g
            a[i][j] -= g
            a[j][i] -= g
            neighbours[i].push(j)
            neighbours[j].push(i)
          }
          const ptr = new Int32Array(n + 1)
          neighbours.forEach((list, i) => (ptr[i + 1] = ptr[i] + list.length))
          const order = minimumDegreeOrder(n, ptr, Int32Array.from(neighbours.flat()))
          expect([...order].sort((x, y) => x - y)).toEqual([...Array(n).keys()])
          // Permuted upper triangle in CSC.
          const ap = [0]
          const ai: number[] = []
          const ax: number[] = []
          for (let c = 0; c < n; c++) {
            for (let r = 0; r <= c; r++) {
              const v = a[order[r]][order[c]]
              if (v !== 0 || r === c) {
                ai.push(r)
                ax.push(v)
              }
            }
            ap.push(ai.length)
          }
          const symbolic = ldlSymbolic(n, Int32Array.from(ap), Int32Array.from(ai))
          const factor = createFactor(symbolic)
          const scale = Float64Array.from(order, (o) => Math.abs(a[o][o]))
          expect(ldlNumeric(factor, Int32Array.from(ap), Int32Array.from(ai), Float64Array.from(ax), scale)).toBe(-1)
          const x = Float64Array.from(order, (o) => b[o])
          ldlSolve(factor, x)
          const expected = denseSolve(a, b)
          order.forEach((o, k) => expect(x[k]).toBeCloseTo(expected[o], 9))
        },
      ),
      { numRuns: 200 },
    )
  })
})

describe('fill on radial networks (why the cost grows about linearly)', () => {
  it('a random tree of conductors factors with no fill at all: nnz(L) = branches between unknowns', () => {
    fc.assert(
      fc.property(fc.array(fc.nat(), { minLength: 1, maxLength: 200 }), (parents) => {
        // Node k + 1 hangs from a random earlier node; node 0 is the battery negative (reference).
        const n = parents.length + 1
        const elements: CircuitElement[] = [{ kind: 'vsource', id: 'bat', pos: 1 % n, neg: 0, voltageV: 12, resistanceOhm: 0.01 }]
        parents.forEach((p, k) => elements.push({ kind: 'resistor', id: `w${k}`, a: p % (k + 1), b: k + 1, resistanceOhm: 0.01 }))
        const prepared = prepareNetwork({ nodeCount: n, elements }, () => true)
        const system = buildNodalSystem(n, elements, prepared.active, prepared.isUnknown)
        const branchesBetweenUnknowns = parents.filter((p, k) => p % (k + 1) !== 0).length
        expect(system.factor.symbolic.lp[system.n]).toBe(branchesBetweenUnknowns)
      }),
      { numRuns: 200 },
    )
  })

  it('generated radial systems with meshed returns keep nnz(L) within 3 × the node count', () => {
    for (const loads of [100, 1000, 5000]) {
      const circuit = radialCircuit({ loads, seed: 3 })
      const prepared = prepareNetwork(circuit, (el) => el.kind !== 'isource')
      const system = buildNodalSystem(circuit.nodeCount, circuit.elements, prepared.active, prepared.isUnknown)
      expect(system.factor.symbolic.lp[system.n]).toBeLessThan(3 * circuit.nodeCount)
    }
  })
})
