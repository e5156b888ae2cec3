import { makeFinding } from '../../analysis/findings'
import type { Finding } from '../../analysis/types'
import { DEVICE_FAMILY_IDS, getDeviceFamily, standardRatingsA, type DeviceFamilyId } from '../ratings'
import { bandOfDevice, deviceBand, deviceNameOf, getTimeCurrentFamily, hasTimeCurrentModel } from '../timeCurrent'
import { amps, seconds } from './_lib/format'
import { partIdOf } from './_lib/chain'
import { unclearedFault } from './faultClearing'
import type { LoadStart, ProtectionDevice, ProtectionRule, ResolvedContext } from './types'

const RULE_ID = 'motor-start-nuisance-open'
const SOURCE =
  "Device minimum melting / opening time (the family's time-current band, or a library device's own datasheet points) against the load's start pulse; " +
  'motor inrush ~5–10 × running current for up to ~1 s (common practice)'

// Time-delay versions of the same physical size are tried first, so the holder can stay.
const SAME_SIZE_TIME_DELAY: Record<string, string> = {
  'cartridge-5x20-fast': 'cartridge-5x20-delay',
  'cartridge-6x32-fast': 'cartridge-6x32-delay',
}

function ratingsOf(familyId: string): readonly number[] {
  return (DEVICE_FAMILY_IDS as readonly string[]).includes(familyId) ? standardRatingsA(familyId as DeviceFamilyId) : []
}

/** The replacement carries the start and still clears the conductor's faults in time. */
function fits(device: ProtectionDevice, familyId: string, ratingA: number, pulse: Pulse, context: ResolvedContext): boolean {
  if (!(deviceBand(familyId, ratingA).minMeltS(pulse.currentA) > pulse.durationS)) return false
  // The replacement is a generic device of that family: a library device's own band no longer applies.
  return unclearedFault({ ...device, familyId, ratingA, customDevice: undefined }, context) === null
}

/**
 * Only suggest a family whose catalogued interrupting rating covers the fault at the device; a family
 * with no family-wide figure (per marking) is not suggested when the fault current is known.
 */
function interruptsFault(familyId: string, faultA: number | undefined): boolean {
  if (!(typeof faultA === 'number' && faultA > 0)) return true
  const rating = getDeviceFamily(familyId as DeviceFamilyId).interruptingRating
  return rating !== null && rating.currentA >= faultA
}

interface Pulse {
  currentA: number
  durationS: number
}

/** A time-delay family stocked at this rating that carries the pulse and still protects the conductor, same size first. */
function timeDelayAlternative(device: ProtectionDevice, pulse: Pulse, context: ResolvedContext): string | null {
  for (const familyId of timeDelayCandidates(device.familyId, device.ratingA)) {
    if (!interruptsFault(familyId, device.faultCurrentAtDeviceA)) continue
    if (fits(device, familyId, device.ratingA, pulse, context)) return familyId
  }
  return null
}

/**
 * The time-delay families (same size first) with a time-current model, stocked at `ratingA`, other
 * than `familyId`: catalogue constants, so listed once per family and rating, not per load start.
 */
function timeDelayCandidates(familyId: string, ratingA: number): readonly string[] {
  const key = `${familyId}|${ratingA}`
  let list = CANDIDATES.get(key)
  if (list) return list
  list = []
  const preferred = SAME_SIZE_TIME_DELAY[familyId]
  for (const id of [preferred, ...DEVICE_FAMILY_IDS]) {
    if (!id || id === familyId || !hasTimeCurrentModel(id)) continue
    const band = deviceBand(id, ratingA)
    // Thermal breakers ride through starts but cannot clear fast faults (see faultClearing.ts).
    if (!band.timeDelay || band.kind === 'thermal-breaker') continue
    if (!ratingsOf(id).includes(ratingA)) continue
    list.push(id)
  }
  if (CANDIDATES.size >= 2000) CANDIDATES.clear()
  CANDIDATES.set(key, list)
  return list
}
const CANDIDATES = new Map<string, string[]>()

/** The smallest higher rating of the same family, within what the conductor allows, that carries the pulse and still protects it. */
function nextRatingThatRides(device: ProtectionDevice, pulse: Pulse, context: ResolvedContext): number | null {
  const limitA = device.conductor?.maxDeviceRatingA
  if (limitA === undefined) return null
  for (const r of ratingsOf(device.familyId)) {
    if (r <= device.ratingA || r > limitA + 1e-9) continue
    if (fits(device, device.familyId, r, pulse, context)) return r
  }
  return null
}

function checkStart(device: ProtectionDevice, start: LoadStart, context: ResolvedContext): Finding | null {
  // Start data that are not finite positive numbers describe no pulse (the design schema rejects them).
  const usable = [start.runningCurrentA, start.inrushMultiple, start.startDurationS].every((v) => Number.isFinite(v) && v > 0)
  if (!usable) return null
  const band = bandOfDevice(device)
  const startA = (device.baseCurrentA ?? 0) + start.inrushMultiple * start.runningCurrentA
  const minOpenS = band.minMeltS(startA)
  if (minOpenS > start.startDurationS) return null
  const surelyOpens = band.maxClearS(startA) <= start.startDurationS
  const pulse = { currentA: startA, durationS: start.startDurationS }
  const alternative = timeDelayAlternative(device, pulse, context)
  const nextRating = nextRatingThatRides(device, pulse, context)
  const ideas = [
    alternative ? `use a time-delay device: ${getTimeCurrentFamily(alternative).label}, ${amps(device.ratingA)}` : null,
    nextRating
      ? device.customDevice
        ? `use a generic ${getTimeCurrentFamily(device.familyId).label} of the next rating the conductor allows that rides through: ${amps(nextRating)}`
        : `use the next rating the conductor allows that rides through: ${amps(nextRating)}`
      : null,
  ].filter(Boolean)
  return makeFinding({
    ruleId: RULE_ID,
    severity: surelyOpens ? 'error' : 'warning',
    title: surelyOpens ? 'Device opens on the start pulse' : 'Device may open on the start pulse',
    message:
      `Start of ${start.loadId}: ${amps(startA)} (${start.inrushMultiple} × ${amps(start.runningCurrentA)}` +
      `${device.baseCurrentA ? ` + ${amps(device.baseCurrentA)} of other loads` : ''}) for ${seconds(start.startDurationS)}. ` +
      `The device (${deviceNameOf(device, (id) => getTimeCurrentFamily(id).label)}, ${amps(device.ratingA)}) may open after ${seconds(minOpenS)}` +
      `${surelyOpens ? ` and is sure to open within ${seconds(band.maxClearS(startA))}` : ''}.`,
    partIds: [partIdOf(device), start.loadId],
    conductorIds: device.conductor ? [device.conductor.id] : [],
    measured: { value: start.startDurationS, unit: 's' },
    limit: { value: minOpenS, unit: 's' },
    source: `${SOURCE}; band: ${band.source}`,
    suggestion: ideas.length
      ? { text: capitalise(`${ideas.join('; or ')}.`) }
      : { text: 'Use a time-delay device or a soft-start; check the conductor allows a larger rating.' },
    scenarioId: context.scenarioId,
  })
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1)
}

export const motorStartRule: ProtectionRule = {
  ruleId: RULE_ID,
  requirement: 'The device must carry each load start (inrush × running current for its duration) without opening',
  source: SOURCE,
  run(device, context) {
    const findings: Finding[] = []
    for (const start of device.loadStarts ?? []) {
      const f = checkStart(device, start, context)
      if (f) findings.push(f)
    }
    return findings
  },
}
