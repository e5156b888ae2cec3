import { z } from 'zod'
import { MM2_PER_CMIL } from '../units/area'

// Standard conductor sizes: the AWG sizes 18 … 4/0 listed in NEC Chapter 9 Table 8 and in
// 33 CFR 183.425 Table 5 (the odd gauges 17, 15 … 5 appear in neither table, so they are not offered),
// and the IEC 60228 nominal metric sizes 0.75 … 120 mm².

export type SizeSystem = 'awg' | 'metric'

/** AWG gauge number n of ASTM B258: 1/0 → 0, 2/0 → −1, 3/0 → −2, 4/0 → −3. */
const AWG_GAUGES = [
  { label: '18', n: 18, necAreaCmil: 1620, saeAreaCmil: 1537 },
  { label: '16', n: 16, necAreaCmil: 2580, saeAreaCmil: 2336 },
  { label: '14', n: 14, necAreaCmil: 4110, saeAreaCmil: 3702 },
  { label: '12', n: 12, necAreaCmil: 6530, saeAreaCmil: 5833 },
  { label: '10', n: 10, necAreaCmil: 10380, saeAreaCmil: 9343 },
  { label: '8', n: 8, necAreaCmil: 16510, saeAreaCmil: 14810 },
  { label: '6', n: 6, necAreaCmil: 26240, saeAreaCmil: 24538 },
  { label: '4', n: 4, necAreaCmil: 41740, saeAreaCmil: 37360 },
  { label: '3', n: 3, necAreaCmil: 52620 },
  { label: '2', n: 2, necAreaCmil: 66360, saeAreaCmil: 62450 },
  { label: '1', n: 1, necAreaCmil: 83690, saeAreaCmil: 77790 },
  { label: '1/0', n: 0, necAreaCmil: 105600, saeAreaCmil: 98980 },
  { label: '2/0', n: -1, necAreaCmil: 133100, saeAreaCmil: 125100 },
  { label: '3/0', n: -2, necAreaCmil: 167800, saeAreaCmil: 158600 },
  { label: '4/0', n: -3, necAreaCmil: 211600, saeAreaCmil: 205500 },
] as const
// necAreaCmil: NEC (NFPA 70) Chapter 9 Table 8, "Area, circular mils" column — the Code's rounded areas.
// saeAreaCmil: SAE J1127/J1128 (automotive cable) areas, which are smaller than AWG of the same number
// (a cable maker's 2023 catalogue appendix reproducing the ABYC comparison table; standards.md §2 [V]).
// No SAE figure is on file for 3 AWG.

/** IEC 60228 nominal cross-sections offered, mm². */
const METRIC_AREAS_MM2 = [0.75, 1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120] as const

export const AWG_SIZE_IDS = [
  'awg-18', 'awg-16', 'awg-14', 'awg-12', 'awg-10', 'awg-8', 'awg-6', 'awg-4', 'awg-3', 'awg-2', 'awg-1',
  'awg-1/0', 'awg-2/0', 'awg-3/0', 'awg-4/0',
] as const
export const METRIC_SIZE_IDS = [
  'mm2-0.75', 'mm2-1', 'mm2-1.5', 'mm2-2.5', 'mm2-4', 'mm2-6', 'mm2-10', 'mm2-16', 'mm2-25', 'mm2-35',
  'mm2-50', 'mm2-70', 'mm2-95', 'mm2-120',
] as const
export const CONDUCTOR_SIZE_IDS = [...AWG_SIZE_IDS, ...METRIC_SIZE_IDS] as const

export const conductorSizeIdSchema = z.enum(CONDUCTOR_SIZE_IDS)
export type ConductorSizeId = z.infer<typeof conductorSizeIdSchema>

export interface ConductorSize {
  id: ConductorSizeId
  system: SizeSystem
  /** '10 AWG', '2/0 AWG', '16 mm²' */
  label: string
  /** Geometric area: from the ASTM B258 diameter formula for AWG, the nominal area for metric. */
  areaMm2: number
  areaCmil: number
  /** AWG only: the diameter of a solid wire of this gauge (ASTM B258). */
  diameterMm?: number
  /** AWG only: NEC Chapter 9 Table 8's rounded area, for display beside Code tables. */
  necAreaCmil?: number
  /** AWG only: the SAE J1127/J1128 area of automotive cable with this gauge number. */
  saeAreaCmil?: number
  /** Position in the ascending order of its system (0 = smallest). */
  rank: number
}

/**
 * ASTM B258: d = 0.005 in × 92^((36 − n)/39); area in cmil is the diameter in mils squared.
 * @example awgDiameterMm(10) // ≈ 2.588
 */
export function awgDiameterMm(n: number): number {
  return 0.127 * Math.pow(92, (36 - n) / 39)
}

export function awgAreaCmil(n: number): number {
  const diameterMils = 5 * Math.pow(92, (36 - n) / 39)
  return diameterMils * diameterMils
}

const AWG_SIZES: ConductorSize[] = AWG_GAUGES.map((g, rank) => {
  const areaCmil = awgAreaCmil(g.n)
  return {
    id: AWG_SIZE_IDS[rank],
    system: 'awg',
    label: `${g.label} AWG`,
    areaCmil,
    areaMm2: areaCmil * MM2_PER_CMIL,
    diameterMm: awgDiameterMm(g.n),
    necAreaCmil: g.necAreaCmil,
    saeAreaCmil: 'saeAreaCmil' in g ? g.saeAreaCmil : undefined,
    rank,
  }
})

const METRIC_SIZES: ConductorSize[] = METRIC_AREAS_MM2.map((areaMm2, rank) => ({
  id: METRIC_SIZE_IDS[rank],
  system: 'metric',
  label: `${areaMm2} mm²`,
  areaMm2,
  areaCmil: areaMm2 / MM2_PER_CMIL,
  rank,
}))

/** Every offered size, AWG (small → large) then metric (small → large). */
export const CONDUCTOR_SIZES: readonly ConductorSize[] = [...AWG_SIZES, ...METRIC_SIZES]

const SIZE_BY_ID = new Map<string, ConductorSize>(CONDUCTOR_SIZES.map((s) => [s.id, s]))

export function isConductorSizeId(id: unknown): id is ConductorSizeId {
  return typeof id === 'string' && SIZE_BY_ID.has(id)
}

/** The size with this id; throws a RangeError naming the id if it is not a standard size. */
export function getConductorSize(id: ConductorSizeId | string): ConductorSize {
  const size = SIZE_BY_ID.get(id)
  if (!size) throw new RangeError(`Unknown conductor size "${id}". Expected one of: ${CONDUCTOR_SIZE_IDS.join(', ')}`)
  return size
}

/** The sizes of one system, smallest first. */
export function sizesInOrder(system: SizeSystem): readonly ConductorSize[] {
  return system === 'awg' ? AWG_SIZES : METRIC_SIZES
}

export function conductorSizeLabel(id: ConductorSizeId | string): string {
  return getConductorSize(id).label
}

/** The next larger size of the same system, or null at the top of the range. */
export function nextLargerSize(id: ConductorSizeId): ConductorSize | null {
  const size = getConductorSize(id)
  return sizesInOrder(size.system)[size.rank + 1] ?? null
}

/**
 * The AWG size with the largest area not above `areaMm2` (null if smaller than 18 AWG).
 * Used to read AWG-indexed tables for metric conductors: never credits a conductor with a larger row.
 */
export function awgAtMostArea(areaMm2: number): ConductorSize | null {
  let found: ConductorSize | null = null
  for (const size of AWG_SIZES) if (size.areaMm2 <= areaMm2 * (1 + 1e-9)) found = size
  return found
}
