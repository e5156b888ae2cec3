import { protectionChecks, RULE_PROFILES, type LoadStart, type ProtectionDevice, type RuleProfileId } from '../../protection/checks'
import { deviceChainOfPart } from '../_lib/deviceStats'
import { maxDeviceRating } from '../_lib/ocpdLimit'
import type { Finding } from '../types'
import type { ConductorStats, Rule, RuleContext } from './types'

/**
 * Time-current checks from shared/protection: motor starts ride through, faults at the far end of the
 * protected conductor clear before it is damaged (ICEA P-32-382 / IEC adiabatic limits), series
 * devices are selective, automatic-reset breakers are placed acceptably. The analysis supplies the
 * inputs it has worked out: fault currents, the weakest protected conductor, load starts, the chain.
 */
export const protectionCoordinationRule: Rule = {
  id: 'protection-coordination',
  title: 'Time-current coordination',
  severity: 'error',
  source: 'shared/protection time-current bands (ISO 8820-3, IEC 60127-2, UL 248-14, SAE J553) and conductor withstand (ICEA P-32-382, IEC 60949)',
  run(ctx) {
    const starts = loadStartsByDevice(ctx)
    const devices: ProtectionDevice[] = ctx.devices.map((d) => {
      // The weakest conductor the device protects (the first of equals), and the smallest far-end fault among them.
      let weakest: ConductorStats | undefined
      let farEndMinA = Infinity
      for (const id of d.protectsConductorIds) {
        const s = ctx.conductorById.get(id)
        if (!s) continue
        if (!weakest || (s.ampacityA ?? Infinity) < (weakest.ampacityA ?? Infinity)) weakest = s
        if (s.faultFarEndA > 0 && s.faultFarEndA < farEndMinA) farEndMinA = s.faultFarEndA
      }
      const maxRating = weakest?.ampacityA != null ? maxDeviceRating(weakest.conductor, weakest.ampacityA, ctx.profile, d.device.family)?.maxRatingA ?? undefined : undefined
      return {
        id: d.device.id, partId: d.device.partId, familyId: d.device.family, ratingA: d.device.ratingA, customDevice: d.device.customDevice,
        conductor: weakest ? {
          id: weakest.conductor.id, sizeId: weakest.conductor.sizeId, material: weakest.conductor.material,
          insulationRatingC: weakest.conductor.insulationRatingC, maxDeviceRatingA: maxRating,
        } : undefined,
        faultCurrentAtDeviceA: d.faultCurrentA > 0 ? d.faultCurrentA : undefined,
        faultCurrentFarEndA: farEndMinA < Infinity ? farEndMinA : undefined,
        baseCurrentA: d.continuousA > 1e-6 ? d.continuousA : 0, // solver round-off is not a load
        loadStarts: starts.get(d.device.id),
        upstreamId: d.topology.upstreamDeviceId ?? undefined,
      }
    })
    const profile: RuleProfileId = ctx.profile === 'building' ? 'off-grid' : ctx.profile in RULE_PROFILES ? (ctx.profile as RuleProfileId) : 'vehicle'
    const findings: Finding[] = protectionChecks({ devices, profile })
    return findings
  },
}

/** Loads with a start (inrush multiple and duration) on each device's chain. */
function loadStartsByDevice(ctx: RuleContext): Map<string, LoadStart[]> {
  const byDevice = new Map<string, LoadStart[]>()
  for (const part of ctx.design.parts) {
    if (part.type !== 'load' || !part.params.start) continue
    const runningCurrentA = ctx.loadRunningA.get(part.id) ?? 0
    if (!(runningCurrentA > 0)) continue
    const start: LoadStart = { loadId: part.id, runningCurrentA, inrushMultiple: part.params.start.inrushMultiple, startDurationS: part.params.start.durationS, isMotor: true }
    for (const id of deviceChainOfPart(part.id, ctx.design, ctx.topology, ctx.conductorsAtPart)) {
      const list = byDevice.get(id)
      if (list) list.push(start)
      else byDevice.set(id, [start])
    }
  }
  return byDevice
}
