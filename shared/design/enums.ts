import { z } from 'zod'
import { CONDUCTOR_SIZE_IDS } from '../conductors/sizes'
import { MATERIAL_IDS } from '../conductors/materials'

// Enums the design format shares with other modules, wrapped with messages a person can act on.
// The id lists come from their owners (shared/conductors). DEVICE_FAMILY_IDS is a TEMPORARY copy of
// shared/protection/ratings.ts's list (that module is still being written); switch to importing it.

export const conductorSizeIdSchema = z.enum(CONDUCTOR_SIZE_IDS, {
  error: 'Choose a conductor size such as awg-10 or mm2-16',
})

export const materialSchema = z.enum(MATERIAL_IDS, { error: 'Choose copper, tinned-copper or aluminium' })

const DEVICE_FAMILY_IDS = [
  'blade-mini', 'blade-regular', 'blade-large',
  'cartridge-5x20-fast', 'cartridge-5x20-delay', 'cartridge-6x32-fast', 'cartridge-6x32-delay',
  'strip-bolt-down', 'battery-terminal', 'class-t', 'pv-10x38',
  'breaker-thermal-1', 'breaker-thermal-2', 'breaker-thermal-3', 'breaker-magnetic-hydraulic',
] as const

/** Protective-device families (fuse and breaker kinds) as defined in shared/protection. */
export const deviceFamilySchema = z.enum(DEVICE_FAMILY_IDS, { error: `Choose a protective-device family: ${DEVICE_FAMILY_IDS.join(', ')}` })
