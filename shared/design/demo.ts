import { makeConductor, makePart, type ConductorOptions } from './builder'
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
    part('fuse', 'dcdc-in-fuse', 'DC-DC feed fuse 50 A', 220, 640, { family: 'strip-bolt-down', ratingA: 50,
      dcVoltageRatingV: 32, interruptingRatingA: STRIP_FUSE_AIC_A }),
    part('dc-dc-charger', 'dcdc', 'DC-DC charger 24/24 V 30 A', 400, 640, { outputCurrentA: 30, efficiency: 0.92, inputMinV: 26 }),
    part('battery', 'house-bank', 'House bank LFP 2 × 12.8 V 200 Ah', 560, 400, { chemistry: 'lfp', nominalVoltageV: 12.8,
      capacityAh: 200, internalResistanceOhm: 0.003, seriesCount: 2, parallelCount: 1 }),
    part('fuse', 'main-fuse', 'Main fuse Class T 300 A', 720, 260, { family: 'class-t', ratingA: 300, dcVoltageRatingV: 160,
      interruptingRatingA: 20000 }),
    part('battery-switch', 'main-switch', 'Battery switch', 860, 260, { ratingA: 300 }),
    part('shunt', 'shunt', 'Shunt 500 A / 50 mV', 720, 560, { ratingA: 500, resistanceOhm: 0.0001 }),
    part('bus-bar', 'pos-bus', 'Positive bus', 1000, 260, { ratingA: 300, polarity: 'positive', studs: 6 }),
    part('bus-bar', 'neg-bus', 'Negative bus', 1000, 560, { ratingA: 300, polarity: 'negative', studs: 6 }),
    part('fuse', 'solar-fuse', 'Solar charge fuse 60 A', 860, 100, { family: 'strip-bolt-down', ratingA: 60, dcVoltageRatingV: 32,
      interruptingRatingA: STRIP_FUSE_AIC_A }),
    part('fuse', 'dcdc-out-fuse', 'DC-DC output fuse 40 A', 860, 420, { family: 'strip-bolt-down', ratingA: 40,
      dcVoltageRatingV: 32, interruptingRatingA: STRIP_FUSE_AIC_A }),
    // Finding 1: 100 A is below 125 % of the inverter's ≈ 87 A full-load draw.
    part('fuse', 'inverter-fuse', 'Inverter fuse 100 A', 1140, 100, { family: 'strip-bolt-down', ratingA: 100,
      dcVoltageRatingV: 32, interruptingRatingA: STRIP_FUSE_AIC_A }),
    part('inverter', 'inverter', 'Inverter 2 kW', 1320, 60, { continuousW: 2000, surgeW: 4000, efficiency: 0.9 }),
    part('fuse', 'panel-fuse', 'Panel feed fuse 60 A', 1140, 300, { family: 'strip-bolt-down', ratingA: 60, dcVoltageRatingV: 32,
      interruptingRatingA: STRIP_FUSE_AIC_A }),
    part('fuse-panel', 'panel', 'Habitation fuse panel', 1260, 400, { ratingA: 100, ways: 6, wayRatingsA: [10, 10, 15, 10, 10, 5],
      family: 'blade-regular', dcVoltageRatingV: 32, interruptingRatingA: 1000 }),
    part('load', 'fridge', 'Compressor fridge', 1480, 240, { model: 'power', powerW: 55, duty: 'continuous', critical: false,
      hoursPerDay: 10, start: { inrushMultiple: 3.5, durationS: 0.5 } }),
    part('load', 'lights', 'Cabin lights', 1480, 350, { model: 'power', powerW: 40, duty: 'continuous', critical: false, hoursPerDay: 5 }),
    part('load', 'water-pump', 'Water pump', 1480, 460, { model: 'current', currentA: 5, duty: 'intermittent', critical: false,
      hoursPerDay: 0.3, start: { inrushMultiple: 6, durationS: 0.3 } }),
    part('load', 'heater', 'Diesel air heater', 1480, 570, { model: 'power', powerW: 40, duty: 'continuous', critical: false, hoursPerDay: 8 }),
    // Finding 2: critical load at the end of a long, thin run (see the radio conductors below).
    part('load', 'radio', 'HF radio & GPS (cab)', 1480, 680, { model: 'current', currentA: 8, duty: 'intermittent', critical: true,
      hoursPerDay: 2 }),
    part('load', 'usb', 'USB & chargers', 1480, 790, { model: 'power', powerW: 30, duty: 'continuous', critical: false, hoursPerDay: 4 }),
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
    wire('bank-pos', 'Bank + to main fuse', 'house-bank.pos', 'main-fuse.line', 'awg-2/0', 0.2, 'red', { sheathed: true }),
    wire('fuse-switch', 'Main fuse to switch', 'main-fuse.load', 'main-switch.a', 'awg-2/0', 0.4, 'red', { sheathed: true }),
    wire('switch-bus', 'Switch to positive bus', 'main-switch.b', 'pos-bus.a', 'awg-2/0', 0.5, 'red', { sheathed: true }),
    wire('bank-neg', 'Bank − to shunt', 'house-bank.neg', 'shunt.battery', 'awg-2/0', 0.3, 'black'),
    wire('shunt-bus', 'Shunt to negative bus', 'shunt.system', 'neg-bus.a', 'awg-2/0', 0.4, 'black'),
    wire('inverter-feed', 'Bus to inverter fuse', 'pos-bus.b', 'inverter-fuse.line', 'awg-2/0', 0.1, 'red'),
    wire('inverter-pos', 'Inverter +', 'inverter-fuse.load', 'inverter.pos', 'awg-2', 1.5, 'red'),
    wire('inverter-neg', 'Inverter −', 'inverter.neg', 'neg-bus.b', 'awg-2', 1.7, 'black'),
    wire('panel-feed', 'Bus to panel fuse', 'pos-bus.c', 'panel-fuse.line', 'awg-2/0', 0.1, 'red'),
    wire('panel-pos', 'Panel feed +', 'panel-fuse.load', 'panel.in-pos', 'awg-6', 1.2, 'red'),
    wire('panel-neg', 'Panel feed −', 'panel.in-neg', 'neg-bus.c', 'awg-6', 1.4, 'black'),
    wire('fridge-pos', 'Fridge +', 'panel.out1', 'fridge.pos', 'awg-12', 3, 'red', { bundledCount: 4, installation: 'bundled' }),
    wire('fridge-neg', 'Fridge −', 'fridge.neg', 'panel.neg', 'awg-12', 3, 'black', { bundledCount: 4, installation: 'bundled' }),
    wire('lights-pos', 'Lights +', 'panel.out2', 'lights.pos', 'awg-14', 4, 'red', { bundledCount: 4, installation: 'bundled' }),
    wire('lights-neg', 'Lights −', 'lights.neg', 'panel.neg', 'awg-14', 4, 'black', { bundledCount: 4, installation: 'bundled' }),
    wire('pump-pos', 'Pump +', 'panel.out3', 'water-pump.pos', 'awg-14', 2.5, 'red'),
    wire('pump-neg', 'Pump −', 'water-pump.neg', 'panel.neg', 'awg-14', 2.5, 'black'),
    wire('heater-pos', 'Heater +', 'panel.out4', 'heater.pos', 'awg-14', 2, 'red'),
    wire('heater-neg', 'Heater −', 'heater.neg', 'panel.neg', 'awg-14', 2, 'black'),
    // Finding 2: 7 m of 16 AWG each way through the cab wall to the radio.
    wire('radio-pos', 'Radio + (to cab)', 'panel.out5', 'radio.pos', 'awg-16', 7, 'red', { sheathed: true }),
    wire('radio-neg', 'Radio − (from cab)', 'radio.neg', 'panel.neg', 'awg-16', 7, 'black', { sheathed: true }),
    wire('usb-pos', 'USB +', 'panel.out6', 'usb.pos', 'awg-16', 1.5, 'red'),
    wire('usb-neg', 'USB −', 'usb.neg', 'panel.neg', 'awg-16', 1.5, 'black'),
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
