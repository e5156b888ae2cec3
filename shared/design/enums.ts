import { z } from 'zod'

// TEMPORARY stand-ins for enums owned by other modules. Switch these imports to
// `../conductors/sizes` (conductorSizeIdSchema), `../conductors/materials` (materialSchema) and
// `../protection/ratings` (deviceFamilySchema) once those files land; the ids below are the ones
// the design format documents, so the switch must keep them valid.

/** Conductor size ids: AWG gauges (ASTM B258 series) and metric sizes (IEC 60228 series). */
export const CONDUCTOR_SIZE_IDS = [
  'awg-18', 'awg-16', 'awg-14', 'awg-12', 'awg-10', 'awg-8', 'awg-6', 'awg-4', 'awg-3', 'awg-2', 'awg-1',
  'awg-1/0', 'awg-2/0', 'awg-3/0', 'awg-4/0',
  'mm2-0.5', 'mm2-0.75', 'mm2-1', 'mm2-1.5', 'mm2-2.5', 'mm2-4', 'mm2-6', 'mm2-10', 'mm2-16', 'mm2-25',
  'mm2-35', 'mm2-50', 'mm2-70', 'mm2-95', 'mm2-120',
] as const
export const conductorSizeIdSchema = z.enum(CONDUCTOR_SIZE_IDS, {
  error: 'Choose a conductor size such as awg-10 or mm2-16',
})

export const MATERIALS = ['copper', 'tinned-copper', 'aluminium'] as const
export const materialSchema = z.enum(MATERIALS, { error: 'Choose copper, tinned-copper or aluminium' })

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
