import type { PartOf } from '../../design/schema'
import { finite } from './finite'

// Electrical figures of sources derived from part parameters. Pure; every result finite.

/** Thevenin equivalent of a bank: EMF adds in series, resistance scales series ÷ parallel. */
export function batteryThevenin(p: PartOf<'battery'>['params']): { emfV: number; resistanceOhm: number } {
  const perUnitV = p.stateOfChargeVoltageV ?? p.nominalVoltageV
  const series = Math.max(1, p.seriesCount)
  const parallel = Math.max(1, p.parallelCount)
  return {
    emfV: finite(perUnitV * series),
    // Ohm's law for series/parallel strings (standards.md §7: series strings add, parallel strings divide).
    resistanceOhm: finite((p.internalResistanceOhm * series) / parallel, 0.001),
  }
}

/**
 * Highest charging voltage per cell, V (recalled, unverified; typical manufacturer absorption or
 * equalisation set-points): LFP 3.65, lead-acid 2.5 (equalise), NMC 4.2. Used only for the
 * "highest system voltage" a device must be rated for, so a high figure errs on the safe side.
 */
const CELL = {
  lfp: { nominalV: 3.2, maxChargeV: 3.65 },
  agm: { nominalV: 2.0, maxChargeV: 2.5 },
  flooded: { nominalV: 2.0, maxChargeV: 2.5 },
  gel: { nominalV: 2.0, maxChargeV: 2.5 },
  nmc: { nominalV: 3.6, maxChargeV: 4.2 },
} as const

/** The bank's highest voltage on charge. */
export function batteryMaxChargeV(p: PartOf<'battery'>['params']): number {
  const cell = CELL[p.chemistry] ?? CELL.lfp
  const cellsPerUnit = Math.max(1, Math.round(p.nominalVoltageV / cell.nominalV))
  return finite(cellsPerUnit * cell.maxChargeV * Math.max(1, p.seriesCount))
}

/**
 * NEC 690.7(A)(1) coefficient method: Voc,max = N × Voc,STC × [1 + β (T_min − 25 °C)], β in %/°C.
 * @example pvMaxVoltageV({ moduleVocV: 37, vocTempCoeffPctPerC: -0.27, modulesPerString: 3, recordLowC: -10 }) // 121.5
 */
export function pvMaxVoltageV(p: Pick<PartOf<'pv-array'>['params'], 'moduleVocV' | 'vocTempCoeffPctPerC' | 'modulesPerString' | 'recordLowC'>): number {
  const factor = 1 + (p.vocTempCoeffPctPerC / 100) * (p.recordLowC - 25)
  return finite(p.modulesPerString * p.moduleVocV * Math.max(1, factor))
}

/** NEC 690.8(A)(1): the maximum PV source-circuit current, Σ Isc × 1.25. */
export function pvMaxCircuitCurrentA(p: Pick<PartOf<'pv-array'>['params'], 'moduleIscA' | 'strings'>, strings = p.strings): number {
  return finite(p.moduleIscA * strings * 1.25)
}
