import { mainDistribution, mainDistributionWires, makeConductor, makePart, wirePair, type ConductorOptions } from '../../../shared/design/builder'
import type { ParamsOf } from '../../../shared/design/catalogue'
import type { Conductor, Design, DesignSettings, PartType } from '../../../shared/design/schema'

// An invented 24 V cruising sailboat with realistic mistakes for the checks to find:
// - the windlass breaker (150 A) is above the ampacity of its 6 AWG run (33 CFR 183.425 Table 5:
//   120 A at 105 °C), and the 9 m run to the bow drops several percent under load;
// - the bilge pump, a 3 % circuit (ISO 10133), sits at the end of 8 m of 16 AWG: ≈ 3.3 % drop.

const SETTINGS: DesignSettings = { nominalVoltageV: 24, unitSystem: 'metric', profile: 'marine', defaultAmbientC: 30 }
const part = <T extends PartType>(type: T, id: string, label: string, x: number, y: number, params: Partial<ParamsOf<T>> = {}) =>
  makePart(SETTINGS, type, id, label, { x, y }, params)
const wire = (id: string, label: string, from: string, to: string, sizeId: Conductor['sizeId'], lengthM: number, options: ConductorOptions = {}) =>
  makeConductor(id, label, from, to, sizeId, lengthM, { material: 'tinned-copper', colour: label.includes('−') ? 'yellow' : 'red', ...options })
/** Way `n` of the distribution panel out to a load and back to the panel's negative. */
const panelWay = (n: number, id: string, name: string, partId: string, sizeId: Conductor['sizeId'], lengthM: number, options?: ConductorOptions) =>
  wirePair(wire, { id, name, partId, feed: `panel.out${n}`, ret: 'panel.neg', sizeId, lengthM, options })
const strip = (ratingA: number) => ({ family: 'strip-bolt-down' as const, ratingA, dcVoltageRatingV: 32, interruptingRatingA: 6000 }) // ~6 kA at 32 V DC (shared/protection/families.ts, recalled)
const on = { on: true, level: 1 }

export function sailboat24V(): Design {
  return {
    format: 'ampwright.design', version: 1, id: 'sailboat-24v', name: 'Cruising sailboat, 24 V',
    settings: SETTINGS,
    parts: [
      part('pv-array', 'arch-array', 'Arch array, 1 × 2 modules', 60, 80, { moduleVocV: 24.6, moduleIscA: 11.6, moduleVmpV: 20.5,
        moduleImpA: 10.7, vocTempCoeffPctPerC: -0.28, maxSeriesFuseA: 20, modulesPerString: 2, strings: 1, recordLowC: -5 }),
      part('charge-controller', 'mppt', 'MPPT controller 100 V / 20 A', 320, 80, { maxPvVoltageV: 100, maxPvCurrentA: 20,
        outputCurrentA: 20, efficiency: 0.97, mppt: true }),
      part('mains-charger', 'shore-charger', 'Shore-power charger 25 A', 320, 700, { outputCurrentA: 25, outputVoltageV: 28.4 }),
      part('battery', 'house-bank', 'House bank LFP 25.6 V 200 Ah', 520, 420, { chemistry: 'lfp', nominalVoltageV: 25.6,
        capacityAh: 200, internalResistanceOhm: 0.005, seriesCount: 1, parallelCount: 1 }),
      ...mainDistribution(part, { x: 680, y: 280, negY: 560, mainFuseA: 250, switchLabel: 'House battery switch', busRatingA: 300, busStuds: 6 }),
      part('fuse', 'solar-fuse', 'Solar charge fuse 30 A', 856, 112, strip(30)),
      part('fuse', 'charger-fuse', 'Charger fuse 40 A', 820, 700, strip(40)),
      part('breaker', 'windlass-breaker', 'Windlass breaker 150 A', 1120, 120, { family: 'breaker-magnetic-hydraulic', ratingA: 150,
        dcVoltageRatingV: 65, interruptingRatingA: 5000 }),
      part('load', 'windlass', 'Anchor windlass (bow)', 1744, 64, { model: 'current', currentA: 80, duty: 'intermittent',
        critical: false, hoursPerDay: 0.1, start: { inrushMultiple: 2.5, durationS: 1 } }),
      part('fuse', 'panel-fuse', 'Panel feed fuse 60 A', 1304, 272, strip(60)),
      part('fuse-panel', 'panel', 'Distribution panel', 1488, 400, { ratingA: 100, ways: 6, wayRatingsA: [5, 10, 5, 10, 10, 5],
        family: 'blade-regular', dcVoltageRatingV: 32, interruptingRatingA: 1000 }),
      part('load', 'nav-lights', 'Navigation & anchor lights', 1744, 224, { model: 'power', powerW: 25, duty: 'continuous',
        critical: true, hoursPerDay: 10 }),
      part('load', 'bilge-pump', 'Bilge pump', 1744, 344, { model: 'current', currentA: 4, duty: 'intermittent', critical: true,
        hoursPerDay: 0.2, start: { inrushMultiple: 4, durationS: 0.2 } }),
      part('load', 'vhf', 'VHF radio', 1744, 464, { model: 'current', currentA: 1.5, duty: 'continuous', critical: true, hoursPerDay: 12 }),
      part('load', 'autopilot', 'Autopilot', 1744, 584, { model: 'current', currentA: 4, duty: 'continuous', critical: true, hoursPerDay: 6 }),
      part('load', 'fridge', 'Fridge', 1744, 704, { model: 'power', powerW: 50, duty: 'continuous', critical: false, hoursPerDay: 12 }),
      part('load', 'cabin-lights', 'Cabin lights', 1744, 824, { model: 'power', powerW: 30, duty: 'continuous', critical: false, hoursPerDay: 5 }),
    ],
    conductors: [
      wire('pv-pos', 'Array + to controller', 'arch-array.pos', 'mppt.pv-pos', 'awg-10', 5, { sheathed: true }),
      wire('pv-neg', 'Array − to controller', 'arch-array.neg', 'mppt.pv-neg', 'awg-10', 5, { sheathed: true }),
      wire('solar-feed', 'Bus to solar fuse', 'pos-bus.c', 'solar-fuse.line', 'awg-2/0', 0.1),
      wire('mppt-out-pos', 'Controller + from solar fuse', 'solar-fuse.load', 'mppt.bat-pos', 'awg-10', 1.5),
      wire('mppt-out-neg', 'Controller − to bus', 'mppt.bat-neg', 'neg-bus.c', 'awg-10', 1.7),
      wire('charger-feed', 'Bus to charger fuse', 'pos-bus.e', 'charger-fuse.line', 'awg-2/0', 0.1),
      wire('charger-pos', 'Charger +', 'charger-fuse.load', 'shore-charger.bat-pos', 'awg-8', 2),
      wire('charger-neg', 'Charger −', 'shore-charger.bat-neg', 'neg-bus.e', 'awg-8', 2.2),
      ...mainDistributionWires(wire, { bankId: 'house-bank', bankName: 'Bank', sizeId: 'awg-2/0', lengthsM: [0.15, 0.5, 0.6, 0.3, 0.5] }),
      wire('windlass-feed', 'Bus to windlass breaker', 'pos-bus.b', 'windlass-breaker.line', 'awg-2/0', 0.1),
      wire('windlass-pos', 'Windlass + (to bow)', 'windlass-breaker.load', 'windlass.pos', 'awg-6', 9, { sheathed: true }),
      wire('windlass-neg', 'Windlass − (from bow)', 'windlass.neg', 'neg-bus.b', 'awg-6', 9.3, { sheathed: true }),
      wire('panel-feed', 'Bus to panel fuse', 'pos-bus.d', 'panel-fuse.line', 'awg-2/0', 0.1),
      wire('panel-pos', 'Panel feed +', 'panel-fuse.load', 'panel.in-pos', 'awg-6', 1.5),
      wire('panel-neg', 'Panel feed −', 'panel.in-neg', 'neg-bus.d', 'awg-6', 1.7),
      ...panelWay(1, 'nav', 'Nav lights', 'nav-lights', 'awg-16', 6, { sheathed: true }),
      ...panelWay(2, 'bilge', 'Bilge pump', 'bilge-pump', 'awg-16', 8),
      ...panelWay(3, 'vhf', 'VHF', 'vhf', 'awg-16', 3),
      ...panelWay(4, 'autopilot', 'Autopilot', 'autopilot', 'awg-12', 6),
      ...panelWay(5, 'fridge', 'Fridge', 'fridge', 'awg-14', 3),
      ...panelWay(6, 'lights', 'Cabin lights', 'cabin-lights', 'awg-16', 4),
    ],
    scenarios: [
      { id: 'anchor-night', name: 'At anchor, night', sunOn: false, chargerOn: false,
        loads: { 'nav-lights': on, 'bilge-pump': on, vhf: on, fridge: on, 'cabin-lights': on } },
      { id: 'sailing-day', name: 'Sailing, daytime', sunOn: true, chargerOn: false,
        loads: { 'nav-lights': on, vhf: on, autopilot: on, fridge: on } },
      { id: 'marina', name: 'Marina, shore power', sunOn: false, chargerOn: true, loads: { fridge: on, 'cabin-lights': on } },
      { id: 'anchor-up', name: 'Weighing anchor', sunOn: false, chargerOn: false, motorStart: true,
        loads: { windlass: on, 'nav-lights': on, vhf: on, fridge: on } },
    ],
  }
}
