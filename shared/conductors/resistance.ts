import { getMaterial, MATERIALS, type Material } from './materials'
import { getConductorSize, type ConductorSizeId } from './sizes'
import { IEC_60228_MAX_RESISTANCE_20C } from './iec60228'
import { MM2_PER_CMIL } from '../units/area'
import { ConductorInputError, requireFinite, requireNonNegative } from './_lib/inputs'

/**
 * Stranding lay factor for AWG conductors. The strands of a concentric-lay conductor are helices, so
 * each strand is longer than the cable and the resistance per metre of cable is higher than that of a
 * solid rod of the same area. NEC Chapter 9 Table 8 shows stranded ÷ solid = 1.018–1.026 for 18–8 AWG
 * copper (standards.md §2). 1.02 sits in that band and reproduces the whole stranded column, 18–4/0 AWG,
 * within 0.6 % (tests/reference/tables/necChapter9Table8.test.ts) [C].
 */
export const STRANDING_LAY_FACTOR = 1.02

/** Range over which the linear ρ(T) model is used, °C. */
export const MIN_TEMPERATURE_C = -100
export const MAX_TEMPERATURE_C = 300

/**
 * Tinned (coated-strand) ÷ plain resistance for AWG conductors. The ratio depends on strand size:
 * NEC Chapter 9 Table 8 coated ÷ uncoated stranded copper = 1.030–1.063 over 18–4/0 AWG (highest for
 * the thin strands of 18 and 16 AWG). 1.05 puts every AWG size within 2 % of Table 8's coated column
 * [C]. Metric sizes use the IEC 60228 metal-coated columns directly instead.
 */
export const AWG_COATED_TO_PLAIN_RATIO = 1.05

/**
 * IEC 60228 class for metric conductors: 2 = stranded (building wire), 5 = flexible (most boat and vehicle
 * cable; 3–7 % more resistance than class 2 of the same size).
 */
export type IecConductorClass = 2 | 5

export interface ResistanceInput {
  sizeId: ConductorSizeId
  material: Material
  /** one-way length of this conductor, m (a circuit's loop has two) */
  lengthM: number
  /** conductor temperature, °C */
  temperatureC: number
  /** metric sizes only; default 2 */
  iecClass?: IecConductorClass
  /**
   * AWG sizes only: whose area the gauge number means. 'astm-b258' (default) for building wire and boat
   * cable; 'sae-j1128' for automotive cable, which has 5–12 % less copper than the AWG size of that number.
   */
  gaugeStandard?: GaugeStandard
}

export type GaugeStandard = 'astm-b258' | 'sae-j1128'

export interface ResistanceBasis {
  /** Ω per metre at 20 °C */
  ohmPerMAt20: number
  method: string
  source: string
}

/**
 * Resistance per metre at 20 °C and how it was obtained.
 * - AWG: ρ20 / A × lay factor, A from the ASTM B258 diameter formula.
 * - metric: the IEC 60228 maximum resistance of the size and class; aluminium scales the plain-copper
 *   value by ρAl/ρCu (no verified IEC 60228 aluminium figures on file).
 */
export function resistanceBasis(
  sizeId: ConductorSizeId, material: Material, iecClass: IecConductorClass = 2, gaugeStandard: GaugeStandard = 'astm-b258',
): ResistanceBasis {
  const size = getConductorSize(sizeId)
  const m = getMaterial(material)
  if (size.system === 'awg') {
    const tinned = material === 'tinned-copper'
    const rho = tinned ? MATERIALS.copper.resistivity20OhmMm2PerM * AWG_COATED_TO_PLAIN_RATIO : m.resistivity20OhmMm2PerM
    const sae = gaugeStandard === 'sae-j1128'
    if (sae && size.saeAreaCmil === undefined)
      throw new ConductorInputError('gaugeStandard', `no SAE J1127/J1128 area on file for ${size.label}`)
    const areaMm2 = sae ? size.saeAreaCmil! * MM2_PER_CMIL : size.areaMm2
    return {
      ohmPerMAt20: (rho / areaMm2) * STRANDING_LAY_FACTOR,
      method:
        `ρ20 / A × ${STRANDING_LAY_FACTOR} (stranding lay factor), A = ${areaMm2.toFixed(3)} mm² (${sae ? 'SAE J1127/J1128' : 'ASTM B258'})` +
        (tinned ? `, × ${AWG_COATED_TO_PLAIN_RATIO} coated-strand ratio` : ''),
      source:
        `${tinned ? MATERIALS.copper.source : m.source}; lay factor` +
        (tinned ? ' and coated-strand ratio' : '') +
        ' from NEC Ch. 9 Table 8 column ratios',
    }
  }
  const row = IEC_60228_MAX_RESISTANCE_20C[sizeId]
  if (!row) throw new RangeError(`No IEC 60228 resistance on file for ${size.label}`)
  const table = `IEC 60228 class ${iecClass} maximum resistance at 20 °C`
  if (material === 'aluminium') {
    const plain = iecClass === 2 ? row.class2PlainOhmPerKm : row.class5PlainOhmPerKm
    const ratio = m.resistivity20OhmMm2PerM / MATERIALS.copper.resistivity20OhmMm2PerM
    return {
      ohmPerMAt20: (plain / 1000) * ratio,
      method: `${table} (plain copper) × ρAl/ρCu = ${ratio.toFixed(4)}`,
      source: `${table}; ${m.source}`,
    }
  }
  const tinned = material === 'tinned-copper'
  const ohmPerKm =
    iecClass === 2
      ? tinned ? row.class2MetalCoatedOhmPerKm : row.class2PlainOhmPerKm
      : tinned ? row.class5TinnedOhmPerKm : row.class5PlainOhmPerKm
  return {
    ohmPerMAt20: ohmPerKm / 1000,
    method: `${table}, ${tinned ? 'metal-coated' : 'plain'} copper`,
    source: table,
  }
}

/**
 * DC resistance of one conductor, Ω: R = R20 × (1 + α20 × (T − 20)) × L.
 * @example conductorResistanceOhm({ sizeId: 'awg-10', material: 'copper', lengthM: 6, temperatureC: 30 }) // ≈ 0.0209
 */
export function conductorResistanceOhm(input: ResistanceInput): number {
  requireNonNegative(input.lengthM, 'lengthM')
  return resistancePerMetreOhm(input) * input.lengthM
}

/** Ω per metre of one conductor at its temperature. */
export function resistancePerMetreOhm(input: Omit<ResistanceInput, 'lengthM'>): number {
  requireFinite(input.temperatureC, 'temperatureC')
  // The linear model holds from cryogenic-free ambient to insulation limits; outside it we refuse.
  if (input.temperatureC < MIN_TEMPERATURE_C || input.temperatureC > MAX_TEMPERATURE_C)
    throw new ConductorInputError('temperatureC', `must be between ${MIN_TEMPERATURE_C} and ${MAX_TEMPERATURE_C} °C`)
  const m = getMaterial(input.material)
  const basis = resistanceBasis(input.sizeId, input.material, input.iecClass ?? 2, input.gaugeStandard ?? 'astm-b258')
  return basis.ohmPerMAt20 * (1 + m.alpha20PerC * (input.temperatureC - 20))
}
