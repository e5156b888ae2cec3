import { z } from 'zod'
import { CONDUCTOR_SIZE_IDS } from '../conductors/sizes'
import { MATERIAL_IDS } from '../conductors/materials'

// Enums the design format shares with other modules, wrapped with messages a person can act on.
// The id lists come from their owners (shared/conductors); the device families are a TEMPORARY
// stand-in until shared/protection/ratings.ts exports deviceFamilySchema — switch then.

export const conductorSizeIdSchema = z.enum(CONDUCTOR_SIZE_IDS, {
  error: 'Choose a conductor size such as awg-10 or mm2-16',
})

export const materialSchema = z.enum(MATERIAL_IDS, { error: 'Choose copper, tinned-copper or aluminium' })

/** Generic protective-device families, named by standard or by plain description (no trade names). */
export const DEVICE_FAMILIES = [
  'blade-mini', // ISO 8820-3 type F (miniature)
  'blade-regular', // ISO 8820-3 type C (medium)
  'blade-maxi', // ISO 8820-3 type E (high current)
  'glass-cartridge-6x32', // SAE J554 / IEC 60127 6.3 × 32 mm
  'bolt-down-strip', // bolt-down strip fuse, large
  'bolt-in-strip', // bolt-in strip fuse, mid current
  'terminal-mount', // battery-terminal-mount fuse
  'class-t', // UL 248-15 Class T
  'pv-fuse-10x38', // IEC 60269-6 gPV / UL 2579, 10 × 38 mm
  'breaker-sae-j553-type-i', // SAE J553 type I, automatic reset
  'breaker-sae-j553-type-ii', // SAE J553 type II, modified reset
  'breaker-sae-j553-type-iii', // SAE J553 type III, manual reset
  'breaker-dc-mcb', // DC miniature circuit breaker, IEC 60898-2 / IEC 60947-2
] as const
export const deviceFamilySchema = z.enum(DEVICE_FAMILIES, { error: 'Choose a protective-device family' })
