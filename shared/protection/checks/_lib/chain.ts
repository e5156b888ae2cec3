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

export function partIdOf(device: ProtectionDevice): string {
  return device.partId ?? device.id
}

/** Usable positive current, or undefined. */
export function positive(value: number | undefined): number | undefined {
  return typeof value === 'number' && Number.isFinite(value) && value > 0 ? value : undefined
}
