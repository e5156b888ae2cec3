import type { CircuitElement } from './circuit'
import { buildNodalSystem, reuseNodalSystem, type NodalSystem } from './_lib/nodalSystem'

/**
 * Matrix structure kept between solves of circuits on the same nodes: the scenarios of one design
 * differ only in which loads run and how hard, and its fault study has no loads at all, so one
 * fill-reducing order and one symbolic factorisation serve them all. Opaque; pass it as
 * `options.cache` to solveOperatingPoint and faultCurrents. A circuit whose structure is not
 * covered (other unknowns, a new conductance) is solved from scratch and becomes the kept one.
 * @example
 * const cache = createSolverCache()
 * const points = circuits.map((circuit) => solveOperatingPoint(circuit, { cache }))
 */
export function createSolverCache(): SolverCache {
  return { kept: null, reused: 0, built: 0 }
}

export interface SolverCache {
  kept: NodalSystem | null
  /** Solves that reused the kept structure, and that built their own (for benchmarks and tests). */
  reused: number
  built: number
}

/** The nodal system for a circuit: the cache's structure when it covers the circuit, else a new one. */
export function nodalSystemFor(
  cache: SolverCache | undefined,
  nodeCount: number,
  elements: CircuitElement[],
  stamps: Uint8Array,
  isUnknown: Uint8Array,
): NodalSystem {
  if (cache?.kept) {
    const reused = reuseNodalSystem(cache.kept, nodeCount, elements, stamps, isUnknown)
    if (reused) {
      cache.reused++
      return reused
    }
  }
  const system = buildNodalSystem(nodeCount, elements, stamps, isUnknown)
  if (cache) {
    cache.kept = system
    cache.built++
  }
  return system
}
