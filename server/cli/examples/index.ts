import { createDemoDesign } from '../../../shared/design/demo'
import { badDesign, floatingPart } from './faulty'
import { sailboat24V } from './sailboat'
import { smallVan12V } from './smallVan'
import { libraryDevicePump } from './libraryDevice'
import { autoResetBreaker, motorStartNuisance, notSelective, slowFaultClearing, thermalBreakerOnly } from './timeCurrent'

/** Every file in examples/ and the code that produces it (server/cli/write-examples.ts writes them). */
export const EXAMPLE_FILES: Record<string, () => unknown> = {
  'demo-expedition-truck.json': createDemoDesign,
  'small-van-12v.json': smallVan12V,
  'sailboat-24v.json': sailboat24V,
  'bad-design.json': badDesign,
  'floating-part.json': floatingPart,
  // One per time-current finding (shared/protection/checks), each with the rule it must trigger.
  'motor-start-nuisance.json': motorStartNuisance,
  'slow-fault-clearing.json': slowFaultClearing,
  'thermal-breaker-only.json': thermalBreakerOnly,
  'not-selective.json': notSelective,
  'auto-reset-breaker.json': autoResetBreaker,
  // A fuse set to a device from an organisation's library (params.customDevice), analysed from the file alone.
  'library-device-pump.json': libraryDevicePump,
}

/** The rule each time-current example exists to show (tests/unit/cli/examples.test.ts checks it fires). */
export const TIME_CURRENT_EXAMPLE_RULES: Record<string, string> = {
  'motor-start-nuisance.json': 'motor-start-nuisance-open',
  'slow-fault-clearing.json': 'fault-not-cleared-before-damage',
  'thermal-breaker-only.json': 'thermal-breaker-sole-protection',
  'not-selective.json': 'not-selective',
  'auto-reset-breaker.json': 'auto-reset-breaker-not-allowed',
}
