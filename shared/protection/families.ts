import type { DeviceFamilyId } from './ratings'

// Generic protective-device families: ratings offered, DC voltage rating, interrupting rating.
// Status words: "verified" = a public copy of the standard or two reproductions agree (standards.md [V]/[V2]);
// "recalled" = from memory, unverified ([M]); "common practice" = what the trade stocks, not a standard.
// A device counts as ignition protected (SAE J1171 / ISO 8846 / UL 1500) only when its marking says so,
// so every family defaults to false and the designer sets it per part.

export interface InterruptingRating {
  currentA: number
  atVoltageV: number
  current: 'dc' | 'ac'
  status: 'verified' | 'recalled'
  source: string
}

export interface DeviceFamily {
  id: DeviceFamilyId
  label: string
  kind: 'fuse' | 'breaker'
  ratingsA: readonly number[]
  ratingsSource: string
  /** highest DC system voltage the family is commonly rated for, V; null = per marking only */
  dcVoltageRatingV: number | null
  /** null = no family-wide figure on file: the part's marking must be entered */
  interruptingRating: InterruptingRating | null
  ignitionProtectedDefault: boolean
  source: string
}

const BLADE_AIC: InterruptingRating = {
  currentA: 1000, atVoltageV: 32, current: 'dc', status: 'verified',
  source: 'ISO 8820-3:2015 scope (blade fuse-links, 32 V or 58 V, ≤ 100 A, breaking capacity 1 000 A)',
}
const IEC_60127_RATINGS_A = [0.1, 0.125, 0.16, 0.2, 0.25, 0.315, 0.4, 0.5, 0.63, 0.8, 1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8, 10]
const IEC_60127_LOW_BREAKING: InterruptingRating = {
  currentA: 35, atVoltageV: 250, current: 'ac', status: 'recalled',
  source: 'IEC 60127-2 low-breaking-capacity sheets: 35 A or 10 × In at 250 V AC (recalled, unverified); DC per marking',
}
const GLASS_6X32_RATINGS_A = [0.25, 0.5, 0.75, 1, 1.5, 2, 2.5, 3, 4, 5, 6, 7, 7.5, 8, 10, 12, 15, 20, 25, 30]
const UL_248_14_AIC: InterruptingRating = {
  currentA: 35, atVoltageV: 250, current: 'ac', status: 'verified',
  source: 'UL 248-14 minimum at 250 V AC for the lowest ratings (35 A, 0–1 A; 1 500 A for 15.1–30 A); DC per marking',
}
const THERMAL_RATINGS_A = [5, 10, 15, 20, 25, 30, 35, 40, 50, 60, 70, 80, 90, 100, 120, 135, 150]
const CLASS_T_RATINGS_A = [
  1, 3, 6, 10, 15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400,
  450, 500, 600, 700, 800, 1000, 1200,
]

function thermal(type: 1 | 2 | 3, behaviour: string): DeviceFamily {
  return {
    id: `breaker-thermal-${type}`,
    label: `Thermal circuit breaker, SAE J553 type ${'I'.repeat(type)} (${behaviour})`,
    kind: 'breaker',
    ratingsA: THERMAL_RATINGS_A,
    ratingsSource: 'common practice, recalled (SAE J553 covers ratings up to 200 A)',
    dcVoltageRatingV: 24,
    interruptingRating: null,
    ignitionProtectedDefault: false,
    source: 'SAE J553 (12/24 V; 48 V added in 2022 — enter the marking for 48 V parts); no family interrupting figure on file',
  }
}

export const DEVICE_FAMILIES: Readonly<Record<DeviceFamilyId, DeviceFamily>> = {
  'blade-mini': {
    id: 'blade-mini', label: 'Blade fuse, mini size', kind: 'fuse',
    ratingsA: [2, 3, 4, 5, 7.5, 10, 15, 20, 25, 30],
    ratingsSource: 'common practice, recalled',
    dcVoltageRatingV: 32, interruptingRating: BLADE_AIC, ignitionProtectedDefault: false,
    source: 'ISO 8820-3 (type F miniature)',
  },
  'blade-regular': {
    id: 'blade-regular', label: 'Blade fuse, regular size', kind: 'fuse',
    ratingsA: [1, 2, 3, 4, 5, 7.5, 10, 15, 20, 25, 30, 35, 40],
    ratingsSource: 'common practice, recalled',
    dcVoltageRatingV: 32, interruptingRating: BLADE_AIC, ignitionProtectedDefault: false,
    source: 'ISO 8820-3 (type C medium); SAE J1284',
  },
  'blade-large': {
    id: 'blade-large', label: 'Blade fuse, large size', kind: 'fuse',
    ratingsA: [20, 30, 40, 50, 60, 70, 80, 100],
    ratingsSource: 'common practice, recalled (ISO 8820-3 scope ends at 100 A)',
    dcVoltageRatingV: 32, interruptingRating: BLADE_AIC, ignitionProtectedDefault: false,
    source: 'ISO 8820-3 (type E high-current)',
  },
  'cartridge-5x20-fast': {
    id: 'cartridge-5x20-fast', label: 'Cartridge fuse 5 × 20 mm, fast-acting (F)', kind: 'fuse',
    ratingsA: IEC_60127_RATINGS_A, ratingsSource: 'IEC 60127 preferred ratings (R10 series), recalled',
    dcVoltageRatingV: null, interruptingRating: IEC_60127_LOW_BREAKING, ignitionProtectedDefault: false,
    source: 'IEC 60127-2 (sheets 1/2, fast-acting)',
  },
  'cartridge-5x20-delay': {
    id: 'cartridge-5x20-delay', label: 'Cartridge fuse 5 × 20 mm, time-lag (T)', kind: 'fuse',
    ratingsA: IEC_60127_RATINGS_A, ratingsSource: 'IEC 60127 preferred ratings (R10 series), recalled',
    dcVoltageRatingV: null, interruptingRating: IEC_60127_LOW_BREAKING, ignitionProtectedDefault: false,
    source: 'IEC 60127-2 (sheets 3/5, time-lag; sheet 5 ceramic parts break 1 500 A at 250 V AC, recalled)',
  },
  'cartridge-6x32-fast': {
    id: 'cartridge-6x32-fast', label: 'Glass cartridge fuse 6.3 × 32 mm, fast-acting', kind: 'fuse',
    ratingsA: GLASS_6X32_RATINGS_A, ratingsSource: 'common practice, recalled',
    dcVoltageRatingV: 32, interruptingRating: UL_248_14_AIC, ignitionProtectedDefault: false,
    source: 'UL 248-14 (supplemental fuses); SAE J554 glass cartridge fuses (32 V DC rating recalled)',
  },
  'cartridge-6x32-delay': {
    id: 'cartridge-6x32-delay', label: 'Glass cartridge fuse 6.3 × 32 mm, time-delay', kind: 'fuse',
    ratingsA: GLASS_6X32_RATINGS_A, ratingsSource: 'common practice, recalled',
    dcVoltageRatingV: 32, interruptingRating: UL_248_14_AIC, ignitionProtectedDefault: false,
    source: 'UL 248-14 (supplemental fuses), 32 V DC rating recalled',
  },
  'strip-bolt-down': {
    id: 'strip-bolt-down', label: 'Bolt-down strip fuse', kind: 'fuse',
    ratingsA: [40, 50, 60, 70, 80, 100, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500],
    ratingsSource: 'common practice, recalled',
    dcVoltageRatingV: 32,
    interruptingRating: { currentA: 6000, atVoltageV: 32, current: 'dc', status: 'recalled', source: 'forum reports of large bolt-down strip fuses, ~6 kA at 32 V DC (recalled, unverified)' },
    ignitionProtectedDefault: false,
    source: 'SAE J1888 (high-current time-lag fuses); interrupting figure recalled',
  },
  'battery-terminal': {
    id: 'battery-terminal', label: 'Battery-terminal fuse', kind: 'fuse',
    ratingsA: [30, 40, 50, 60, 70, 80, 100, 125, 150, 175, 200, 225, 250, 300],
    ratingsSource: 'common practice, recalled',
    dcVoltageRatingV: 58,
    interruptingRating: { currentA: 10000, atVoltageV: 14, current: 'dc', status: 'recalled', source: 'forum reports of terminal-mount marine battery fuses, ~10 kA at 14 V DC (recalled, unverified)' },
    ignitionProtectedDefault: false,
    source: 'terminal-mount battery fuse; 58 V DC rating and interrupting figure recalled',
  },
  'class-t': {
    id: 'class-t', label: 'Class T fuse', kind: 'fuse',
    ratingsA: CLASS_T_RATINGS_A, ratingsSource: 'recalled: Class T spans 1–1200 A in the NEC 240.6(A) steps',
    dcVoltageRatingV: 125,
    interruptingRating: { currentA: 20000, atVoltageV: 125, current: 'dc', status: 'recalled', source: 'UL 248-15 Class T: 200 kA AC; DC commonly 20 kA at 125–160 V DC (recalled; the lower voltage is taken); matches the ABYC ≥ 20 kA at 125 V DC rule' },
    ignitionProtectedDefault: false,
    source: 'UL 248-15 (Class T)',
  },
  'pv-10x38': {
    id: 'pv-10x38', label: 'PV fuse 10 × 38 mm (gPV)', kind: 'fuse',
    ratingsA: [1, 2, 3, 4, 5, 6, 8, 10, 12, 15, 16, 20, 25, 30, 32],
    ratingsSource: 'common practice, recalled',
    dcVoltageRatingV: 1000,
    interruptingRating: { currentA: 10000, atVoltageV: 1000, current: 'dc', status: 'recalled', source: 'IEC 60269-6 gPV / UL 2579: typically 10–30 kA DC at 600–1500 V (recalled; the lower current is taken)' },
    ignitionProtectedDefault: false,
    source: 'IEC 60269-6 (gPV), UL 2579',
  },
  'breaker-thermal-1': thermal(1, 'automatic reset'),
  'breaker-thermal-2': thermal(2, 'modified reset'),
  'breaker-thermal-3': thermal(3, 'manual reset'),
  'breaker-magnetic-hydraulic': {
    id: 'breaker-magnetic-hydraulic', label: 'Hydraulic-magnetic circuit breaker', kind: 'breaker',
    ratingsA: [1, 2, 3, 5, 7.5, 10, 15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150],
    ratingsSource: 'common practice, recalled',
    dcVoltageRatingV: null, interruptingRating: null, ignitionProtectedDefault: false,
    source: 'voltage and interrupting ratings vary by frame: enter the marking (IEC 60947-2 / UL 489 for DC)',
  },
}

export function getDeviceFamily(id: DeviceFamilyId): DeviceFamily {
  const family = DEVICE_FAMILIES[id]
  if (!family) throw new RangeError(`Unknown device family "${String(id)}"`)
  return family
}

/**
 * The family's DC interrupting rating usable at a system voltage, A; null when none is on file,
 * the figure is AC only, or the system voltage is above the voltage it was stated at.
 */
export function dcInterruptingRatingA(id: DeviceFamilyId, systemVoltageV: number): number | null {
  const rating = getDeviceFamily(id).interruptingRating
  if (!rating || rating.current !== 'dc' || !(systemVoltageV <= rating.atVoltageV)) return null
  return rating.currentA
}
