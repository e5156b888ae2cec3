import { z } from 'zod'

/**
 * Which body of rules a design is checked against:
 * - building: NEC (NFPA 70) tables, for cabins and other fixed installations;
 * - marine: 33 CFR 183 subpart I / ABYC E-11 / ISO 10133;
 * - vehicle: no public ampacity table exists for RV and van DC wiring; the marine tables are applied
 *   (common practice).
 */
export const CODE_PROFILES = ['marine', 'vehicle', 'building'] as const
export const codeProfileSchema = z.enum(CODE_PROFILES)
export type CodeProfile = z.infer<typeof codeProfileSchema>

/** How a conductor run is installed, for ampacity. */
export const INSTALLATIONS = ['free-air', 'bundled', 'conduit', 'engine-space'] as const
export const installationSchema = z.enum(INSTALLATIONS)
export type Installation = z.infer<typeof installationSchema>

/** Insulation temperature ratings found in the ampacity tables, °C. */
export const INSULATION_RATINGS_C = [60, 75, 80, 90, 105, 125, 200] as const
export type InsulationRatingC = (typeof INSULATION_RATINGS_C)[number]
export const insulationRatingSchema = z.union(INSULATION_RATINGS_C.map((c) => z.literal(c)) as [
  z.ZodLiteral<60>, z.ZodLiteral<75>, z.ZodLiteral<80>, z.ZodLiteral<90>, z.ZodLiteral<105>, z.ZodLiteral<125>, z.ZodLiteral<200>,
])
