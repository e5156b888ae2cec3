import { z } from 'zod'

// Conductor materials: resistivity at 20 °C and its temperature coefficient α20.
// Resistance at T: ρ(T) = ρ20 × (1 + α20 × (T − 20 °C)) (linear model; good to well under 1 % from
// −40 °C to 150 °C for copper and aluminium).

export const MATERIAL_IDS = ['copper', 'tinned-copper', 'aluminium'] as const
export const materialSchema = z.enum(MATERIAL_IDS)
export type Material = z.infer<typeof materialSchema>

export interface MaterialData {
  id: Material
  label: string
  /** Ω·mm²/m at 20 °C */
  resistivity20OhmMm2PerM: number
  /** per °C, referred to 20 °C */
  alpha20PerC: number
  source: string
}

/** Annealed copper, IEC 60028 (International Annealed Copper Standard): 1/58 Ω·mm²/m, α20 = 0.00393 /°C. */
const COPPER_RESISTIVITY_20 = 1 / 58

/**
 * Tinned (metal-coated) copper / plain copper, from the IEC 60228 maximum-resistance tables
 * (standards.md §3): class 2 metal-coated ÷ plain = 1.005–1.020 and class 5 tinned ÷ plain = 1.018–1.030
 * over 0.75–120 mm². We take 1.02: above every class 2 ratio and the class 5 median — a computed ratio
 * [C], not a figure printed in the standard. This is the bulk material value; conductor resistance
 * (resistance.ts) reads the coated columns of IEC 60228 for metric sizes and applies NEC Chapter 9
 * Table 8's coated-strand ratio for AWG sizes, because the ratio grows as strands get thinner.
 */
export const TINNED_TO_PLAIN_RESISTANCE_RATIO = 1.02

export const MATERIALS: Readonly<Record<Material, MaterialData>> = {
  copper: {
    id: 'copper',
    label: 'Copper',
    resistivity20OhmMm2PerM: COPPER_RESISTIVITY_20,
    alpha20PerC: 0.00393,
    source: 'IEC 60028 (annealed copper standard): ρ20 = 1/58 Ω·mm²/m, α20 = 0.00393 /°C',
  },
  'tinned-copper': {
    id: 'tinned-copper',
    label: 'Tinned copper',
    resistivity20OhmMm2PerM: COPPER_RESISTIVITY_20 * TINNED_TO_PLAIN_RESISTANCE_RATIO,
    // The tin coat is a small fraction of the section; the copper's coefficient is kept (recalled practice).
    alpha20PerC: 0.00393,
    source:
      'IEC 60028 copper × 1.02, the IEC 60228 metal-coated/plain resistance ratio (computed from its tables); α20 of copper',
  },
  aluminium: {
    id: 'aluminium',
    label: 'Aluminium',
    resistivity20OhmMm2PerM: 0.028264,
    alpha20PerC: 0.00403,
    source:
      'Aluminium at 61 % IACS (IEC 60028 companion table, Industrial Power Engineering Handbook Table 30.1): ρ20 = 1/(58 × 0.61) = 0.028264 Ω·mm²/m, α20 = 0.00403 /°C; agrees with NEC Ch. 9 Table 8 note α75 = 0.00330',
  },
}

export function getMaterial(id: Material): MaterialData {
  const material = MATERIALS[id]
  if (!material) throw new RangeError(`Unknown conductor material "${String(id)}". Expected one of: ${MATERIAL_IDS.join(', ')}`)
  return material
}

/** Resistivity at a conductor temperature, Ω·mm²/m. */
export function resistivityOhmMm2PerM(material: Material, temperatureC: number): number {
  const m = getMaterial(material)
  return m.resistivity20OhmMm2PerM * (1 + m.alpha20PerC * (temperatureC - 20))
}
