import { makeFinding } from '../../analysis/findings'
import type { Finding } from '../../analysis/types'
import { embeddedDeviceBand, hasTimeCurrentModel } from '../timeCurrent'
import { areaCmilOf } from '../withstand'
import { partIdOf } from './_lib/chain'
import { autoResetRule } from './autoReset'
import { faultClearingRule } from './faultClearing'
import { motorStartRule } from './motorStart'
import { resolveProfile } from './profiles'
import { selectivityRule } from './selectivity'
import type { ProtectionContext, ProtectionDevice, ProtectionRule, ResolvedContext } from './types'

export const PROTECTION_RULES: readonly ProtectionRule[] = [motorStartRule, faultClearingRule, selectivityRule, autoResetRule]

const INPUT_RULE = 'protection-input-invalid'

function inputFinding(device: ProtectionDevice, message: string, scenarioId: string | undefined): Finding {
  return makeFinding({
    ruleId: INPUT_RULE,
    severity: 'warning',
    title: 'Protection checks skipped for this device',
    message,
    partIds: [partIdOf(device)],
    conductorIds: device.conductor ? [device.conductor.id] : [],
    source: 'Input validation of the protection checks',
    scenarioId,
  })
}

const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v)

function problemWith(device: ProtectionDevice): string | null {
  if (!hasTimeCurrentModel(device.familyId)) return `${device.id}: no time-current model for device family "${device.familyId}".`
  if (!(isFiniteNumber(device.ratingA) && device.ratingA > 0)) {
    return `${device.id}: ratingA must be a positive number of amperes.`
  }
  if (device.customDevice) {
    const band = embeddedDeviceBand(device.customDevice)
    if (!band.ok) return `${device.id}: library device "${device.customDevice.name}": ${band.issues[0].path}: ${band.issues[0].message}`
  }
  const c = device.conductor
  if (c) {
    if (!isFiniteNumber(c.insulationRatingC)) return `${device.id}: conductor.insulationRatingC must be a temperature in °C.`
    if (c.operatingC !== undefined && !isFiniteNumber(c.operatingC)) return `${device.id}: conductor.operatingC must be a temperature in °C.`
    try {
      areaCmilOf(c)
    } catch (error) {
      return `${device.id}: conductor: ${(error as Error).message}`
    }
  }
  return null
}

/**
 * Runs every protection rule over every device and returns Finding-shaped results: motor starts,
 * fault clearing (with the thermal-breaker case), selectivity of series pairs and automatic-reset
 * breakers. Bad inputs become a 'protection-input-invalid' finding for that device, never a throw.
 * @example protectionChecks({ devices: [{ id: 'F1', familyId: 'blade-regular', ratingA: 15 }] }) // []
 */
export function protectionChecks(context: ProtectionContext): Finding[] {
  let profile
  try {
    profile = resolveProfile(context.profile)
  } catch (error) {
    return [
      makeFinding({
        ruleId: INPUT_RULE, severity: 'warning', title: 'Protection checks skipped',
        message: (error as Error).message, partIds: [], conductorIds: [],
        source: 'Input validation of the protection checks', scenarioId: context.scenarioId,
      }),
    ]
  }
  // Devices whose own data are unusable are left out of the chains too, so no rule meets them.
  const usable = new Map<string, ProtectionDevice>()
  const findings: Finding[] = []
  for (const device of context.devices) {
    const problem = problemWith(device)
    if (problem) findings.push(inputFinding(device, problem, context.scenarioId))
    else usable.set(device.id, device)
  }
  const resolved: ResolvedContext = { byId: usable, profile, scenarioId: context.scenarioId }
  for (const device of usable.values()) {
    for (const rule of PROTECTION_RULES) {
      try {
        findings.push(...rule.run(device, resolved))
      } catch (error) {
        // A bad conductor size or material surfaces here as a RangeError naming the field.
        findings.push(inputFinding(device, `${device.id} (${rule.ruleId}): ${(error as Error).message}`, context.scenarioId))
      }
    }
  }
  return findings
}
