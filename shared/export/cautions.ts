import type { Design } from '../design/schema'

// The cautions every deliverable carries (DESIGN.md "Cautions"): always the general one, plus
// lithium and high-voltage PV notes where the design calls for them.

export const GENERAL_CAUTION =
  'Caution: these results are design aids. The installer remains responsible; local codes, the authority having ' +
  'jurisdiction and licensed practice prevail.'

/** Strings above this open-circuit voltage get a shock-hazard caution (common practice: 60 V DC is the
 * usual upper bound of touch-safe extra-low voltage in dry locations; IEC 60364-4-41 ELV band recalled, unverified). */
export const PV_CAUTION_ABOVE_V = 60

export const LITHIUM_CAUTION =
  "Lithium batteries: their fault current can exceed what common fuses interrupt; follow the battery maker's " +
  'instructions for its BMS, main fuse (interrupting rating), charging limits, ventilation and installation ' +
  '(common practice; for boats see ABYC E-13, recalled).'

/** String open-circuit voltage at the record low: N × Voc × (1 + β/100 × (Tmin − 25 °C)) (NEC 690.7(A), coefficient method). */
export function stringVocAtRecordLowV(p: {
  modulesPerString: number
  moduleVocV: number
  vocTempCoeffPctPerC: number
  recordLowC: number
}): number {
  return p.modulesPerString * p.moduleVocV * (1 + (p.vocTempCoeffPctPerC / 100) * (p.recordLowC - 25))
}

export function designCautions(design: Design): string[] {
  const cautions = [GENERAL_CAUTION]
  if (design.parts.some((p) => p.type === 'battery' && (p.params.chemistry === 'lfp' || p.params.chemistry === 'nmc'))) {
    cautions.push(LITHIUM_CAUTION)
  }
  for (const p of design.parts) {
    if (p.type !== 'pv-array') continue
    const vocMaxV = stringVocAtRecordLowV(p.params)
    if (vocMaxV > PV_CAUTION_ABOVE_V) {
      cautions.push(
        `High-voltage PV: ${p.label || p.id} can reach ${vocMaxV.toFixed(0)} V DC open circuit at its record low of ` +
          `${p.params.recordLowC} °C (NEC 690.7(A)); above ${PV_CAUTION_ABOVE_V} V treat its wiring as a shock hazard and ` +
          'use PV-rated disconnects and fuses (common practice).',
      )
    }
  }
  return cautions
}
