export { protectionChecks, PROTECTION_RULES } from './protectionChecks'
export { RULE_PROFILES, resolveProfile, type RuleProfile, type RuleProfileId, type AutoResetPolicy } from './profiles'
export type * from './types'
