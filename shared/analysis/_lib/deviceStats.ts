import type { Design } from '../../design/schema'
import type { ProtectionTopology } from '../protectionTopology'
import type { ConductorStats, DeviceStats, PvGroup } from '../rules/types'
import type { ProtectiveDevice } from './devices'
import { fmt } from './finite'
import type { IdLookup } from './idLookup'
import type { ScenarioSolve } from './solveScenario'
import { batteryMaxChargeV, pvMaxVoltageV } from './sourceModels'

/**
 * The devices a load's current passes through, nearest first: the device protecting the conductor on
 * its positive terminal, then each device upstream of that one.
 */
export function deviceChainOfPart(partId: string, design: Design, topology: ProtectionTopology, conductorsAt: IdLookup<Design['conductors']>): string[] {
  const chain: string[] = []
  const pos = (conductorsAt.get(partId) ?? []).find((c) => {
    const end = c.from.partId === partId ? c.from : c.to
    return end.terminal === 'pos' || end.terminal === 'bat-pos' || end.terminal === 'in-pos'
  })
  const first = pos ? topology.conductors.get(pos.id) : undefined
  let id = first?.protectedFrom === 'upstream' ? first.protectingDeviceId : null
  for (let guard = 0; id && guard < 64; guard++) {
    chain.push(id)
    id = topology.devices.get(id)?.upstreamDeviceId ?? null
  }
  return chain
}

/** Worst case per device over the solved scenarios, fault current and the highest voltage it sees. */
export function deviceStats(
  design: Design, devices: ProtectiveDevice[], solves: ScenarioSolve[], topology: ProtectionTopology,
  deviceFaultA: Float64Array, pvGroups: PvGroup[], conductorsAt: IdLookup<Design['conductors']>,
  conductors: ConductorStats[],
): DeviceStats[] {
  // Currents of intermittent loads (and everything during a motor start) do not count as continuous.
  const chains = new Map<number, string[]>() // part index → device chain
  design.parts.forEach((part, k) => {
    if (part.type === 'load' && part.params.duty === 'intermittent') chains.set(k, deviceChainOfPart(part.id, design, topology, conductorsAt))
  })
  const protects = new Map<string, string[]>()
  for (const { protection: t } of conductors) {
    if (!t.protectingDeviceId) continue
    const list = protects.get(t.protectingDeviceId) ?? []
    list.push(t.conductorId)
    protects.set(t.protectingDeviceId, list)
  }
  const battery = highestBatterySideVoltage(design)
  const arrayVoc = new Map<string, number>()
  for (const g of pvGroups) for (const a of g.arrays) arrayVoc.set(a.id, pvMaxVoltageV(a.params))
  const groupVoc = (arrayId: string | null) => {
    const g = pvGroups.find((group) => group.arrays.some((a) => a.id === arrayId))
    return Math.max(0, ...(g ? g.arrays : []).map((a) => arrayVoc.get(a.id) ?? 0))
  }

  // Per scenario, the intermittent current through each device: one pass over each load's chain.
  const intermittentByScenario = solves.map((s) => {
    const byDevice = new Map<string, number>()
    for (const [load, chain] of chains) {
      const amps = Math.abs(s.partCurrentA[load])
      if (amps > 0) for (const id of chain) byDevice.set(id, (byDevice.get(id) ?? 0) + amps)
    }
    return byDevice
  })

  return devices.map((device, index) => {
    let maxCurrentA = 0
    let maxScenarioId: string | null = null
    let continuousA = 0
    let continuousScenarioId: string | null = null
    solves.forEach((s, k) => {
      const amps = s.deviceCurrentA[index]
      if (amps > maxCurrentA) { maxCurrentA = amps; maxScenarioId = s.scenario.id }
      if (s.scenario.motorStart) return
      const intermittent = intermittentByScenario[k].get(device.id) ?? 0
      const continuous = Math.max(0, amps - intermittent)
      if (continuous > continuousA) { continuousA = continuous; continuousScenarioId = s.scenario.id }
    })
    const topo = topology.deviceList[index] ?? { deviceId: device.id, side: 'none' as const, distanceFromSourceM: null, upstreamDeviceId: null, sourcePartId: null }
    const pvVoc = topo.side === 'pv' ? groupVoc(topo.sourcePartId) : 0
    const onPv = pvVoc > 0
    return {
      device, maxCurrentA, maxScenarioId, continuousA, continuousScenarioId,
      faultCurrentA: onPv ? pvIscOfGroup(pvGroups, topo.sourcePartId) : deviceFaultA[index],
      topology: topo, protectsConductorIds: protects.get(device.id) ?? [],
      highestVoltageV: onPv ? pvVoc : battery.voltageV,
      highestVoltageBasis: onPv
        ? `PV open-circuit voltage at the record low temperature, ${fmt(pvVoc)} V (NEC 690.7(A)(1) coefficient method)`
        : battery.basis,
    }
  })
}

function pvIscOfGroup(pvGroups: PvGroup[], arrayId: string | null): number {
  const g = pvGroups.find((group) => group.arrays.some((a) => a.id === arrayId))
  return (g?.arrays ?? []).reduce((s, a) => s + a.params.moduleIscA * a.params.strings, 0)
}

/** Highest voltage on the battery side: the highest bank charge voltage or charger set-point. */
function highestBatterySideVoltage(design: Design): { voltageV: number; basis: string } {
  let voltageV: number = design.settings.nominalVoltageV
  let basis = `nominal system voltage ${voltageV} V`
  for (const part of design.parts) {
    if (part.type === 'battery') {
      const v = batteryMaxChargeV(part.params)
      if (v > voltageV) { voltageV = v; basis = `${part.label || part.id} at its highest charge voltage, ${fmt(v)} V (typical set-point, recalled)` }
    } else if (part.type === 'mains-charger' && part.params.outputVoltageV > voltageV) {
      voltageV = part.params.outputVoltageV
      basis = `${part.label || part.id} charge voltage, ${fmt(voltageV)} V`
    }
  }
  return { voltageV, basis }
}
