import { mainDistribution, mainDistributionWires, makeConductor, makePart, wirePair, type ConductorOptions, type WireMaker } from './builder'
import type { ParamsOf } from './catalogue'
import { newId } from './ids'
import type { Conductor, Design, DesignSettings, Part, PartType, Scenario } from './schema'
import { DESIGN_FORMAT_ID, DESIGN_FORMAT_VERSION } from './version'

// Starting points for the editor: an empty design, and an invented demonstration system.

export interface EmptyDesignOptions {
  name: string
  nominalVoltageV: DesignSettings['nominalVoltageV']
  profile: DesignSettings['profile']
  unitSystem?: DesignSettings['unitSystem']
  id?: string
}

/** A design with no parts and one scenario, ready for the editor. */
export function createEmptyDesign(options: EmptyDesignOptions): Design {
  return {
    format: DESIGN_FORMAT_ID,
    version: DESIGN_FORMAT_VERSION,
    id: options.id ?? newId('design'),
    name: options.name,
    settings: {
      nominalVoltageV: options.nominalVoltageV,
      unitSystem: options.unitSystem ?? 'metric',
      profile: options.profile,
      defaultAmbientC: 30,
    },
    parts: [],
    conductors: [],
    scenarios: [{ id: 'normal-use', name: 'Normal use', sunOn: false, chargerOn: false, loads: {} }],
  }
}

const DEMO_SETTINGS: DesignSettings = { nominalVoltageV: 24, unitSystem: 'metric', profile: 'vehicle', defaultAmbientC: 30 }

const part = <T extends PartType>(type: T, id: string, label: string, x: number, y: number, params: Partial<ParamsOf<T>> = {}) =>
  makePart(DEMO_SETTINGS, type, id, label, { x, y }, params)
/** Demo conductors are tinned marine/automotive cable rated 105 °C; red for positive, black for negative runs. */
const wire = (id: string, label: string, from: string, to: string, sizeId: Conductor['sizeId'], lengthM: number,
  colour: 'red' | 'black', options: ConductorOptions = {}) =>
  makeConductor(id, label, from, to, sizeId, lengthM, { material: 'tinned-copper', colour, ...options })

/** `wire` with the colour read from the run: a negative run ("−" in its label, or ending at a negative terminal) is black. */
const byPolarity: WireMaker = (id, label, from, to, sizeId, lengthM, options) =>
  wire(id, label, from, to, sizeId, lengthM, label.includes('−') || /neg/.test(to) ? 'black' : 'red', options)
/** Way `n` of the fuse panel out to a load and back: red out, black back. */
const panelWay = (n: number, id: string, name: string, partId: string, sizeId: Conductor['sizeId'], lengthM: number, options?: ConductorOptions) =>
  wirePair(byPolarity, { id, name, partId, feed: `panel.out${n}`, ret: 'panel.neg', sizeId, lengthM, options })
const BUNDLED_4: ConductorOptions = { bundledCount: 4, installation: 'bundled' }

/** Bolt-down strip fuses: ~6 kA at 32 V DC, the figure in shared/protection/families.ts (recalled, unverified). */
const STRIP_FUSE_AIC_A = 6000

const on = (level = 1) => ({ on: true, level })

/**
 * An invented 24 V expedition truck: a 2 × 12.8 V LFP house bank with a Class T main fuse, switch and
 * shunt, bus bar pair, 6-way fuse panel, three roof PV strings into an MPPT controller, a DC-DC charger
 * from the cab's starter batteries, a 2 kW inverter and the habitation loads.
 *
 * Findings it is built to show (deliberate mistakes, checked by tests once analysis runs):
 * 1. The inverter fuse (100 A) is under-rated: at full output the inverter draws ≈ 87 A, and a fuse
 *    should be at least 125 % of the continuous current (≈ 109 A → next standard rating 110/125 A).
 * 2. The HF radio in the cab is a critical load (electronics: 3 % limit, ABYC E-11 / ISO 10133) at the
 *    end of a 7 m run of 16 AWG each way: ≈ 8 A × 2 × 0.092 Ω ≈ 1.5 V, about 6 % of 25.6 V.
 * Realistic extras an analysis may also raise: three PV strings in parallel without string fuses
 * (NEC 690.9), and blade-fuse interrupting rating (1 kA) below the bank's prospective fault current.
 */
export function createDemoDesign(): Design {
  const parts: Part[] = [
    part('pv-array', 'roof-array', 'Roof array, 3 × 2 modules', 60, 60, { moduleVocV: 24.6, moduleIscA: 11.6, moduleVmpV: 20.5,
      moduleImpA: 10.7, vocTempCoeffPctPerC: -0.28, maxSeriesFuseA: 20, modulesPerString: 2, strings: 3, recordLowC: -25 }),
    part('charge-controller', 'mppt', 'MPPT controller 100 V / 50 A', 320, 60, { maxPvVoltageV: 100, maxPvCurrentA: 40,
      outputCurrentA: 50, efficiency: 0.97, mppt: true }),
    part('battery', 'starter-batteries', 'Starter batteries 2 × 12 V', 60, 640, { chemistry: 'agm', nominalVoltageV: 12,
      capacityAh: 140, internalResistanceOhm: 0.005, seriesCount: 2, parallelCount: 1 }),
    part('fuse', 'dcdc-in-fuse', 'DC-DC feed fuse 50 A', 240, 640, { family: 'strip-bolt-down', ratingA: 50,
      dcVoltageRatingV: 32, interruptingRatingA: STRIP_FUSE_AIC_A }),
    part('dc-dc-charger', 'dcdc', 'DC-DC charger 24/24 V 30 A', 432, 640, { outputCurrentA: 30, efficiency: 0.92, inputMinV: 26 }),
    part('battery', 'house-bank', 'House bank LFP 2 × 12.8 V 200 Ah', 560, 400, { chemistry: 'lfp', nominalVoltageV: 12.8,
      capacityAh: 200, internalResistanceOhm: 0.003, seriesCount: 2, parallelCount: 1 }),
    ...mainDistribution(part, { x: 720, y: 260, negY: 560, mainFuseA: 300, switchLabel: 'Battery switch', busRatingA: 300, busStuds: 6 }),
    part('fuse', 'solar-fuse', 'Solar charge fuse 60 A', 896, 96, { family: 'strip-bolt-down', ratingA: 60, dcVoltageRatingV: 32,
      interruptingRatingA: STRIP_FUSE_AIC_A }),
    part('fuse', 'dcdc-out-fuse', 'DC-DC output fuse 40 A', 896, 416, { family: 'strip-bolt-down', ratingA: 40,
      dcVoltageRatingV: 32, interruptingRatingA: STRIP_FUSE_AIC_A }),
    // Finding 1: 100 A is below 125 % of the inverter's ≈ 87 A full-load draw.
    part('fuse', 'inverter-fuse', 'Inverter fuse 100 A', 1184, 96, { family: 'strip-bolt-down', ratingA: 100,
      dcVoltageRatingV: 32, interruptingRatingA: STRIP_FUSE_AIC_A }),
    part('inverter', 'inverter', 'Inverter 2 kW', 1376, 64, { continuousW: 2000, surgeW: 4000, efficiency: 0.9 }),
    part('fuse', 'panel-fuse', 'Panel feed fuse 60 A', 1344, 256, { family: 'strip-bolt-down', ratingA: 60, dcVoltageRatingV: 32,
      interruptingRatingA: STRIP_FUSE_AIC_A }),
    part('fuse-panel', 'panel', 'Habitation fuse panel', 1536, 384, { ratingA: 100, ways: 6, wayRatingsA: [10, 10, 15, 10, 10, 5],
      family: 'blade-regular', dcVoltageRatingV: 32, interruptingRatingA: 1000 }),
    part('load', 'fridge', 'Compressor fridge', 1792, 224, { model: 'power', powerW: 55, duty: 'continuous', critical: false,
      hoursPerDay: 10, start: { inrushMultiple: 3.5, durationS: 0.5 } }),
    part('load', 'lights', 'Cabin lights', 1792, 344, { model: 'power', powerW: 40, duty: 'continuous', critical: false, hoursPerDay: 5 }),
    part('load', 'water-pump', 'Water pump', 1792, 464, { model: 'current', currentA: 5, duty: 'intermittent', critical: false,
      hoursPerDay: 0.3, start: { inrushMultiple: 6, durationS: 0.3 } }),
    part('load', 'heater', 'Diesel air heater', 1792, 584, { model: 'power', powerW: 40, duty: 'continuous', critical: false, hoursPerDay: 8 }),
    // Finding 2: critical load at the end of a long, thin run (see the radio conductors below).
    part('load', 'radio', 'HF radio & GPS (cab)', 1792, 704, { model: 'current', currentA: 8, duty: 'intermittent', critical: true,
      hoursPerDay: 2 }),
    part('load', 'usb', 'USB & chargers', 1792, 824, { model: 'power', powerW: 30, duty: 'continuous', critical: false, hoursPerDay: 4 }),
  ]

  const conductors: Conductor[] = [
    wire('pv-pos', 'Array + to controller', 'roof-array.pos', 'mppt.pv-pos', 'awg-6', 6, 'red', { sheathed: true }),
    wire('pv-neg', 'Array − to controller', 'roof-array.neg', 'mppt.pv-neg', 'awg-6', 6, 'black', { sheathed: true }),
    wire('mppt-out-pos', 'Controller + to solar fuse', 'solar-fuse.load', 'mppt.bat-pos', 'awg-6', 1.5, 'red'),
    wire('solar-feed', 'Bus to solar fuse', 'pos-bus.d', 'solar-fuse.line', 'awg-2/0', 0.1, 'red'),
    wire('mppt-out-neg', 'Controller − to bus', 'mppt.bat-neg', 'neg-bus.d', 'awg-6', 1.7, 'black'),
    wire('start-pos', 'Starter + to DC-DC fuse', 'starter-batteries.pos', 'dcdc-in-fuse.line', 'awg-6', 0.3, 'red', { sheathed: true }),
    wire('dcdc-in-pos', 'DC-DC feed from cab', 'dcdc-in-fuse.load', 'dcdc.in-pos', 'awg-6', 5.5, 'red', { sheathed: true }),
    wire('dcdc-in-neg', 'DC-DC return to cab', 'dcdc.in-neg', 'starter-batteries.neg', 'awg-6', 5.8, 'black', { sheathed: true }),
    wire('dcdc-out-pos', 'DC-DC output to fuse', 'dcdc.out-pos', 'dcdc-out-fuse.load', 'awg-8', 1.2, 'red'),
    wire('dcdc-out-feed', 'Bus to DC-DC fuse', 'pos-bus.e', 'dcdc-out-fuse.line', 'awg-2/0', 0.1, 'red'),
    wire('dcdc-out-neg', 'DC-DC output −', 'dcdc.out-neg', 'neg-bus.e', 'awg-8', 1.4, 'black'),
    ...mainDistributionWires(byPolarity, { bankId: 'house-bank', bankName: 'Bank', sizeId: 'awg-2/0', lengthsM: [0.2, 0.4, 0.5, 0.3, 0.4],
      shuntLabel: 'Shunt to negative bus' }),
    wire('inverter-feed', 'Bus to inverter fuse', 'pos-bus.b', 'inverter-fuse.line', 'awg-2/0', 0.1, 'red'),
    wire('inverter-pos', 'Inverter +', 'inverter-fuse.load', 'inverter.pos', 'awg-2', 1.5, 'red'),
    wire('inverter-neg', 'Inverter −', 'inverter.neg', 'neg-bus.b', 'awg-2', 1.7, 'black'),
    wire('panel-feed', 'Bus to panel fuse', 'pos-bus.c', 'panel-fuse.line', 'awg-2/0', 0.1, 'red'),
    wire('panel-pos', 'Panel feed +', 'panel-fuse.load', 'panel.in-pos', 'awg-6', 1.2, 'red'),
    wire('panel-neg', 'Panel feed −', 'panel.in-neg', 'neg-bus.c', 'awg-6', 1.4, 'black'),
    ...panelWay(1, 'fridge', 'Fridge', 'fridge', 'awg-12', 3, BUNDLED_4),
    ...panelWay(2, 'lights', 'Lights', 'lights', 'awg-14', 4, BUNDLED_4),
    ...panelWay(3, 'pump', 'Pump', 'water-pump', 'awg-14', 2.5),
    ...panelWay(4, 'heater', 'Heater', 'heater', 'awg-14', 2),
    // Finding 2: 7 m of 16 AWG each way through the cab wall to the radio.
    wire('radio-pos', 'Radio + (to cab)', 'panel.out5', 'radio.pos', 'awg-16', 7, 'red', { sheathed: true }),
    wire('radio-neg', 'Radio − (from cab)', 'radio.neg', 'panel.neg', 'awg-16', 7, 'black', { sheathed: true }),
    ...panelWay(6, 'usb', 'USB', 'usb', 'awg-16', 1.5),
  ]

  const scenarios: Scenario[] = [
    { id: 'night-all-loads', name: 'Night, all loads', sunOn: false, chargerOn: false,
      loads: { fridge: on(), lights: on(), 'water-pump': on(), heater: on(), radio: on(), usb: on(), inverter: on(0.5) } },
    { id: 'noon-charging', name: 'Noon, charging', sunOn: true, chargerOn: false,
      loads: { fridge: on(), usb: on(), radio: on(), inverter: on(1) } },
    { id: 'pump-start', name: 'Pump start', sunOn: false, chargerOn: false, motorStart: true,
      loads: { fridge: on(), lights: on(), 'water-pump': on() } },
  ]

  return { format: DESIGN_FORMAT_ID, version: DESIGN_FORMAT_VERSION, id: 'demo-expedition-truck',
    name: 'Expedition truck, 24 V (demo)', settings: { ...DEMO_SETTINGS }, parts, conductors, scenarios }
}
