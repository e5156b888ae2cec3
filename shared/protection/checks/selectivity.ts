import { makeFinding } from '../../analysis/findings'
import type { Finding } from '../../analysis/types'
import { bandOfDevice, deviceNameOf, getTimeCurrentFamily } from '../timeCurrent'
import { amps, seconds } from './_lib/format'
import { partIdOf, positive, upstreamChain } from './_lib/chain'
import type { ProtectionDevice, ProtectionRule, ResolvedContext } from './types'

const RULE_ID = 'not-selective'
const SOURCE =
  'Selectivity by time-current bands: the downstream maximum clearing time must be below the upstream minimum ' +
  'melting time at the downstream fault current (IEC 60269-1 / IEC 60364-5-53 principle, recalled; bands per family, or a library device\'s own datasheet points)'

/** Fault currents a downstream fault draws through this device: at its terminals (largest) and far end. */
function downstreamFaultsA(device: ProtectionDevice): number[] {
  return [positive(device.faultCurrentAtDeviceA), positive(device.faultCurrentFarEndA)].filter((a): a is number => a !== undefined)
}

function run(device: ProtectionDevice, context: ResolvedContext): Finding[] {
  const faultsA = downstreamFaultsA(device)
  if (faultsA.length === 0) return []
  const down = bandOfDevice(device)
  const findings: Finding[] = []
  for (const up of upstreamChain(device, context.byId)) {
    const upBand = bandOfDevice(up)
    // The first fault position where the upstream device may open before the downstream one has cleared.
    // Neither opening is a fault-clearing problem (faultClearing.ts), not a selectivity one.
    const faultA = faultsA.find((a) => {
      const clear = down.maxClearS(a)
      const upMin = upBand.minMeltS(a)
      return !(clear < upMin) && !(clear === Infinity && upMin === Infinity)
    })
    if (faultA === undefined) continue
    const clearS = down.maxClearS(faultA)
    const upMinS = upBand.minMeltS(faultA)
    findings.push(
      makeFinding({
        ruleId: RULE_ID,
        severity: 'warning',
        title: 'Devices in series are not selective',
        message:
          `For a fault of ${amps(faultA)} below ${device.id}, it may take ${seconds(clearS)} to clear, but the upstream ` +
          `${up.id} (${deviceNameOf(up, (id) => getTimeCurrentFamily(id).label)}, ${amps(up.ratingA)}) may open after ${seconds(upMinS)}: ` +
          'the fault can take out more of the system than the faulty branch.',
        partIds: [partIdOf(device), partIdOf(up)],
        conductorIds: [],
        ...(Number.isFinite(clearS) ? { measured: { value: clearS, unit: 's' } } : {}),
        ...(Number.isFinite(upMinS) ? { limit: { value: upMinS, unit: 's' } } : {}),
        source: `${SOURCE}; downstream: ${down.source}; upstream: ${upBand.source}`,
        suggestion: { text: `Use a faster or lower-rated device at ${device.id}, or a time-delay or larger device at ${up.id}.` },
        scenarioId: context.scenarioId,
      }),
    )
  }
  return findings
}

export const selectivityRule: ProtectionRule = {
  ruleId: RULE_ID,
  requirement: 'A downstream device must clear a downstream fault before any device upstream of it starts to open',
  source: SOURCE,
  run,
}
