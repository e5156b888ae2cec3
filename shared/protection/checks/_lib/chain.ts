import type { ProtectionDevice } from '../types'

/** Devices towards the source from `device`, nearest first; stops at an unknown id or a loop. */
export function upstreamChain(device: ProtectionDevice, byId: ReadonlyMap<string, ProtectionDevice>): ProtectionDevice[] {
  const chain: ProtectionDevice[] = []
  const seen = new Set([device.id])
  let next = device.upstreamId
  while (next !== undefined && !seen.has(next)) {
    const up = byId.get(next)
    if (!up) break
    chain.push(up)
    seen.add(next)
    next = up.upstreamId
  }
  return chain
}

/**
 * The nearest device towards the source from `device` that passes `test`, as
 * `upstreamChain(device, byId).find(test)` gives it, without building the chain: a loop is cut at
 * `device` itself and by a step bound (a loop further up only repeats devices already tested).
 */
export function findUpstream(
  device: ProtectionDevice, byId: ReadonlyMap<string, ProtectionDevice>, test: (up: ProtectionDevice) => boolean,
): ProtectionDevice | undefined {
  let next = device.upstreamId
  for (let steps = 0; next !== undefined && next !== device.id && steps <= byId.size; steps++) {
    const up = byId.get(next)
    if (!up) return undefined
    if (test(up)) return up
    next = up.upstreamId
  }
  return undefined
}

export function partIdOf(device: ProtectionDevice): string {
  return device.partId ?? device.id
}

/** Usable positive current, or undefined. */
export function positive(value: number | undefined): number | undefined {
  return typeof value === 'number' && Number.isFinite(value) && value > 0 ? value : undefined
}
