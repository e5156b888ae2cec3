// Rule profiles: which installation practice the design follows. Only the parts the protection checks
// read are here; each setting names its source.

export type AutoResetPolicy = 'allowed' | 'motor-circuits-only' | 'not-allowed'

export interface RuleProfile {
  id: string
  label: string
  autoResetBreakers: AutoResetPolicy
  autoResetSource: string
}

export const RULE_PROFILES = {
  marine: {
    id: 'marine',
    label: 'Boats (ABYC E-11)',
    autoResetBreakers: 'motor-circuits-only',
    autoResetSource:
      'ABYC E-11 (recalled, unverified): branch breakers are manually reset and trip-free; automatic reset only as a motor\'s own overload protection',
  },
  vehicle: {
    id: 'vehicle',
    label: 'Vehicles and RVs (SAE practice)',
    autoResetBreakers: 'allowed',
    autoResetSource:
      'SAE J553 defines type I automatic-reset breakers for vehicle circuits (public abstract); use behind a fuse or manual breaker (common practice)',
  },
  'off-grid': {
    id: 'off-grid',
    label: 'Buildings and off-grid (NEC)',
    autoResetBreakers: 'not-allowed',
    autoResetSource: 'NEC (NFPA 70) 240.80: breakers trip-free and manually operable (recalled, unverified)',
  },
} as const satisfies Record<string, RuleProfile>

export type RuleProfileId = keyof typeof RULE_PROFILES

export function resolveProfile(profile: RuleProfileId | RuleProfile | undefined): RuleProfile {
  if (profile === undefined) return RULE_PROFILES.vehicle
  if (typeof profile === 'string') {
    const found = (RULE_PROFILES as Record<string, RuleProfile>)[profile]
    if (!found) throw new RangeError(`Unknown rule profile "${profile}". Known: ${Object.keys(RULE_PROFILES).join(', ')}`)
    return found
  }
  return profile
}
