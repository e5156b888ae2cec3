import type { BandDefinition, FamilyTimeCurrent } from '../types'
import { point } from './_point'

// Glass and ceramic cartridge fuses. 5 × 20 mm: IEC 60127-2 pre-arcing limits; 6.3 × 32 mm: UL 248-14
// (supplemental fuses). Pre-arcing time is used as clearing time: at these voltages the arcing time of
// a miniature fuse is a small part of the total (recalled, unverified). Sources are named on every point.

const SHEET_5 = "IEC 60127-2 standard sheet 5 (time-lag T, high breaking), as stated by two makers' datasheets that declare conformity and agree"
const SHEETS_1_2 = 'IEC 60127-2 standard sheets 1/2 (fast-acting) (recalled, unverified)'
const SPEED_F = 'IEC 60127 speed letter F: 1–10 ms pre-arcing at 10 In (recalled, unverified)'

/** IEC 60127-2 sheet 5, time-lag T, high breaking. Where the datasheets differ the looser bound is kept. */
function timeLag5x20(ratingA: number): BandDefinition {
  // 1.5 In: ≥ 1 h, but ≥ 30 min at 8–10 A and ≥ 15 min at 12.5–16 A (datasheet B).
  const carryS = ratingA <= 6.3 ? 3600 : ratingA <= 10 ? 1800 : 900
  const carryNote = ratingA <= 6.3 ? '' : ` (datasheet B, ${ratingA <= 10 ? '8–10 A' : '12.5–16 A'}; A says ≥ 1 h)`
  const small = ratingA <= 3.15
  return {
    kind: 'fuse',
    timeDelay: true,
    minMelt: [
      point(1.5, carryS, `${SHEET_5}: 1.5 In ≥ ${carryS / 60} min${carryNote}`, 'two-sources'),
      point(2.75, 0.75, `${SHEET_5}: 2.75 In ≥ 0.75 s (datasheet B; A says 1 s)`, 'two-sources'),
      point(4, small ? 0.095 : 0.15, `${SHEET_5}: 4 In ≥ ${small ? '95 ms (≤ 3.15 A)' : '150 ms (≥ 4 A)'}`, 'two-sources'),
      point(10, small ? 0.01 : 0.02, `${SHEET_5}: 10 In ≥ ${small ? '10 ms (≤ 3.15 A)' : '20 ms (≥ 4 A)'}`, 'two-sources'),
    ],
    maxClear: [
      point(2.1, 1800, `${SHEET_5}: 2.1 In ≤ 30 min`, 'two-sources'),
      point(2.75, 80, `${SHEET_5}: 2.75 In ≤ 80 s`, 'two-sources'),
      point(4, 5, `${SHEET_5}: 4 In ≤ 5 s`, 'two-sources'),
      point(10, 0.15, `${SHEET_5}: 10 In ≤ 150 ms (datasheet B; A says 100 ms)`, 'two-sources'),
    ],
    source: `${SHEET_5}; above 10 In extended at constant I²t (computed)`,
  }
}

/** IEC 60127-2 fast-acting F sheets: recalled limits only. */
function fast5x20(): BandDefinition {
  return {
    kind: 'fuse',
    timeDelay: false,
    minMelt: [
      point(1.5, 3600, `${SHEETS_1_2}: 1.5 In ≥ 1 h`, 'recalled'),
      point(2.75, 0.01, `${SHEETS_1_2}: 2.75 In ≥ 10 ms`, 'recalled'),
      point(4, 0.003, `${SHEETS_1_2}: 4 In ≥ 3 ms`, 'recalled'),
      point(10, 0.001, SPEED_F, 'recalled'),
    ],
    maxClear: [
      point(2.1, 1800, `${SHEETS_1_2}: 2.1 In ≤ 30 min`, 'recalled'),
      point(2.75, 2, `${SHEETS_1_2}: 2.75 In ≤ 2 s`, 'recalled'),
      point(4, 0.3, `${SHEETS_1_2}: 4 In ≤ 300 ms`, 'recalled'),
      point(10, 0.02, `${SHEETS_1_2}: 10 In ≤ 20 ms`, 'recalled'),
    ],
    source: `${SHEETS_1_2}; above 10 In extended at constant I²t (computed)`,
  }
}

const UL_248_14 = "UL 248-14 (supplemental fuses) overload opening limits, as published in a fuse maker's guide to the standard"
const CARRY_4H = "UL 248-14 carries 100 % (a fuse maker's guide to the standard); the 4 h duration is the usual datasheet figure (recalled, unverified)"

/** UL 248-14 opening limits: 135 % within 1 h; 200 % within 2 min (0–30 A) or 4 min (35–60 A). */
function ul248_14MaxClear(ratingA: number) {
  const at200S = ratingA <= 30 ? 120 : 240
  return [
    point(1.35, 3600, `${UL_248_14}: 135 % opens within 1 h`, 'verified'),
    point(2, at200S, `${UL_248_14}: 200 % opens within ${at200S / 60} min (${ratingA <= 30 ? '0–30' : '35–60'} A)`, 'verified'),
  ]
}

function fast6x32(ratingA: number): BandDefinition {
  return {
    kind: 'fuse',
    timeDelay: false,
    minMelt: [
      point(1, 4 * 3600, CARRY_4H, 'recalled'),
      point(2, 0.5, 'Fast-acting supplemental fuse, 200 % melts after ≥ 0.5 s (recalled, unverified)', 'recalled'),
      point(10, 0.001, SPEED_F, 'recalled'),
    ],
    maxClear: ul248_14MaxClear(ratingA),
    source: `${UL_248_14}; minimum melting recalled, unverified; above 200 % the guaranteed clearing is extended at constant I²t (computed)`,
  }
}

function timeDelay6x32(ratingA: number): BandDefinition {
  return {
    kind: 'fuse',
    timeDelay: true,
    minMelt: [
      point(1, 4 * 3600, CARRY_4H, 'recalled'),
      point(2, 5, 'Time-delay supplemental fuse, 200 % melts after ≥ 5 s (datasheet convention, recalled, unverified)', 'recalled'),
    ],
    maxClear: ul248_14MaxClear(ratingA),
    source: `${UL_248_14}; time-delay minimum recalled, unverified; beyond 200 % extended at constant I²t (computed)`,
  }
}

export const CARTRIDGE_FAMILIES: FamilyTimeCurrent[] = [
  { familyId: 'cartridge-5x20-fast', label: 'Cartridge fuse 5 × 20 mm, fast-acting (IEC 60127-2 F)', bandAt: () => fast5x20() },
  { familyId: 'cartridge-5x20-delay', label: 'Cartridge fuse 5 × 20 mm, time-lag (IEC 60127-2 sheet 5)', bandAt: timeLag5x20 },
  { familyId: 'cartridge-6x32-fast', label: 'Cartridge fuse 6.3 × 32 mm, fast-acting (UL 248-14)', bandAt: fast6x32 },
  { familyId: 'cartridge-6x32-delay', label: 'Cartridge fuse 6.3 × 32 mm, time-delay (UL 248-14)', bandAt: timeDelay6x32 },
]
