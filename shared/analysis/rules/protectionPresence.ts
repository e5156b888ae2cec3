import { fmt } from '../_lib/finite'
import { makeFinding } from '../findings'
import type { Finding } from '../types'
import type { Rule, RuleContext } from './types'

/**
 * How far a protective device may sit from the battery along the conductor (m), per profile:
 * unsheathed and sheathed/enclosed for the whole run.
 */
export const PROTECTION_DISTANCE_LIMITS = {
  marine: { bareM: 0.178, sheathedM: 1.83, source: 'ABYC E-11 §11.10: within 7 in (175 mm) of the battery, or 72 in (1.83 m) if sheathed or enclosed for the whole length' },
  vehicle: { bareM: 0.178, sheathedM: 1.83, source: 'ABYC E-11 §11.10 distances (7 in / 72 in sheathed) applied to vehicles: common practice' },
  building: { bareM: 0.178, sheathedM: 1.83, source: 'ABYC E-11 §11.10 distances (7 in / 72 in sheathed) used for battery conductors off-grid: common practice' },
} as const

/** ISO 13297: charging-source conductors protected within the source or within 1.8 m of it; self-limiting sources exempt. */
export const CHARGING_SOURCE_LIMIT_M = 1.8
const CHARGING_SOURCE = 'ISO 13297:2020+A1:2022: charging-source conductors protected within 1.8 m of the source; self-limiting sources exempt'

/** Every positive conductor fed by a battery needs a fuse or breaker at its source end. */
export const protectionMissingRule: Rule = {
  id: 'conductor-unprotected',
  title: 'Conductor without overcurrent protection',
  severity: 'error',
  source: PROTECTION_DISTANCE_LIMITS.marine.source,
  run(ctx) {
    const findings: Finding[] = []
    for (const s of ctx.conductors) {
      const p = s.protection
      if (p.side !== 'battery' || p.protectingDeviceId !== null) continue
      const battery = p.sourcePartId ? ctx.partById.get(p.sourcePartId) : undefined
      findings.push(makeFinding({
        ruleId: this.id, severity: 'error', title: this.title, partIds: battery ? [battery.id] : [], conductorIds: [s.conductor.id],
        message: `${s.conductor.label || s.conductor.id} is fed from ${battery?.label || 'a battery'} with no fuse or breaker between it and the battery. A short on it would be fed by the full bank.`,
        source: PROTECTION_DISTANCE_LIMITS[ctx.profile].source,
        suggestion: { text: `Add a fuse or breaker at the battery end of ${s.conductor.label || s.conductor.id}, rated not above its ampacity${s.ampacityA ? ` (${fmt(s.ampacityA)} A)` : ''}.` },
      }))
    }
    return findings
  },
}

/** The first device must sit within the distance limit of the battery (the run before it is unprotected). */
export const protectionDistanceRule: Rule = {
  id: 'protection-distance',
  title: 'Protective device too far from the source',
  severity: 'error',
  source: PROTECTION_DISTANCE_LIMITS.marine.source,
  run(ctx) {
    const limits = PROTECTION_DISTANCE_LIMITS[ctx.profile]
    const byDevice = new Map<string, { distanceM: number; limitM: number; conductorIds: string[] }>()
    for (const s of ctx.conductors) {
      const p = s.protection
      if (p.side !== 'battery' || p.protectedFrom !== 'downstream' || p.deviceDistanceM === null || !p.protectingDeviceId) continue
      const limitM = p.runSheathed ? limits.sheathedM : limits.bareM
      if (p.deviceDistanceM <= limitM + 1e-9) continue
      const entry = byDevice.get(p.protectingDeviceId) ?? { distanceM: p.deviceDistanceM, limitM, conductorIds: [] }
      entry.conductorIds.push(s.conductor.id)
      byDevice.set(p.protectingDeviceId, entry)
    }
    return [...byDevice].map(([deviceId, e]) => {
      const d = ctx.deviceById.get(deviceId)
      return makeFinding({
        ruleId: this.id, severity: 'error', title: this.title, partIds: [d?.device.partId ?? deviceId], conductorIds: e.conductorIds.sort(),
        message: `${d?.device.label ?? deviceId} is ${fmt(e.distanceM)} m of conductor from the battery; the run before it is unprotected and may be at most ${fmt(e.limitM)} m${e.limitM < limits.sheathedM ? ` (${fmt(limits.sheathedM)} m if sheathed or enclosed for its whole length)` : ''}.`,
        measured: { value: e.distanceM, unit: 'm' }, limit: { value: e.limitM, unit: 'm' }, source: limits.source,
        suggestion: { text: `Move ${d?.device.label ?? deviceId} to within ${fmt(e.limitM)} m of the battery terminal${e.limitM < limits.sheathedM ? ', or sheathe the run' : ''}.` },
      })
    })
  },
}

/** Conductors on a charger's output need protection within 1.8 m of it unless the charger cannot overload them. */
export const chargingSourceProtectionRule: Rule = {
  id: 'charging-source-protection',
  title: 'Charging-source conductor without protection near the charger',
  severity: 'error',
  source: CHARGING_SOURCE,
  run(ctx: RuleContext) {
    if (ctx.profile !== 'marine') return []
    const findings: Finding[] = []
    for (const part of ctx.design.parts) {
      if (part.type !== 'charge-controller' && part.type !== 'mains-charger' && part.type !== 'dc-dc-charger') continue
      const out = part.type === 'dc-dc-charger' ? 'out-pos' : 'bat-pos'
      const outputA = part.params.outputCurrentA
      for (const c of ctx.conductorsAtPart.get(part.id) ?? []) {
        const own = c.from.partId === part.id ? c.from : c.to
        if (own.terminal !== out) continue
        const other = c.from.partId === part.id ? c.to : c.from
        const otherType = ctx.partById.get(other.partId)?.type
        const deviceAtOtherEnd = otherType === 'fuse' || otherType === 'breaker' || (otherType === 'fuse-panel' && other.terminal.startsWith('out'))
        const s = ctx.conductorById.get(c.id)
        const selfLimiting = s?.ampacityA !== null && s?.ampacityA !== undefined && outputA <= s.ampacityA
        if (selfLimiting || (deviceAtOtherEnd && c.lengthM <= CHARGING_SOURCE_LIMIT_M)) continue
        findings.push(makeFinding({
          ruleId: this.id, severity: 'error', title: this.title, partIds: [part.id], conductorIds: [c.id],
          message: `${part.label || part.id} can push ${fmt(outputA)} A, more than ${c.label || c.id} carries (${fmt(s?.ampacityA ?? 0)} A), and no fuse or breaker sits within ${CHARGING_SOURCE_LIMIT_M} m of the charger on it.`,
          measured: { value: outputA, unit: 'A' }, limit: { value: s?.ampacityA ?? 0, unit: 'A' }, source: CHARGING_SOURCE,
          suggestion: { text: `Fit a fuse within ${CHARGING_SOURCE_LIMIT_M} m of the charger output, or enlarge the conductor to carry ${fmt(outputA)} A.` },
        }))
      }
    }
    return findings
  },
}
