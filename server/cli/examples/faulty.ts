import { makeConductor, makePart } from '../../../shared/design/builder'
import type { Design, DesignSettings } from '../../../shared/design/schema'

// Two example files that must NOT pass: one fails validation field by field, the other is a
// valid document describing a circuit that cannot be solved (a load wired to nothing).

/** Invalid on purpose; each mistake is listed with the path parseDesign must report. */
export const BAD_DESIGN_EXPECTED_PATHS = [
  'name', // empty
  'settings.nominalVoltageV', // 36 V is not a system voltage we support
  'settings.profile', // not marine, vehicle or building
  'parts[0].params.capacityAh', // negative
  'parts[1].type', // no such part type
  'parts[2].params.hoursPerDay', // more than 24 h
  'conductors[0].sizeId', // 7 AWG is not offered
  'conductors[0].lengthM', // zero length
  'scenarios', // none
] as const

export function badDesign(): unknown {
  return {
    format: 'ampwright.design', version: 1, id: 'bad-design', name: '',
    settings: { nominalVoltageV: 36, unitSystem: 'metric', profile: 'spaceship', defaultAmbientC: 30 },
    parts: [
      { id: 'bank', type: 'battery', label: 'Bank', position: { x: 100, y: 300 },
        params: { chemistry: 'lfp', nominalVoltageV: 12.8, capacityAh: -100, internalResistanceOhm: 0.004, seriesCount: 1, parallelCount: 1 } },
      { id: 'mystery', type: 'flux-capacitor', label: 'Unknown part', position: { x: 400, y: 300 }, params: {} },
      { id: 'lamp', type: 'load', label: 'Lamp', position: { x: 700, y: 300 },
        params: { model: 'power', powerW: 10, duty: 'continuous', critical: false, hoursPerDay: 30 } },
    ],
    conductors: [
      { id: 'c1', label: 'Lamp feed', from: { partId: 'bank', terminal: 'pos' }, to: { partId: 'lamp', terminal: 'pos' },
        sizeId: 'awg-7', lengthM: 0 },
    ],
    scenarios: [],
  }
}

const SETTINGS: DesignSettings = { nominalVoltageV: 12, unitSystem: 'metric', profile: 'marine', defaultAmbientC: 30 }

/** A fused cabin light that works, and a deck light placed on the canvas but never wired. */
export function floatingPart(): Design {
  return {
    format: 'ampwright.design', version: 1, id: 'floating-part', name: 'Unwired deck light',
    settings: SETTINGS,
    parts: [
      makePart(SETTINGS, 'battery', 'bank', 'House battery 12.8 V 100 Ah', { x: 100, y: 400 }, { nominalVoltageV: 12.8, seriesCount: 1,
        internalResistanceOhm: 0.006 }),
      makePart(SETTINGS, 'fuse', 'light-fuse', 'Cabin light fuse 5 A', { x: 400, y: 300 }, { ratingA: 5 }),
      makePart(SETTINGS, 'load', 'cabin-light', 'Cabin light', { x: 700, y: 300 }, { model: 'power', powerW: 12, hoursPerDay: 4 }),
      makePart(SETTINGS, 'load', 'deck-light', 'Deck light (not wired)', { x: 700, y: 600 }, { model: 'power', powerW: 20, hoursPerDay: 1 }),
    ],
    conductors: [
      makeConductor('feed', 'Battery + to fuse', 'bank.pos', 'light-fuse.line', 'awg-14', 0.2, { colour: 'red' }),
      makeConductor('light-pos', 'Cabin light +', 'light-fuse.load', 'cabin-light.pos', 'awg-16', 2, { colour: 'red' }),
      makeConductor('light-neg', 'Cabin light −', 'cabin-light.neg', 'bank.neg', 'awg-16', 2.2, { colour: 'yellow' }),
    ],
    scenarios: [
      { id: 'evening', name: 'Evening', sunOn: false, chargerOn: false,
        loads: { 'cabin-light': { on: true, level: 1 }, 'deck-light': { on: true, level: 1 } } },
    ],
  }
}
