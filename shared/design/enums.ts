import { z } from 'zod'
import { CONDUCTOR_SIZE_IDS } from '../conductors/sizes'
import { MATERIAL_IDS } from '../conductors/materials'
import { DEVICE_FAMILY_IDS } from '../protection/ratings'

// Enums the design format shares with other modules, wrapped with messages a person can act on.
// The id lists come from their owners (shared/conductors, shared/protection).

export const conductorSizeIdSchema = z.enum(CONDUCTOR_SIZE_IDS, {
  error: 'Choose a conductor size such as awg-10 or mm2-16',
}).meta({ label: 'Size', kind: 'choice', options: CONDUCTOR_SIZE_IDS })

export const materialSchema = z
  .enum(MATERIAL_IDS, { error: 'Choose copper, tinned-copper or aluminium' })
  .meta({ label: 'Material', kind: 'choice', options: MATERIAL_IDS })

/** Protective-device families (fuse and breaker kinds) as defined in shared/protection. */
export const deviceFamilySchema = z
  .enum(DEVICE_FAMILY_IDS, { error: `Choose a protective-device family: ${DEVICE_FAMILY_IDS.join(', ')}` })
  .meta({ label: 'Device family', kind: 'choice', options: DEVICE_FAMILY_IDS })
