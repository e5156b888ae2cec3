import { z } from 'zod'
import { deviceFamilySchema } from './enums'
import { choice, flag, quantity } from './fields'
import { checkCustomDeviceFits, customDeviceSchema } from './customDevice'

// Parameters of each part type, in SI units named in the field (capacityAh, lengthM, dropV…).
// Limits are plausibility bounds for low-voltage DC systems, chosen to catch typing mistakes
// (a 4000 V battery, a 0 Ah bank), not engineering limits; engineering checks are findings.

/** Resistance of a closed fuse, breaker or switch when none is given: 1 mΩ, an order-of-magnitude
 * figure for a contact plus fuse element (recalled, unverified). Small beside any conductor run. */
export const DEFAULT_CONTACT_RESISTANCE_OHM = 0.001

const efficiency = quantity('efficiency', '', { min: 0.5, max: 1 })
const contactResistanceOhm = quantity('contact resistance', 'Ω', { min: 0, max: 1 }).default(
  DEFAULT_CONTACT_RESISTANCE_OHM,
)

export const BATTERY_CHEMISTRIES = ['lfp', 'agm', 'flooded', 'gel', 'nmc'] as const
export const batteryParamsSchema = z.object({
  chemistry: choice('battery chemistry', BATTERY_CHEMISTRIES),
  /** Per battery (unit) in the bank, e.g. 12.8 for an LFP module. */
  nominalVoltageV: quantity('nominal voltage per battery', 'V', { min: 1, max: 60 }),
  /** Per battery (unit). */
  capacityAh: quantity('capacity per battery', 'Ah', { min: 1, max: 5000 }),
  /** Per battery (unit), cells + links + any BMS switches. */
  internalResistanceOhm: quantity('internal resistance per battery', 'Ω', { min: 0.00001, max: 1 }),
  seriesCount: quantity('batteries in series', '', { min: 1, max: 32, int: true }),
  parallelCount: quantity('parallel strings', '', { min: 1, max: 32, int: true }),
  /** Open-circuit voltage per battery for the state of charge studied; nominal when absent. */
  stateOfChargeVoltageV: quantity('resting voltage per battery', 'V', { min: 1, max: 70 }).optional(),
})

export const pvArrayParamsSchema = z
  .object({
    moduleVocV: quantity('module open-circuit voltage', 'V', { min: 1, max: 100 }),
    moduleIscA: quantity('module short-circuit current', 'A', { min: 0.1, max: 30 }),
    moduleVmpV: quantity('module voltage at maximum power', 'V', { min: 1, max: 100 }),
    moduleImpA: quantity('module current at maximum power', 'A', { min: 0.1, max: 30 }),
    /** Negative, e.g. −0.28 %/°C. */
    vocTempCoeffPctPerC: quantity('Voc temperature coefficient', '%/°C', { min: -1, max: 0 }),
    maxSeriesFuseA: quantity('module maximum series fuse', 'A', { min: 1, max: 60 }),
    modulesPerString: quantity('modules per string', '', { min: 1, max: 30, int: true }),
    strings: quantity('strings in parallel', '', { min: 1, max: 20, int: true }),
    /** Lowest expected ambient at the site (NEC 690.7 informational note: ASHRAE extreme minimum). */
    recordLowC: quantity('record low temperature', '°C', { min: -60, max: 40 }),
  })
  .superRefine((p, ctx) => {
    if (p.moduleVmpV >= p.moduleVocV) {
      ctx.addIssue({ code: 'custom', path: ['moduleVmpV'], message: 'Voltage at maximum power must be below the open-circuit voltage' })
    }
    if (p.moduleImpA > p.moduleIscA) {
      ctx.addIssue({ code: 'custom', path: ['moduleImpA'], message: 'Current at maximum power must not exceed the short-circuit current' })
    }
  })

export const chargeControllerParamsSchema = z.object({
  maxPvVoltageV: quantity('maximum PV input voltage', 'V', { min: 10, max: 1000 }),
  maxPvCurrentA: quantity('maximum PV input current', 'A', { min: 1, max: 300 }),
  outputCurrentA: quantity('rated charge current', 'A', { min: 1, max: 300 }),
  efficiency,
  mppt: flag('MPPT', 'it tracks maximum power (MPPT)'),
})

export const dcDcChargerParamsSchema = z.object({
  outputCurrentA: quantity('rated output current', 'A', { min: 1, max: 200 }),
  efficiency,
  /** Below this input voltage the charger stops (alternator not running). */
  inputMinV: quantity('minimum input voltage', 'V', { min: 5, max: 60 }),
})

export const mainsChargerParamsSchema = z.object({
  outputCurrentA: quantity('rated output current', 'A', { min: 1, max: 300 }),
  outputVoltageV: quantity('charge voltage', 'V', { min: 5, max: 70 }),
})

export const inverterParamsSchema = z
  .object({
    continuousW: quantity('continuous output', 'W', { min: 1, max: 20000 }),
    surgeW: quantity('surge output', 'W', { min: 1, max: 60000 }),
    efficiency,
  })
  .superRefine((p, ctx) => {
    if (p.surgeW < p.continuousW) {
      ctx.addIssue({ code: 'custom', path: ['surgeW'], message: 'Surge output must be at least the continuous output' })
    }
  })

/** Bus bars have up to six studs, terminals 'a'…'f', all one electrical node. */
export const BUS_BAR_MAX_STUDS = 6
export const busBarParamsSchema = z.object({
  ratingA: quantity('current rating', 'A', { min: 1, max: 2000 }),
  polarity: choice('polarity', ['positive', 'negative'] as const),
  studs: quantity('number of studs', '', { min: 2, max: BUS_BAR_MAX_STUDS, int: true }),
})

/** A fuse panel holds its own branch fuses, one per way: way N feeds terminal `outN`. */
export const FUSE_PANEL_MAX_WAYS = 8
export const fusePanelParamsSchema = z
  .object({
    ratingA: quantity('panel current rating', 'A', { min: 1, max: 500 }),
    ways: quantity('number of ways', '', { min: 1, max: FUSE_PANEL_MAX_WAYS, int: true }),
    /** Fuse rating in each way, index 0 → out1. */
    wayRatingsA: z
      .array(quantity('way fuse rating', 'A', { min: 0.5, max: 100 }), { error: 'Enter the fuse rating of each way' })
      .min(1, 'Enter the fuse rating of each way')
      .max(FUSE_PANEL_MAX_WAYS, `A panel has at most ${FUSE_PANEL_MAX_WAYS} ways`)
      .meta({ label: 'Way fuse ratings', kind: 'list', unit: 'A' }),
    family: deviceFamilySchema,
    dcVoltageRatingV: quantity('way fuse DC voltage rating', 'V', { min: 1, max: 1500 }),
    interruptingRatingA: quantity('way fuse interrupting rating', 'A', { min: 1, max: 500000 }),
    ignitionProtected: flag('Ignition protected', 'the panel is ignition protected'),
    resistanceOhm: contactResistanceOhm,
  })
  .superRefine((p, ctx) => {
    if (p.wayRatingsA.length !== p.ways) {
      ctx.addIssue({ code: 'custom', path: ['wayRatingsA'], message: `Give one fuse rating per way (${p.ways} ways, ${p.wayRatingsA.length} ratings)` })
    }
  })

const protectiveDeviceShape = {
  family: deviceFamilySchema,
  ratingA: quantity('rating', 'A', { min: 0.5, max: 1000 }),
  dcVoltageRatingV: quantity('DC voltage rating', 'V', { min: 1, max: 1500 }),
  interruptingRatingA: quantity('interrupting rating', 'A', { min: 1, max: 500000 }),
  ignitionProtected: flag('Ignition protected', 'it is ignition protected'),
  closed: flag('Closed (not blown or tripped)', 'it is closed (not blown or tripped)').default(true),
  resistanceOhm: contactResistanceOhm,
}
/** A device from the organisation's library, copied in: its band replaces the family's (see customDevice.ts). */
const withLibraryDevice = { ...protectiveDeviceShape, customDevice: customDeviceSchema.optional() }
export const fuseParamsSchema = z.object(withLibraryDevice).superRefine((p, ctx) => checkCustomDeviceFits('fuse', p, ctx))
export const breakerParamsSchema = z.object(withLibraryDevice).superRefine((p, ctx) => checkCustomDeviceFits('breaker', p, ctx))

export const batterySwitchParamsSchema = z.object({
  closed: flag('On', 'the switch is on').default(true),
  ratingA: quantity('continuous rating', 'A', { min: 1, max: 2000 }),
  ignitionProtected: flag('Ignition protected', 'it is ignition protected'),
  resistanceOhm: contactResistanceOhm,
})

export const shuntParamsSchema = z.object({
  ratingA: quantity('current rating', 'A', { min: 1, max: 2000 }),
  /** E.g. 500 A / 50 mV → 0.0001 Ω. */
  resistanceOhm: quantity('resistance', 'Ω', { min: 0.000001, max: 0.1 }),
})

export const LOAD_MODELS = ['power', 'current', 'resistance'] as const
export const loadParamsSchema = z
  .object({
    model: choice('load model', LOAD_MODELS),
    powerW: quantity('power', 'W', { min: 0, max: 20000 }).optional(),
    currentA: quantity('current', 'A', { min: 0, max: 1000 }).optional(),
    resistanceOhm: quantity('resistance', 'Ω', { min: 0.001, max: 1e6 }).optional(),
    duty: choice('duty', ['continuous', 'intermittent'] as const),
    /** Critical loads are held to the 3 % voltage-drop limit (ABYC E-11; ISO 10133). */
    critical: flag('Critical (3 % drop limit)', 'the load is critical (3 % drop limit)'),
    hoursPerDay: quantity('hours per day', 'h', { min: 0, max: 24 }),
    start: z
      .object({
        inrushMultiple: quantity('inrush multiple', '×', { min: 1, max: 30 }),
        durationS: quantity('inrush duration', 's', { min: 0.001, max: 30 }),
      })
      .meta({ label: 'Motor start', kind: 'group' })
      .optional(),
  })
  .superRefine((p, ctx) => {
    const needed = { power: 'powerW', current: 'currentA', resistance: 'resistanceOhm' } as const
    const key = needed[p.model]
    if (p[key] === undefined) {
      const what = { power: 'power (W)', current: 'current (A)', resistance: 'resistance (Ω)' }[p.model]
      ctx.addIssue({ code: 'custom', path: [key], message: `Enter the ${what} for a constant-${p.model} load` })
    }
  })
