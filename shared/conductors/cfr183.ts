import type { ConductorSizeId } from './sizes'

// Boat conductor ampacity: 33 CFR 183.425 Table 5 "Allowable amperage of conductors" (U.S. federal
// text; federal.elaws.us and the GPO 2001 edition; standards.md §4 [V2]). ABYC E-11's single-conductor
// table carries the same values for these columns (recalled, unverified). Basis: outside engine
// spaces, 30 °C ambient (the 30 °C / 50 °C bases are stated in chandlery notes on Table 5).

export const CFR_183_425_SOURCE = '33 CFR 183.425 Table 5 (= ABYC E-11 single conductor), outside engine spaces, 30 °C'

export const CFR_COLUMNS_C = [60, 75, 80, 90, 105, 125, 200] as const
export type CfrColumnC = (typeof CFR_COLUMNS_C)[number]

type Row = readonly [number, number, number, number, number, number, number]

export const CFR_183_425_TABLE_5_A: Readonly<Partial<Record<ConductorSizeId, Row>>> = {
  //          60   75   80   90  105  125  200 °C
  'awg-18': [10, 10, 15, 20, 20, 25, 25],
  'awg-16': [15, 15, 20, 25, 25, 30, 35],
  'awg-14': [20, 20, 25, 30, 35, 40, 45],
  'awg-12': [25, 25, 35, 40, 45, 50, 55],
  'awg-10': [40, 40, 50, 55, 60, 70, 70],
  'awg-8': [55, 65, 70, 70, 80, 90, 100],
  'awg-6': [80, 95, 100, 100, 120, 125, 135],
  'awg-4': [105, 125, 130, 135, 160, 170, 180],
  'awg-3': [120, 145, 150, 155, 180, 195, 210],
  'awg-2': [140, 170, 175, 180, 210, 225, 240],
  'awg-1': [165, 195, 210, 210, 245, 265, 280],
  'awg-1/0': [195, 230, 245, 245, 285, 305, 325],
  'awg-2/0': [225, 265, 285, 285, 330, 355, 370],
  'awg-3/0': [260, 310, 330, 330, 385, 410, 430],
  'awg-4/0': [300, 360, 385, 385, 445, 475, 510],
}

export function cfrColumnIndex(column: CfrColumnC): number {
  return CFR_COLUMNS_C.indexOf(column)
}

/** Ambient the engine-space correction of Note 1 is for, °C (122 °F). */
export const ENGINE_SPACE_AMBIENT_C = 50

/** √((Tc − Ta)/(Tc − 30)): the NEC's ambient-correction formula (mikeholt.com reproduction of 310.15). */
export function ambientCorrectionFormula(insulationRatingC: number, ambientC: number): number {
  if (ambientC >= insulationRatingC) return 0
  return Math.sqrt((insulationRatingC - ambientC) / (insulationRatingC - 30))
}

export interface EngineSpaceFactor {
  value: number
  status: string
}

/**
 * Note 1 engine-space factors. What we know per column (standards.md §4):
 * - 105 °C: 0.85, printed by two chandlery / cable-maker reproductions of Table 5 [V2];
 * - others: the printed note is recalled as 0.58 / 0.75 / 0.79 / 0.82 / 0.86 / 0.89 / 1.00 [M];
 * - the √((Tc − 50)/(Tc − 30)) rule gives 0.577 / 0.745 / 0.775 / 0.816 / 0.856 / 0.889 / 0.939 [C].
 * We apply the lowest of the candidates we have for each column (our conservative choice).
 */
const RECALLED_NOTE_1: Record<CfrColumnC, number> = { 60: 0.58, 75: 0.75, 80: 0.79, 90: 0.82, 105: 0.86, 125: 0.89, 200: 1.0 }

export function engineSpaceFactor(column: CfrColumnC): EngineSpaceFactor {
  const computed = ambientCorrectionFormula(column, ENGINE_SPACE_AMBIENT_C)
  if (column === 105) {
    return {
      value: Math.min(0.85, computed),
      status: '0.85: 33 CFR 183.425 Table 5 Note 1 as printed in two industry reproductions (verified)',
    }
  }
  return {
    value: Math.min(computed, RECALLED_NOTE_1[column]),
    status: `computed √((${column} − 50)/(${column} − 30)) = ${computed.toFixed(3)}; printed Note 1 value recalled as ${RECALLED_NOTE_1[column].toFixed(2)} (unverified); the lower is applied`,
  }
}

export const USCG_BUNDLING_SOURCE =
  'USCG Electrical System Compliance Guideline (33 CFR 183 subpart I), bundling factors for conductors of 50 V or more'

/** Lower bound of each bundle-size band and its factor (≥ 50 V). */
export const USCG_BUNDLING_FACTORS: ReadonlyArray<{ fromCount: number; factor: number }> = [
  { fromCount: 1, factor: 1.0 },
  { fromCount: 3, factor: 0.7 },
  { fromCount: 4, factor: 0.6 },
  { fromCount: 7, factor: 0.5 },
  { fromCount: 25, factor: 0.4 },
]

export function uscgBundlingFactor(bundledCount: number): number {
  let factor = 1
  for (const band of USCG_BUNDLING_FACTORS) if (bundledCount >= band.fromCount) factor = band.factor
  return factor
}
