import type { BandDefinition, FamilyTimeCurrent } from '../types'
import { CARRY_TIME_S, point } from './_point'

// Circuit breakers. SAE J553 sets test conditions and reset types (I automatic, II modified, III manual;
// verified from the standard's public abstract); its trip-time table was not read, so the thermal curve
// below is recalled (unverified). The three types share one curve: the type changes only the reset.

const J553 = 'SAE J553 thermal breaker, typical trip limits (recalled, unverified)'
const FLOOR = 'Common practice: a bimetal breaker does not open faster than about 0.2 s, however large the fault'
const MAG_HYD = 'Magnetic-hydraulic breaker, medium delay, typical limits (recalled, unverified)'

function thermal(): BandDefinition {
  return {
    kind: 'thermal-breaker',
    timeDelay: true,
    minMelt: [
      point(1, CARRY_TIME_S, `${J553}: 100 % carried`, 'recalled'),
      point(1.35, 30, `${J553}: 135 % ≥ 30 s`, 'recalled'),
      point(2, 3, `${J553}: 200 % ≥ 3 s`, 'recalled'),
      point(5, 0.3, `${J553}: 500 % ≥ 0.3 s`, 'recalled'),
    ],
    maxClear: [
      point(1.35, 3600, `${J553}: 135 % ≤ 1 h`, 'recalled'),
      point(2, 50, `${J553}: 200 % ≤ 50 s`, 'recalled'),
      point(5, 5, `${J553}: 500 % ≤ 5 s`, 'recalled'),
      point(10, 1.5, `${J553}: 1000 % ≤ 1.5 s`, 'recalled'),
    ],
    // No instantaneous region: the time axis stops at the floor.
    floor: { timeS: 0.2, source: FLOOR, status: 'common-practice' },
    source: `${J553}; floor at 0.2 s (common practice); no instantaneous trip`,
  }
}

function magneticHydraulic(): BandDefinition {
  return {
    kind: 'magnetic-hydraulic-breaker',
    timeDelay: true,
    minMelt: [
      point(1, CARRY_TIME_S, `${MAG_HYD}: 100 % carried`, 'recalled'),
      point(1.25, 5, `${MAG_HYD}: 125 % ≥ 5 s`, 'recalled'),
      point(2, 1, `${MAG_HYD}: 200 % ≥ 1 s`, 'recalled'),
      point(5, 0.2, `${MAG_HYD}: 500 % ≥ 0.2 s`, 'recalled'),
    ],
    maxClear: [
      point(1.25, 1000, `${MAG_HYD}: 125 % ≤ 1000 s`, 'recalled'),
      point(2, 30, `${MAG_HYD}: 200 % ≤ 30 s`, 'recalled'),
      point(5, 3, `${MAG_HYD}: 500 % ≤ 3 s`, 'recalled'),
    ],
    instantaneous: {
      mayTripFromMultiple: 6,
      tripsFromMultiple: 10,
      minS: 0.004,
      maxS: 0.02,
      source: `${MAG_HYD}: magnetic trip between 6 and 10 In, opening in 4–20 ms`,
      status: 'recalled',
    },
    source: `${MAG_HYD}: hydraulic delay curve plus instantaneous magnetic trip`,
  }
}

export const BREAKER_FAMILIES: FamilyTimeCurrent[] = [
  { familyId: 'breaker-thermal-1', label: 'Thermal breaker, SAE J553 type I (automatic reset)', bandAt: thermal },
  { familyId: 'breaker-thermal-2', label: 'Thermal breaker, SAE J553 type II (modified reset)', bandAt: thermal },
  { familyId: 'breaker-thermal-3', label: 'Thermal breaker, SAE J553 type III (manual reset)', bandAt: thermal },
  { familyId: 'breaker-magnetic-hydraulic', label: 'Magnetic-hydraulic breaker', bandAt: magneticHydraulic },
]
