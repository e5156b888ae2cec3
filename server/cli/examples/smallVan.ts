import { mainDistribution, mainDistributionWires, makeConductor, makePart, wirePair, type ConductorOptions } from '../../../shared/design/builder'
import type { ParamsOf } from '../../../shared/design/catalogue'
import type { Conductor, Design, DesignSettings, PartType } from '../../../shared/design/schema'

// An invented 12 V camper van built to pass every check: short fat main runs, branch fuses at
// 125–150 % of their loads and within the conductors' ampacity, two PV strings (no string fuses
// needed, NEC 690.9), and critical loads within 3 % drop. The Class T main is 250 A (the 1/0 runs allow
// it): a 150 A one may melt after ≈ 4 ms at the ≈ 1.4 kA a short past a 40–50 A strip fuse draws, before
// that strip fuse has cleared (up to ≈ 17–26 ms), so the whole van would go dark for one branch fault.
// At 250 A the Class T may not melt before ≈ 33 ms there (selectivity by the shared/protection bands).

const SETTINGS: DesignSettings = { nominalVoltageV: 12, unitSystem: 'metric', profile: 'vehicle', defaultAmbientC: 30 }
const part = <T extends PartType>(type: T, id: string, label: string, x: number, y: number, params: Partial<ParamsOf<T>> = {}) =>
  makePart(SETTINGS, type, id, label, { x, y }, params)
const wire = (id: string, label: string, from: string, to: string, sizeId: Conductor['sizeId'], lengthM: number, options: ConductorOptions = {}) =>
  makeConductor(id, label, from, to, sizeId, lengthM, { colour: label.includes('−') ? 'black' : 'red', ...options })
/** Way `n` of the fuse panel out to a load and back to the panel's negative. */
const panelWay = (n: number, id: string, name: string, partId: string, sizeId: Conductor['sizeId'], lengthM: number) =>
  wirePair(wire, { id, name, partId, feed: `panel.out${n}`, ret: 'panel.neg', sizeId, lengthM })
const strip = (ratingA: number) => ({ family: 'strip-bolt-down' as const, ratingA, dcVoltageRatingV: 32, interruptingRatingA: 6000 }) // ~6 kA at 32 V DC (shared/protection/families.ts, recalled)

export function smallVan12V(): Design {
  return {
    format: 'ampwright.design', version: 1, id: 'small-van-12v', name: 'Small camper van, 12 V',
    settings: SETTINGS,
    parts: [
      part('pv-array', 'roof-array', 'Roof array, 2 × 1 module', 60, 80, { moduleVocV: 24.6, moduleIscA: 11.6, moduleVmpV: 20.5,
        moduleImpA: 10.7, vocTempCoeffPctPerC: -0.28, maxSeriesFuseA: 20, modulesPerString: 1, strings: 2, recordLowC: -15 }),
      part('charge-controller', 'mppt', 'MPPT controller 100 V / 30 A', 320, 80, { maxPvVoltageV: 100, maxPvCurrentA: 30,
        outputCurrentA: 30, efficiency: 0.97, mppt: true }),
      part('battery', 'house-bank', 'House battery LFP 12.8 V 100 Ah', 500, 420, { chemistry: 'lfp', nominalVoltageV: 12.8,
        capacityAh: 100, internalResistanceOhm: 0.006, seriesCount: 1, parallelCount: 1 }),
      ...mainDistribution(part, { x: 680, y: 280, negY: 560, mainFuseA: 250, switchLabel: 'Battery switch', busRatingA: 250, busStuds: 4 }),
      part('fuse', 'solar-fuse', 'Solar charge fuse 40 A', 856, 112, strip(40)),
      part('fuse', 'inverter-fuse', 'Inverter fuse 50 A', 1120, 120, strip(50)),
      part('inverter', 'inverter', 'Inverter 300 W', 1300, 80, { continuousW: 300, surgeW: 600, efficiency: 0.88 }),
      part('fuse', 'panel-fuse', 'Panel feed fuse 40 A', 1240, 272, strip(40)),
      part('fuse-panel', 'panel', 'Fuse panel', 1432, 400, { ratingA: 100, ways: 5, wayRatingsA: [10, 5, 10, 5, 5],
        family: 'blade-regular', dcVoltageRatingV: 32, interruptingRatingA: 1000 }),
      part('load', 'fridge', 'Compressor fridge', 1680, 260, { model: 'power', powerW: 45, duty: 'continuous', critical: false, hoursPerDay: 10 }),
      part('load', 'lights', 'Cabin lights', 1680, 380, { model: 'power', powerW: 24, duty: 'continuous', critical: false, hoursPerDay: 5 }),
      part('load', 'water-pump', 'Water pump', 1680, 500, { model: 'current', currentA: 6, duty: 'intermittent', critical: false,
        hoursPerDay: 0.3, start: { inrushMultiple: 3, durationS: 0.1 } }),
      part('load', 'fan', 'Roof vent fan', 1680, 620, { model: 'current', currentA: 2.5, duty: 'continuous', critical: false, hoursPerDay: 6 }),
      part('load', 'usb', 'USB & chargers', 1680, 740, { model: 'power', powerW: 20, duty: 'continuous', critical: false, hoursPerDay: 4 }),
    ],
    conductors: [
      wire('pv-pos', 'Array + to controller', 'roof-array.pos', 'mppt.pv-pos', 'awg-8', 4, { sheathed: true }),
      wire('pv-neg', 'Array − to controller', 'roof-array.neg', 'mppt.pv-neg', 'awg-8', 4, { sheathed: true }),
      wire('solar-feed', 'Bus to solar fuse', 'pos-bus.c', 'solar-fuse.line', 'awg-1/0', 0.1),
      wire('mppt-out-pos', 'Controller + from solar fuse', 'solar-fuse.load', 'mppt.bat-pos', 'awg-8', 1),
      wire('mppt-out-neg', 'Controller − to bus', 'mppt.bat-neg', 'neg-bus.c', 'awg-8', 1.2),
      ...mainDistributionWires(wire, { bankId: 'house-bank', bankName: 'Battery', sizeId: 'awg-1/0', lengthsM: [0.2, 0.3, 0.3, 0.3, 0.3] }),
      wire('inverter-feed', 'Bus to inverter fuse', 'pos-bus.b', 'inverter-fuse.line', 'awg-1/0', 0.1),
      wire('inverter-pos', 'Inverter +', 'inverter-fuse.load', 'inverter.pos', 'awg-6', 1),
      wire('inverter-neg', 'Inverter −', 'inverter.neg', 'neg-bus.b', 'awg-6', 1.2),
      wire('panel-feed', 'Bus to panel fuse', 'pos-bus.d', 'panel-fuse.line', 'awg-1/0', 0.1),
      wire('panel-pos', 'Panel feed +', 'panel-fuse.load', 'panel.in-pos', 'awg-8', 1.5),
      wire('panel-neg', 'Panel feed −', 'panel.in-neg', 'neg-bus.d', 'awg-8', 1.5),
      ...panelWay(1, 'fridge', 'Fridge', 'fridge', 'awg-12', 3),
      ...panelWay(2, 'lights', 'Lights', 'lights', 'awg-16', 3),
      ...panelWay(3, 'pump', 'Pump', 'water-pump', 'awg-14', 2),
      ...panelWay(4, 'fan', 'Fan', 'fan', 'awg-16', 2),
      ...panelWay(5, 'usb', 'USB', 'usb', 'awg-16', 1),
    ],
    scenarios: [
      { id: 'evening', name: 'Evening, all loads', sunOn: false, chargerOn: false,
        loads: { fridge: { on: true, level: 1 }, lights: { on: true, level: 1 }, 'water-pump': { on: true, level: 1 },
          fan: { on: true, level: 1 }, usb: { on: true, level: 1 }, inverter: { on: true, level: 1 } } },
      { id: 'noon', name: 'Noon, charging', sunOn: true, chargerOn: false,
        loads: { fridge: { on: true, level: 1 }, fan: { on: true, level: 1 } } },
      { id: 'pump-start', name: 'Pump start', sunOn: false, chargerOn: false, motorStart: true,
        loads: { fridge: { on: true, level: 1 }, 'water-pump': { on: true, level: 1 } } },
    ],
  }
}
