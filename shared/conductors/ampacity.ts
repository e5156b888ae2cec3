import { z } from 'zod'
import { materialSchema, type Material } from './materials'
import { awgAtMostArea, conductorSizeIdSchema, getConductorSize, type ConductorSizeId } from './sizes'
import {
  codeProfileSchema, installationSchema, insulationRatingSchema, INSULATION_RATINGS_C,
  type CodeProfile, type Installation, type InsulationRatingC,
} from './profiles'
import {
  NEC_310_16_ALUMINIUM_A, NEC_310_16_COPPER_A, NEC_310_16_SOURCE, NEC_ADJUSTMENT_SOURCE, NEC_AMBIENT_SOURCE,
  necAdjustmentFactor, necAmbientFactor, necColumnIndex, type NecColumnC,
} from './nec310'
import {
  ambientCorrectionFormula, CFR_183_425_SOURCE, CFR_183_425_TABLE_5_A, cfrColumnIndex, engineSpaceFactor,
  ENGINE_SPACE_AMBIENT_C, USCG_BUNDLING_SOURCE, uscgBundlingFactor,
} from './cfr183'
import { ConductorInputError, requireFinite } from './_lib/inputs'

export interface AmpacityInput {
  sizeId: ConductorSizeId
  material: Material
  insulationRatingC: InsulationRatingC
  /** ambient around the run, °C; engine spaces are taken at ≥ 50 °C whatever is entered */
  ambientC: number
  installation: Installation
  /** current-carrying conductors bundled or in the raceway together, this one included; default 1 */
  bundledCount?: number
  profile: CodeProfile
  /** highest circuit voltage, V; decides which bundling rule the marine source states (≥ 50 V) */
  circuitVoltageV?: number
}

export const ampacityInputSchema = z.object({
  sizeId: conductorSizeIdSchema,
  material: materialSchema,
  insulationRatingC: insulationRatingSchema,
  ambientC: z.number().min(-60).max(150),
  installation: installationSchema,
  bundledCount: z.number().int().min(1).max(500).optional(),
  profile: codeProfileSchema,
  circuitVoltageV: z.number().positive().optional(),
})

export interface AmpacityFactor {
  name: string
  value: number
  source: string
}

export interface AmpacityResult {
  /** allowable current after every factor, A; null when the table has no value for this conductor */
  ampacityA: number | null
  /** the table value before factors, A */
  baseAmpacityA: number | null
  factors: AmpacityFactor[]
  /** the table read, with its conditions */
  table: string
  /** the table row read (an AWG size; differs from sizeId for metric conductors) */
  rowSizeId: ConductorSizeId | null
  /** the table column read, °C */
  columnC: number | null
  /** assumptions and substitutions a reviewer should see */
  notes: string[]
  /** set when ampacityA is null */
  unavailableReason?: string
}

/**
 * Allowable ampacity of one conductor under a code profile.
 * @example conductorAmpacityA({ sizeId: 'awg-10', material: 'copper', insulationRatingC: 90, ambientC: 30,
 *   installation: 'conduit', bundledCount: 4, profile: 'building' }).ampacityA // 32 (40 A × 0.8)
 */
export function conductorAmpacityA(input: AmpacityInput): AmpacityResult {
  validate(input)
  return input.profile === 'building' ? buildingAmpacity(input) : boatTableAmpacity(input)
}

function validate(input: AmpacityInput): void {
  getConductorSize(input.sizeId)
  if (!materialSchema.safeParse(input.material).success)
    throw new ConductorInputError('material', `must be one of ${materialSchema.options.join(', ')}`)
  if (!INSULATION_RATINGS_C.includes(input.insulationRatingC))
    throw new ConductorInputError('insulationRatingC', `must be one of ${INSULATION_RATINGS_C.join(', ')} °C`)
  requireFinite(input.ambientC, 'ambientC')
  if (input.ambientC < -60 || input.ambientC > 150) throw new ConductorInputError('ambientC', 'must be between −60 and 150 °C')
  const count = input.bundledCount ?? 1
  if (!Number.isInteger(count) || count < 1) throw new ConductorInputError('bundledCount', 'must be a whole number of at least 1')
  if (!installationSchema.safeParse(input.installation).success)
    throw new ConductorInputError('installation', `must be one of ${installationSchema.options.join(', ')}`)
  if (!codeProfileSchema.safeParse(input.profile).success)
    throw new ConductorInputError('profile', `must be one of ${codeProfileSchema.options.join(', ')}`)
}

/** The AWG row a size reads: itself, or for a metric size the AWG size of largest area not above it. */
function tableRow(sizeId: ConductorSizeId, notes: string[]): ConductorSizeId | null {
  const size = getConductorSize(sizeId)
  if (size.system === 'awg') return sizeId
  const row = awgAtMostArea(size.areaMm2)
  if (row) notes.push(`${size.label} read on the ${row.label} row (${row.areaMm2.toFixed(2)} mm²), the largest AWG size not above its area`)
  return row ? (row.id as ConductorSizeId) : null
}

function unavailable(table: string, reason: string, notes: string[], rowSizeId: ConductorSizeId | null = null): AmpacityResult {
  return { ampacityA: null, baseAmpacityA: null, factors: [], table, rowSizeId, columnC: null, notes, unavailableReason: reason }
}

function applyFactors(base: number, factors: AmpacityFactor[]): number {
  return factors.reduce((a, f) => a * f.value, base)
}

function buildingAmpacity(input: AmpacityInput): AmpacityResult {
  const notes: string[] = []
  const copper = input.material !== 'aluminium'
  const table = `${NEC_310_16_SOURCE}, ${copper ? 'copper' : 'aluminium or copper-clad aluminium'}`
  const row = tableRow(input.sizeId, notes)
  if (!row) return unavailable(table, `${getConductorSize(input.sizeId).label} is smaller than the smallest row (18 AWG)`, notes)
  const column: NecColumnC = input.insulationRatingC >= 90 ? 90 : input.insulationRatingC >= 75 ? 75 : 60
  if (column !== input.insulationRatingC)
    notes.push(`insulation rated ${input.insulationRatingC} °C read in the ${column} °C column (Table 310.16 has 60, 75 and 90 °C columns)`)
  const base = (copper ? NEC_310_16_COPPER_A : NEC_310_16_ALUMINIUM_A)[row]?.[necColumnIndex(column)] ?? null
  if (base === null)
    return unavailable(table, `Table 310.16 has no ${column} °C value for ${getConductorSize(row).label} ${copper ? 'copper' : 'aluminium'}`, notes, row)

  const factors: AmpacityFactor[] = []
  const ambient = necAmbientFactor(input.ambientC, column)
  if (ambient !== 1) factors.push({ name: `ambient ${input.ambientC} °C, ${column} °C insulation`, value: ambient, source: NEC_AMBIENT_SOURCE })
  if (ambient === 0) notes.push(`the table does not permit ${column} °C conductors at ${input.ambientC} °C ambient`)
  const count = input.bundledCount ?? 1
  const adjustment = necAdjustmentFactor(count)
  if (adjustment !== 1) factors.push({ name: `${count} current-carrying conductors together`, value: adjustment, source: NEC_ADJUSTMENT_SOURCE })
  if (input.installation === 'free-air' && count > 1) notes.push('free-air run with several conductors: the adjustment for their count is applied')
  if (input.installation === 'free-air')
    notes.push('Table 310.16 (raceway, cable or earth) used for free air: conservative, the free-air table 310.17 is not on file')
  if (input.installation === 'engine-space') notes.push('the NEC has no engine-space rule; the ambient entered is used')
  notes.push('check terminations: NEC 110.14(C) may limit the column to 60 °C or 75 °C')
  return { ampacityA: applyFactors(base, factors), baseAmpacityA: base, factors, table, rowSizeId: row, columnC: column, notes }
}

function boatTableAmpacity(input: AmpacityInput): AmpacityResult {
  const notes: string[] = []
  const table = CFR_183_425_SOURCE
  if (input.profile === 'vehicle')
    notes.push(
      'vehicle profile: no public vehicle ampacity table; 33 CFR 183.425 Table 5 applied (common practice). SAE J1127/J1128 cable has less copper than the AWG size of the same number',
    )
  if (input.material === 'aluminium')
    return unavailable(table, '33 CFR 183.425(a) requires stranded copper; Table 5 has no aluminium values', notes)
  const row = tableRow(input.sizeId, notes)
  if (!row) return unavailable(table, `${getConductorSize(input.sizeId).label} is smaller than the smallest row (18 AWG)`, notes)
  const column = input.insulationRatingC
  const base = CFR_183_425_TABLE_5_A[row]?.[cfrColumnIndex(column)] ?? null
  if (base === null) return unavailable(table, `Table 5 has no value for ${getConductorSize(row).label}`, notes, row)

  const factors: AmpacityFactor[] = []
  if (input.installation === 'engine-space') {
    const engine = engineSpaceFactor(column)
    factors.push({ name: `engine space (${ENGINE_SPACE_AMBIENT_C} °C), ${column} °C insulation`, value: engine.value, source: `33 CFR 183.425(c) and Table 5 Note 1: ${engine.status}` })
    if (input.ambientC > ENGINE_SPACE_AMBIENT_C) {
      const hotter = ambientCorrectionFormula(column, input.ambientC) / engine.value
      factors.push({ name: `engine space hotter than ${ENGINE_SPACE_AMBIENT_C} °C (${input.ambientC} °C)`, value: Math.min(1, hotter), source: hotterSource(column, input.ambientC) })
    }
  } else if (input.ambientC > 30) {
    const value = ambientCorrectionFormula(column, input.ambientC)
    factors.push({ name: `ambient ${input.ambientC} °C above the table's 30 °C`, value, source: hotterSource(column, input.ambientC) })
  } else if (input.ambientC < 30) {
    notes.push('no credit taken for an ambient below the table\'s 30 °C (conservative)')
  }
  if (factors.some((f) => f.value === 0)) notes.push(`the ambient reaches the ${column} °C insulation rating: no current is allowed`)

  const count = input.bundledCount ?? 1
  const bundling = uscgBundlingFactor(count)
  if (bundling !== 1) {
    const atOrAbove50 = (input.circuitVoltageV ?? 0) >= 50
    factors.push({
      name: `${count} conductors bundled`,
      value: bundling,
      source: atOrAbove50
        ? USCG_BUNDLING_SOURCE
        : `${USCG_BUNDLING_SOURCE}. That source sets no bundling limit below 50 V; we apply the ≥ 50 V factors below 50 V too (our conservative choice, common practice)`,
    })
  }
  return { ampacityA: applyFactors(base, factors), baseAmpacityA: base, factors, table, rowSizeId: row, columnC: column, notes }
}

function hotterSource(column: number, ambientC: number): string {
  return `computed √((${column} − ${ambientC})/(${column} − 30)), the NEC ambient formula applied to Table 5's 30 °C basis (our extension; Table 5 itself gives only the 30 °C and engine-space values)`
}
