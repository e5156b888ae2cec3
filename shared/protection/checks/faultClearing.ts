import { makeFinding } from '../../analysis/findings'
import type { Finding } from '../../analysis/types'
import { bandOfDevice } from '../timeCurrent'
import { ICEA_SOURCE, shortCircuitLimit, withstandI2tA2s, type WithstandOptions } from '../withstand'
import { amps, seconds } from './_lib/format'
import { findUpstream, partIdOf, positive } from './_lib/chain'
import type { ProtectionDevice, ProtectionRule, ResolvedContext } from './types'

const FAULT_RULE = 'fault-not-cleared-before-damage'
const THERMAL_RULE = 'thermal-breaker-sole-protection'
const SOURCE = `Device maximum clearing time (its time-current band) against the conductor's short-circuit withstand, ${ICEA_SOURCE}`
const THERMAL_SOURCE =
  'Common practice: a thermal (bimetal) breaker does not open faster than about 0.2 s, so it cannot be the only ' +
  `protection where the conductor must be cleared sooner; withstand by ${ICEA_SOURCE}`

interface Case {
  where: 'far end' | 'device terminals'
  currentA: number
  withstandS: number
  clearS: number
}

/** Each fault position the analysis gave: far end (smallest current) and device terminals (largest). */
function faultCases(device: ProtectionDevice): Case[] {
  const conductor = device.conductor
  if (!conductor) return []
  const farA = positive(device.faultCurrentFarEndA)
  const atDeviceA = positive(device.faultCurrentAtDeviceA)
  if (farA === undefined && atDeviceA === undefined) return []
  const limit = shortCircuitLimit({ insulationRatingC: conductor.insulationRatingC, insulation: conductor.insulation })
  const initialC = conductor.operatingC ?? conductor.insulationRatingC
  const band = bandOfDevice(device)
  // The conductor's I²t is the same for both positions: worked out once (withstand = I²t ÷ I², as
  // withstandTimeS does), without copying the conductor per case.
  // A conductor rated at or above its short-circuit limit has no margin at all: withstand 0 s.
  const i2tA2s = initialC >= limit.finalC ? 0 : withstandI2tA2s(withstandOptions(conductor, initialC, limit.finalC))
  const cases: Case[] = []
  const add = (where: Case['where'], currentA: number | undefined) => {
    if (currentA === undefined) return
    const withstandS = initialC >= limit.finalC ? 0 : i2tA2s / (currentA * currentA)
    // A current too small to give a finite adiabatic time (a vanishing fault) cannot damage the conductor.
    if (!Number.isFinite(withstandS)) return
    cases.push({ where, currentA, withstandS, clearS: band.maxClearS(currentA) })
  }
  add('far end', farA)
  add('device terminals', atDeviceA)
  return cases
}

/** The withstand inputs of a protected conductor (its area fields and material) at given temperatures. */
function withstandOptions(conductor: NonNullable<ProtectionDevice['conductor']>, initialC: number, finalC: number): WithstandOptions {
  return { sizeId: conductor.sizeId, areaCmil: conductor.areaCmil, areaMm2: conductor.areaMm2, material: conductor.material, initialC, finalC }
}

/** The first upstream device sure to clear `currentA` within `withinS`, if any (backup protection). */
function backupFor(device: ProtectionDevice, context: ResolvedContext, currentA: number, withinS: number) {
  return findUpstream(device, context.byId, (up) => bandOfDevice(up).maxClearS(currentA) < withinS)
}

/**
 * The fault position this device (and everything upstream of it) fails to clear before the conductor
 * reaches its limit — the one with the smallest margin (withstand ÷ clearing time) — or null.
 */
export function unclearedFault(device: ProtectionDevice, context: ResolvedContext): Case | null {
  // Asked per device and per time-delay alternative: a plain loop, the first of equal margins kept.
  let worst: Case | null = null
  for (const c of faultCases(device)) {
    if (c.clearS < c.withstandS || backupFor(device, context, c.currentA, c.withstandS)) continue
    if (!worst || c.withstandS / c.clearS < worst.withstandS / worst.clearS) worst = c
  }
  return worst
}

function run(device: ProtectionDevice, context: ResolvedContext): Finding[] {
  const conductor = device.conductor
  if (!conductor) return []
  const band = bandOfDevice(device)
  const failing = unclearedFault(device, context)
  if (!failing) return []
  const limit = shortCircuitLimit({ insulationRatingC: conductor.insulationRatingC, insulation: conductor.insulation })
  const floorS = band.floor?.timeS
  const thermal = band.kind === 'thermal-breaker' && floorS !== undefined && failing.withstandS < floorS
  const base = {
    severity: 'error' as const,
    partIds: [partIdOf(device)],
    conductorIds: [conductor.id],
    // "Never opens" has no finite number to show; the message says it in words.
    ...(Number.isFinite(failing.clearS) ? { measured: { value: failing.clearS, unit: 's' } } : {}),
    limit: { value: failing.withstandS, unit: 's' },
    scenarioId: context.scenarioId,
  }
  const faultText =
    `A fault at the ${failing.where} of ${conductor.id} draws ${amps(failing.currentA)}; the conductor reaches ` +
    `${limit.finalC} °C (${limit.insulation} insulation) after ${seconds(failing.withstandS)}`
  if (thermal) {
    return [
      makeFinding({
        ...base,
        ruleId: THERMAL_RULE,
        title: 'Thermal breaker is the only protection for a fault it cannot clear in time',
        message: `${faultText}, faster than the breaker can ever open (about ${seconds(floorS)}), and no device upstream clears it sooner.`,
        source: THERMAL_SOURCE,
        suggestion: { text: 'Add a fuse (or a breaker with a magnetic trip) that clears this fault in time, upstream or in place of the breaker; or use a larger conductor.' },
      }),
    ]
  }
  return [
    makeFinding({
      ...base,
      ruleId: FAULT_RULE,
      title: 'Fault not cleared before the conductor is damaged',
      message: `${faultText}; the device may take ${seconds(failing.clearS)} to clear it, and no device upstream clears it sooner.`,
      source: `${SOURCE}; band: ${band.source}; limit: ${limit.source}`,
      suggestion: { text: 'Use a faster device or a lower rating, or a larger conductor (longer withstand, and more fault current to open the device).' },
    }),
  ]
}

export const faultClearingRule: ProtectionRule = {
  ruleId: FAULT_RULE,
  requirement: "The protecting device (or one upstream) must clear the conductor's fault before the insulation's short-circuit limit",
  source: SOURCE,
  run,
}
