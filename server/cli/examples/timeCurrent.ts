import { makeConductor, makePart } from '../../../shared/design/builder'
import type { ParamsOf } from '../../../shared/design/catalogue'
import type { Conductor, Design, DesignSettings, Part } from '../../../shared/design/schema'

// Small invented circuits, one per time-current finding (shared/protection/checks): a bank, a
// Class T main fuse beside it, a positive and a negative bus, and one branch — a device, its feed
// and a load. Each branch has one deliberate mistake; everything else is sized to pass, so the
// file shows its own finding and nothing else. Hand figures are in each builder's comment
// (ICEA P-32-382 withstand for copper, 105 °C start, 150 °C thermoplastic limit:
// t = 0.001607 · (A_cmil / I)²; bands from shared/protection/timeCurrent).

type Profile = DesignSettings['profile']
type DeviceParams = Partial<ParamsOf<'fuse'>>
type LoadParams = Partial<ParamsOf<'load'>>

export interface Branch {
  id: string
  name: string
  profile: Profile
  /** Bank internal resistance, Ω: sets the prospective fault current (12.8 V / R). */
  bankOhm: number
  mainA: number
  device: { type: 'fuse' | 'breaker'; label: string; params: DeviceParams }
  load: { label: string; params: LoadParams }
  feed: { sizeId: Conductor['sizeId']; lengthM: number }
  motorStart?: boolean
}

export function branchDesign(b: Branch): Design {
  const settings: DesignSettings = { nominalVoltageV: 12, unitSystem: 'metric', profile: b.profile, defaultAmbientC: 30 }
  const part = (type: Part['type'], id: string, label: string, x: number, y: number, params: object = {}) =>
    makePart(settings, type, id, label, { x, y }, params as never)
  const red = { colour: 'red' as const, sheathed: true }
  const black = { colour: 'black' as const }
  const on = { on: true, level: 1 }
  return {
    format: 'ampwright.design', version: 1, id: b.id, name: b.name, settings,
    parts: [
      part('battery', 'bank', 'House battery 12.8 V', 100, 400, { chemistry: 'lfp', nominalVoltageV: 12.8, capacityAh: 100,
        internalResistanceOhm: b.bankOhm, seriesCount: 1, parallelCount: 1 }),
      part('fuse', 'main-fuse', `Main fuse Class T ${b.mainA} A`, 300, 250, { family: 'class-t', ratingA: b.mainA,
        dcVoltageRatingV: 160, interruptingRatingA: 20000 }),
      part('bus-bar', 'pos-bus', 'Positive bus', 500, 250, { ratingA: 250, polarity: 'positive', studs: 4 }),
      part('bus-bar', 'neg-bus', 'Negative bus', 500, 550, { ratingA: 250, polarity: 'negative', studs: 4 }),
      part(b.device.type, 'branch-device', b.device.label, 700, 250, { dcVoltageRatingV: 32, ...b.device.params }),
      part('load', 'load', b.load.label, 950, 400, { duty: 'continuous', critical: false, hoursPerDay: 1, ...b.load.params }),
    ],
    conductors: [
      makeConductor('bank-pos', 'Battery + to main fuse', 'bank.pos', 'main-fuse.line', 'awg-1/0', 0.15, red),
      makeConductor('main-bus', 'Main fuse to positive bus', 'main-fuse.load', 'pos-bus.a', 'awg-1/0', 0.5, red),
      makeConductor('bus-neg', 'Negative bus to battery −', 'neg-bus.a', 'bank.neg', 'awg-1/0', 0.6, black),
      makeConductor('branch-tap', 'Bus to branch device', 'pos-bus.b', 'branch-device.line', 'awg-1/0', 0.1, red),
      makeConductor('load-pos', `${b.load.label} +`, 'branch-device.load', 'load.pos', b.feed.sizeId, b.feed.lengthM, { colour: 'red' }),
      makeConductor('load-neg', `${b.load.label} −`, 'load.neg', 'neg-bus.b', b.feed.sizeId, b.feed.lengthM, black),
    ],
    scenarios: [
      { id: 'running', name: 'Running', sunOn: false, chargerOn: false, loads: { load: on } },
      ...(b.motorStart ? [{ id: 'start', name: 'Starting', sunOn: false, chargerOn: false, motorStart: true, loads: { load: on } }] : []),
    ],
  }
}

/** A transfer pump: 8 A running, 6 × that for 0.5 s at each start. */
export const PUMP_LOAD: Branch['load'] = {
  label: 'Transfer pump',
  params: { model: 'current', currentA: 8, duty: 'intermittent', start: { inrushMultiple: 6, durationS: 0.5 } },
}

/**
 * A 15 A regular blade fuse ahead of a pump with an 8 A run and a 6 × start for 0.5 s: 48 A is
 * 3.2 × the rating, where the blade band may open after ≈ 90 ms (ISO 8820-3 points, recalled).
 */
export function motorStartNuisance(): Design {
  return branchDesign({
    id: 'motor-start-nuisance', name: 'Pump on a fast blade fuse', profile: 'vehicle', bankOhm: 0.015, mainA: 100,
    device: { type: 'fuse', label: 'Pump fuse, blade 15 A', params: { family: 'blade-regular', ratingA: 15, interruptingRatingA: 1000 } },
    load: PUMP_LOAD,
    feed: { sizeId: 'awg-12', lengthM: 2 }, motorStart: true,
  })
}

/**
 * A 40 A bolt-down strip fuse on a 20 m run of 10 AWG (10 380 cmil) to a small load: a short at
 * the far end draws ≈ 82 A (2 × the rating), which the strip band may take ≈ 100 s to clear,
 * while the conductor reaches 150 °C after ≈ 0.001607 · (10 380 / 82)² ≈ 26 s. The 200 A main is
 * selective with it (at ≈ 740 A it may not melt before ≈ 0.17 s; the strip clears within ≈ 60 ms).
 */
export function slowFaultClearing(): Design {
  return branchDesign({
    id: 'slow-fault-clearing', name: 'Long thin run on a time-lag fuse', profile: 'vehicle', bankOhm: 0.015, mainA: 200,
    device: { type: 'fuse', label: 'Rear feed fuse, strip 40 A', params: { family: 'strip-bolt-down', ratingA: 40, interruptingRatingA: 6000 } },
    load: { label: 'Rear work light', params: { model: 'current', currentA: 2 } },
    feed: { sizeId: 'awg-10', lengthM: 20 },
  })
}

/**
 * A 10 A manual-reset thermal breaker (SAE J553 type III) on 16 AWG (2 580 cmil) close to the bank:
 * a short at the breaker draws ≈ 700 A, the conductor reaches 150 °C after ≈ 20 ms, the breaker
 * cannot open before ≈ 0.2 s and the 100 A Class T main needs longer than 20 ms at that current.
 * (The same short may also melt the main fuse first: a thermal breaker is not selective with a fast
 * main fuse at such currents, so this file also shows a selectivity warning.)
 */
export function thermalBreakerOnly(): Design {
  return branchDesign({
    id: 'thermal-breaker-only', name: 'Thermal breaker as the only protection', profile: 'vehicle', bankOhm: 0.015, mainA: 100,
    device: { type: 'breaker', label: 'Light breaker 10 A (thermal, manual reset)', params: { family: 'breaker-thermal-3', ratingA: 10, interruptingRatingA: 5000 } },
    load: { label: 'Cabin lights', params: { model: 'current', currentA: 4 } },
    feed: { sizeId: 'awg-16', lengthM: 1.5 },
  })
}

/**
 * An 80 A strip fuse under a 100 A Class T main: for a short just past the strip fuse (≈ 800 A,
 * 10 × its rating) it may take up to 0.2 s to clear, while the Class T may melt after ≈ 7 ms.
 * Two fuses this close in rating are not selective at any fault current.
 */
export function notSelective(): Design {
  return branchDesign({
    id: 'not-selective', name: 'Branch fuse too close to the main fuse', profile: 'vehicle', bankOhm: 0.015, mainA: 100,
    device: { type: 'fuse', label: 'Inverter fuse, strip 80 A', params: { family: 'strip-bolt-down', ratingA: 80, interruptingRatingA: 6000 } },
    load: { label: 'Inverter (as a 50 A load)', params: { model: 'current', currentA: 50 } },
    feed: { sizeId: 'awg-4', lengthM: 1 },
  })
}

/**
 * A boat's cabin-light circuit on an automatic-reset (SAE J553 type I) breaker: the marine profile
 * allows those only as a motor's own protection. A small battery (50 mΩ) keeps the fault near 230 A,
 * which the breaker clears (≤ 0.3 s) before the 10 AWG run is damaged (≈ 3 s) and before the main melts (≈ 2 s).
 */
export function autoResetBreaker(): Design {
  return branchDesign({
    id: 'auto-reset-breaker', name: 'Automatic-reset breaker on a lighting circuit', profile: 'marine', bankOhm: 0.05, mainA: 100,
    device: { type: 'breaker', label: 'Cabin light breaker 10 A (automatic reset)', params: { family: 'breaker-thermal-1', ratingA: 10, interruptingRatingA: 5000 } },
    load: { label: 'Cabin lights', params: { model: 'current', currentA: 4 } },
    feed: { sizeId: 'awg-10', lengthM: 2 },
  })
}
