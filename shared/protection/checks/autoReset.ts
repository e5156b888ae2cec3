import { makeFinding } from '../../analysis/findings'
import type { Finding } from '../../analysis/types'
import { partIdOf } from './_lib/chain'
import type { ProtectionDevice, ProtectionRule, ResolvedContext } from './types'

const RULE_ID = 'auto-reset-breaker-not-allowed'
const BACKUP_RULE = 'auto-reset-breaker-no-backup'
const AUTO_RESET_FAMILIES = new Set(['breaker-thermal-1'])
const TYPE_I = 'SAE J553 type I (automatic reset): recloses by itself after tripping (public abstract of SAE J553)'
const BACKUP_SOURCE = `${TYPE_I}; a summary of SAE J553-2022 advises using it behind a self-limiting means such as a main fuse`

/** Every start on the device is a motor's (the one place profiles may accept automatic reset). */
function servesOnlyMotors(device: ProtectionDevice): boolean {
  const starts = device.loadStarts ?? []
  return starts.length > 0 && starts.every((s) => s.isMotor === true)
}

function run(device: ProtectionDevice, context: ResolvedContext): Finding[] {
  if (!AUTO_RESET_FAMILIES.has(device.familyId)) return []
  const { profile } = context
  const allowed =
    profile.autoResetBreakers === 'allowed' || (profile.autoResetBreakers === 'motor-circuits-only' && servesOnlyMotors(device))
  const partIds = [partIdOf(device)]
  const conductorIds = device.conductor ? [device.conductor.id] : []
  if (!allowed) {
    const where = profile.autoResetBreakers === 'motor-circuits-only' ? ' except on motor circuits' : ''
    return [
      makeFinding({
        ruleId: RULE_ID,
        severity: 'error',
        title: 'Automatic-reset breaker not allowed here',
        message: `${device.id} is an automatic-reset (type I) breaker; the ${profile.label} profile does not allow them${where}. A reclosing breaker keeps feeding a persistent fault.`,
        partIds,
        conductorIds,
        source: `${profile.autoResetSource}; ${TYPE_I}`,
        suggestion: { text: 'Use a manual-reset, trip-free breaker (SAE J553 type III) or a fuse.' },
        scenarioId: context.scenarioId,
      }),
    ]
  }
  if (device.upstreamId === undefined) {
    return [
      makeFinding({
        ruleId: BACKUP_RULE,
        severity: 'warning',
        title: 'Automatic-reset breaker without a fuse upstream',
        message: `${device.id} recloses by itself after a trip and nothing upstream of it is on record to end a persistent fault.`,
        partIds,
        conductorIds,
        source: BACKUP_SOURCE,
        suggestion: { text: 'Place a fuse or a manual-reset breaker upstream, or use a type III breaker.' },
        scenarioId: context.scenarioId,
      }),
    ]
  }
  return []
}

export const autoResetRule: ProtectionRule = {
  ruleId: RULE_ID,
  requirement: 'Automatic-reset (type I) breakers only where the rule profile allows them, and behind other protection',
  source: TYPE_I,
  run,
}
