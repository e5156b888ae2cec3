import type { ConductorSizeId } from './sizes'

// NEC (NFPA 70) ampacity data, 2011 and later editions (values unchanged through 2023).
// Typed from standards.md §1 [V2]. The numbering differs by edition:
// 2020/2023 Table 310.16, 310.15(B)(1), 310.15(C)(1); 2011–2017 Table 310.15(B)(16), 310.15(B)(2)(a),
// 310.15(B)(3)(a). Pre-2011 values differ (e.g. Cu 14 AWG 60 °C was 20 A): this is the 2011+ table.

export const NEC_EDITION_NOTE = 'NFPA 70 (NEC) 2011–2023 values'
export const NEC_310_16_SOURCE =
  'NEC Table 310.16 (2011–2017: Table 310.15(B)(16)), not more than 3 current-carrying conductors, 30 °C ambient'

export type NecColumnC = 60 | 75 | 90
/** [60 °C, 75 °C, 90 °C]; null where the table has no entry. */
type Row = readonly [number | null, number | null, number | null]

export const NEC_310_16_COPPER_A: Readonly<Partial<Record<ConductorSizeId, Row>>> = {
  'awg-18': [null, null, 14],
  'awg-16': [null, null, 18],
  'awg-14': [15, 20, 25],
  'awg-12': [20, 25, 30],
  'awg-10': [30, 35, 40],
  'awg-8': [40, 50, 55],
  'awg-6': [55, 65, 75],
  'awg-4': [70, 85, 95],
  'awg-3': [85, 100, 115],
  'awg-2': [95, 115, 130],
  'awg-1': [110, 130, 145],
  'awg-1/0': [125, 150, 170],
  'awg-2/0': [145, 175, 195],
  'awg-3/0': [165, 200, 225],
  'awg-4/0': [195, 230, 260],
}

/** Aluminium or copper-clad aluminium; the table starts at 12 AWG. */
export const NEC_310_16_ALUMINIUM_A: Readonly<Partial<Record<ConductorSizeId, Row>>> = {
  'awg-12': [15, 20, 25],
  'awg-10': [25, 30, 35],
  'awg-8': [35, 40, 45],
  'awg-6': [40, 50, 55],
  'awg-4': [55, 65, 75],
  'awg-3': [65, 75, 85],
  'awg-2': [75, 90, 100],
  'awg-1': [85, 100, 115],
  'awg-1/0': [100, 120, 135],
  'awg-2/0': [115, 135, 150],
  'awg-3/0': [130, 155, 175],
  'awg-4/0': [150, 180, 205],
}

export function necColumnIndex(column: NecColumnC): 0 | 1 | 2 {
  return column === 60 ? 0 : column === 75 ? 1 : 2
}

export const NEC_AMBIENT_SOURCE =
  'NEC Table 310.15(B)(1) ambient temperature correction, 30 °C basis (2011–2017: Table 310.15(B)(2)(a))'

/** Bands by their upper ambient °C; factors [60, 75, 90 °C]; null = conductor not permitted ("–"). */
export const NEC_AMBIENT_CORRECTION: ReadonlyArray<{ upToC: number; factors: Row }> = [
  { upToC: 10, factors: [1.29, 1.2, 1.15] },
  { upToC: 15, factors: [1.22, 1.15, 1.12] },
  { upToC: 20, factors: [1.15, 1.11, 1.08] },
  { upToC: 25, factors: [1.08, 1.05, 1.04] },
  { upToC: 30, factors: [1.0, 1.0, 1.0] },
  { upToC: 35, factors: [0.91, 0.94, 0.96] },
  { upToC: 40, factors: [0.82, 0.88, 0.91] },
  { upToC: 45, factors: [0.71, 0.82, 0.87] },
  { upToC: 50, factors: [0.58, 0.75, 0.82] },
  { upToC: 55, factors: [0.41, 0.67, 0.76] },
  { upToC: 60, factors: [null, 0.58, 0.71] },
  { upToC: 65, factors: [null, 0.47, 0.65] },
  { upToC: 70, factors: [null, 0.33, 0.58] },
  { upToC: 75, factors: [null, null, 0.5] },
  { upToC: 80, factors: [null, null, 0.41] },
  { upToC: 85, factors: [null, null, 0.29] },
]

/**
 * The tabulated correction for an ambient: the band whose upper end is at or above it (the table's
 * bands are whole degrees, so 30.5 °C reads the 31–35 band). 0 where the table shows "–" or beyond 85 °C.
 */
export function necAmbientFactor(ambientC: number, column: NecColumnC): number {
  const band = NEC_AMBIENT_CORRECTION.find((b) => ambientC <= b.upToC)
  if (!band) return 0
  return band.factors[necColumnIndex(column)] ?? 0
}

export const NEC_ADJUSTMENT_SOURCE =
  'NEC Table 310.15(C)(1) adjustment for more than three current-carrying conductors (2011–2017: Table 310.15(B)(3)(a)); also for cables bundled > 600 mm'

/** Lower bound of each count band and its factor. */
export const NEC_MORE_THAN_THREE_ADJUSTMENT: ReadonlyArray<{ fromCount: number; factor: number }> = [
  { fromCount: 1, factor: 1.0 },
  { fromCount: 4, factor: 0.8 },
  { fromCount: 7, factor: 0.7 },
  { fromCount: 10, factor: 0.5 },
  { fromCount: 21, factor: 0.45 },
  { fromCount: 31, factor: 0.4 },
  { fromCount: 41, factor: 0.35 },
]

export function necAdjustmentFactor(currentCarryingCount: number): number {
  let factor = 1
  for (const band of NEC_MORE_THAN_THREE_ADJUSTMENT) if (currentCarryingCount >= band.fromCount) factor = band.factor
  return factor
}
