import type { BandDefinition, FamilyTimeCurrent } from '../types'
import { CARRY_TIME_S, point } from './_point'

// High-current fuses. No public copy of the time-current requirements was read for any of these
// families: every point is recalled (unverified) or common practice, and is labelled so. Above the last
// point each curve is extended at constant I²t (adiabatic element, computed).

const STRIP = 'Bolt-down strip fuse, high-current time-lag (SAE J1888 family), typical limits (recalled, unverified)'
const TERMINAL = 'Terminal-mount battery fuse, typical datasheet limits (recalled, unverified)'
const CLASS_T = 'UL 248-15 Class T (very fast-acting), overload limits (recalled, unverified)'
const GPV = 'IEC 60269-6 gPV'
const GG_GATES = 'IEC 60269-2 gG gates of a 16 A link applied to gPV as an approximation (recalled, unverified)'

function stripBoltDown(): BandDefinition {
  return {
    kind: 'fuse',
    timeDelay: true,
    minMelt: [
      point(1.1, CARRY_TIME_S, `${STRIP}: 110 % carried`, 'recalled'),
      point(1.35, 60, `${STRIP}: 135 % ≥ 60 s`, 'recalled'),
      point(2, 5, `${STRIP}: 200 % ≥ 5 s`, 'recalled'),
      point(3, 1, `${STRIP}: 300 % ≥ 1 s`, 'recalled'),
      point(6, 0.15, `${STRIP}: 600 % ≥ 0.15 s`, 'recalled'),
      point(10, 0.03, `${STRIP}: 1000 % ≥ 30 ms`, 'recalled'),
    ],
    maxClear: [
      point(1.35, 1800, `${STRIP}: 135 % ≤ 30 min`, 'recalled'),
      point(2, 120, `${STRIP}: 200 % ≤ 2 min`, 'recalled'),
      point(3, 10, `${STRIP}: 300 % ≤ 10 s`, 'recalled'),
      point(6, 1, `${STRIP}: 600 % ≤ 1 s`, 'recalled'),
      point(10, 0.2, `${STRIP}: 1000 % ≤ 0.2 s`, 'recalled'),
    ],
    source: STRIP,
  }
}

function batteryTerminal(): BandDefinition {
  return {
    kind: 'fuse',
    timeDelay: true,
    minMelt: [
      point(1.1, CARRY_TIME_S, `${TERMINAL}: 110 % carried`, 'recalled'),
      point(1.5, 100, `${TERMINAL}: 150 % ≥ 100 s`, 'recalled'),
      point(2, 10, `${TERMINAL}: 200 % ≥ 10 s`, 'recalled'),
      point(3, 1, `${TERMINAL}: 300 % ≥ 1 s`, 'recalled'),
      point(5, 0.1, `${TERMINAL}: 500 % ≥ 0.1 s`, 'recalled'),
      point(10, 0.01, `${TERMINAL}: 1000 % ≥ 10 ms`, 'recalled'),
    ],
    maxClear: [
      point(1.35, 3600, `${TERMINAL}: 135 % ≤ 1 h`, 'recalled'),
      point(2, 300, `${TERMINAL}: 200 % ≤ 5 min`, 'recalled'),
      point(3, 30, `${TERMINAL}: 300 % ≤ 30 s`, 'recalled'),
      point(5, 2, `${TERMINAL}: 500 % ≤ 2 s`, 'recalled'),
      point(10, 0.1, `${TERMINAL}: 1000 % ≤ 0.1 s`, 'recalled'),
    ],
    source: TERMINAL,
  }
}

function classT(ratingA: number): BandDefinition {
  // Larger links get longer overload limits (recalled): 135 % within 1 h up to 60 A, 2 h above;
  // 200 % within 4 min up to 60 A, 8 min up to 200 A, 10 min above.
  const at135S = ratingA <= 60 ? 3600 : 7200
  const at200S = ratingA <= 60 ? 240 : ratingA <= 200 ? 480 : 600
  return {
    kind: 'fuse',
    timeDelay: false,
    minMelt: [
      point(1.1, CARRY_TIME_S, `${CLASS_T}: 110 % carried`, 'recalled'),
      point(1.35, 30, `${CLASS_T}: 135 % ≥ 30 s`, 'recalled'),
      point(2, 2, `${CLASS_T}: 200 % ≥ 2 s`, 'recalled'),
      point(5, 0.05, `${CLASS_T}: 500 % ≥ 50 ms`, 'recalled'),
      point(10, 0.003, `${CLASS_T}: 1000 % ≥ 3 ms`, 'recalled'),
    ],
    maxClear: [
      point(1.35, at135S, `${CLASS_T}: 135 % ≤ ${at135S / 3600} h`, 'recalled'),
      point(2, at200S, `${CLASS_T}: 200 % ≤ ${at200S / 60} min`, 'recalled'),
      point(5, 1, `${CLASS_T}: 500 % ≤ 1 s`, 'recalled'),
      point(10, 0.02, `${CLASS_T}: 1000 % ≤ 20 ms`, 'recalled'),
    ],
    source: CLASS_T,
  }
}

function gPv(): BandDefinition {
  return {
    kind: 'fuse',
    timeDelay: false,
    minMelt: [
      point(1.13, 3600, `${GPV} conventional non-fusing current 1.13 In for 1 h (Table 101 exists; the value is recalled, unverified)`, 'recalled'),
      point(2.06, 10, `${GG_GATES}: 33 A (2.06 In) ≥ 10 s`, 'recalled'),
      point(5.3, 0.1, `${GG_GATES}: 85 A (5.3 In) ≥ 0.1 s`, 'recalled'),
    ],
    maxClear: [
      point(1.45, 3600, `${GPV} conventional fusing current 1.45 In within 1 h (Table 101 exists; the value is recalled, unverified)`, 'recalled'),
      point(4.06, 5, `${GG_GATES}: 65 A (4.06 In) ≤ 5 s`, 'recalled'),
      point(9.4, 0.1, `${GG_GATES}: 150 A (9.4 In) ≤ 0.1 s`, 'recalled'),
    ],
    source: `${GPV} conventional currents (recalled, unverified) and ${GG_GATES}`,
  }
}

export const HIGH_CURRENT_FAMILIES: FamilyTimeCurrent[] = [
  { familyId: 'strip-bolt-down', label: 'Bolt-down strip fuse', bandAt: stripBoltDown },
  { familyId: 'battery-terminal', label: 'Terminal-mount battery fuse', bandAt: batteryTerminal },
  { familyId: 'class-t', label: 'Class T (UL 248-15)', bandAt: classT },
  { familyId: 'pv-10x38', label: 'PV fuse 10 × 38 mm (gPV, IEC 60269-6)', bandAt: gPv },
]
