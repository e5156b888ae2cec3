import { chargingSourceProtectionRule, protectionDistanceRule, protectionMissingRule } from './protectionPresence'
import { conductorAmpacityRule } from './conductorAmpacity'
import { conductorPolarityRule, connectivityRule } from './connectivity'
import { deviceAboveAmpacityRule } from './deviceAboveAmpacity'
import { deviceBelowLoadRule } from './deviceBelowLoad'
import { deviceInterruptingRule } from './deviceInterrupting'
import { deviceVoltageRatingRule } from './deviceVoltageRating'
import { ignitionProtectionRule } from './ignitionProtection'
import { partRatingRule } from './partRating'
import { protectionCoordinationRule } from './protectionCoordination'
import { pvCircuitSizingRule } from './pvCircuitSizing'
import { pvControllerVoltageRule } from './pvControllerVoltage'
import { pvStringFusesRule } from './pvStringFuses'
import type { Rule } from './types'
import { voltageDropRule } from './voltageDrop'

/** Every check, in the order findings are produced (the merged list is sorted afterwards). */
export const RULES: readonly Rule[] = [
  conductorAmpacityRule,
  protectionMissingRule,
  protectionDistanceRule,
  chargingSourceProtectionRule,
  deviceAboveAmpacityRule,
  deviceBelowLoadRule,
  deviceVoltageRatingRule,
  deviceInterruptingRule,
  ignitionProtectionRule,
  voltageDropRule,
  pvControllerVoltageRule,
  pvCircuitSizingRule,
  pvStringFusesRule,
  partRatingRule,
  connectivityRule,
  conductorPolarityRule,
]

/** Time-current checks (motor starts, fault clearing, selectivity, automatic reset); on unless `coordination: false`. */
export const COORDINATION_RULES: readonly Rule[] = [protectionCoordinationRule]

export type { Rule, RuleContext } from './types'
