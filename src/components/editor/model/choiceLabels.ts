import { DEVICE_FAMILIES } from '@shared/protection/families'
import { MATERIALS } from '@shared/conductors/materials'

// Words a person reads for the enum values of parameters and conductor fields.

const WORDS: Record<string, string> = {
  lfp: 'Lithium iron phosphate (LFP)',
  nmc: 'Lithium NMC',
  agm: 'Lead-acid, AGM',
  gel: 'Lead-acid, gel',
  flooded: 'Lead-acid, flooded',
  power: 'Constant power',
  current: 'Constant current',
  resistance: 'Resistance',
  continuous: 'Continuous',
  intermittent: 'Intermittent',
  positive: 'Positive (+)',
  negative: 'Negative (−)',
  'free-air': 'Free air',
  bundled: 'Bundled',
  conduit: 'In conduit',
  'engine-space': 'Engine space',
  metric: 'Metric (m, mm², °C)',
  imperial: 'Imperial (ft, AWG, °F)',
  marine: 'Marine',
  vehicle: 'Vehicle',
  building: 'Building',
}

export function choiceLabel(value: string): string {
  const family = (DEVICE_FAMILIES as Record<string, { label: string } | undefined>)[value]
  if (family) return family.label
  const material = (MATERIALS as Record<string, { label: string } | undefined>)[value]
  if (material) return material.label
  return WORDS[value] ?? value.charAt(0).toUpperCase() + value.slice(1).replace(/-/g, ' ')
}
