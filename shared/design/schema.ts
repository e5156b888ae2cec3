import { z } from 'zod'
import { conductorSizeIdSchema, materialSchema } from './enums'
import { ID_PATTERN } from './ids'
import { choice, flag, labelText, quantity } from './fields'
import * as P from './params'
import { DESIGN_FORMAT_ID, DESIGN_FORMAT_VERSION } from './version'
import { migrateDesign } from './migrate'
import { checkCrossReferences } from './crossref'
import { formatIssuePath, friendlyDefaultMessage } from './issues'

export { DESIGN_FORMAT_ID, DESIGN_FORMAT_VERSION }

// The design document (format version 1): parts with terminals, conductors between terminals,
// and operating scenarios. docs/design-format.md describes every field for people.

/** Size limits that keep a hostile or corrupt file from exhausting the solver. */
export const DESIGN_LIMITS = { parts: 2000, conductors: 5000, scenarios: 50, nameChars: 120 } as const

export const PART_TYPES = [
  'battery', 'pv-array', 'charge-controller', 'dc-dc-charger', 'mains-charger', 'inverter', 'bus-bar',
  'fuse-panel', 'fuse', 'breaker', 'battery-switch', 'shunt', 'load',
] as const
export type PartType = (typeof PART_TYPES)[number]
export const partTypeSchema = z.enum(PART_TYPES, { error: `Choose a part type: ${PART_TYPES.join(', ')}` })

export const idSchema = z
  .string({ error: 'Enter an id' })
  .regex(ID_PATTERN, 'An id is 1–64 letters, digits, "-" or "_", starting with a letter or digit')

export const NOMINAL_SYSTEM_VOLTAGES_V = [12, 24, 48] as const
export const designSettingsSchema = z.object({
  nominalVoltageV: z.union([z.literal(12), z.literal(24), z.literal(48)], { error: 'Choose a system voltage of 12, 24 or 48 V' }),
  unitSystem: choice('unit system', ['metric', 'imperial'] as const).default('metric'),
  profile: choice('installation profile', ['marine', 'vehicle', 'building'] as const),
  /** Ambient for conductors that give none; 30 °C is the basis of NEC Table 310.16 and 33 CFR 183.425. */
  defaultAmbientC: quantity('default ambient temperature', '°C', { min: -40, max: 80 }).default(30),
})

const positionSchema = z.object({
  x: quantity('x position', '', { min: -1e6, max: 1e6 }),
  y: quantity('y position', '', { min: -1e6, max: 1e6 }),
})

function partOf<const T extends PartType, S extends z.ZodType>(type: T, params: S) {
  return z.object({
    id: idSchema,
    type: z.literal(type),
    label: labelText('part label').default(''),
    position: positionSchema,
    params,
  })
}

export const partSchema = z.discriminatedUnion(
  'type',
  [
    partOf('battery', P.batteryParamsSchema),
    partOf('pv-array', P.pvArrayParamsSchema),
    partOf('charge-controller', P.chargeControllerParamsSchema),
    partOf('dc-dc-charger', P.dcDcChargerParamsSchema),
    partOf('mains-charger', P.mainsChargerParamsSchema),
    partOf('inverter', P.inverterParamsSchema),
    partOf('bus-bar', P.busBarParamsSchema),
    partOf('fuse-panel', P.fusePanelParamsSchema),
    partOf('fuse', P.fuseParamsSchema),
    partOf('breaker', P.breakerParamsSchema),
    partOf('battery-switch', P.batterySwitchParamsSchema),
    partOf('shunt', P.shuntParamsSchema),
    partOf('load', P.loadParamsSchema),
  ],
  { error: `Choose a part type: ${PART_TYPES.join(', ')}` },
)

export const terminalRefSchema = z.object({
  partId: idSchema,
  terminal: z.string({ error: 'Enter the terminal id' }).min(1, 'Enter the terminal id').max(16, 'Terminal ids are short, e.g. "pos"'),
})

export const INSULATION_RATINGS_C = [60, 75, 90, 105, 125, 200] as const
export const INSTALLATION_METHODS = ['free-air', 'bundled', 'conduit', 'engine-space'] as const

export const conductorSchema = z.object({
  id: idSchema,
  label: labelText('conductor label').default(''),
  from: terminalRefSchema,
  to: terminalRefSchema,
  sizeId: conductorSizeIdSchema,
  material: materialSchema.default('copper'),
  /** One way; voltage drop uses the conductor's own path (the return is its own conductor). */
  lengthM: quantity('length', 'm', { min: 0, max: 500, minExclusive: true }),
  insulationRatingC: z
    .union(INSULATION_RATINGS_C.map((c) => z.literal(c)), { error: `Choose an insulation rating: ${INSULATION_RATINGS_C.join(', ')} °C` })
    .default(105),
  installation: choice('installation', INSTALLATION_METHODS).default('free-air'),
  bundledCount: quantity('conductors in the bundle', '', { min: 1, max: 100, int: true }).default(1),
  /** null → settings.defaultAmbientC. */
  ambientC: quantity('ambient temperature', '°C', { min: -40, max: 120 }).nullable().default(null),
  colour: labelText('colour', 30).optional(),
  /** Sheathed or in conduit for its whole length (allows the longer protection distances). */
  sheathed: flag('Sheathed or in conduit', 'it is sheathed or in conduit for its whole length').default(false),
})

export const scenarioLoadSchema = z.object({
  on: flag('On', 'the load runs in this scenario'),
  level: quantity('load level', '', { min: 0, max: 1 }).default(1),
})

/** A load level as a form asks for it, in per cent (the document stores the fraction percent / 100). */
export const scenarioLevelPercentSchema = quantity('load level', '%', { min: 0, max: 100 })

export const scenarioSchema = z.object({
  id: idSchema,
  name: labelText('scenario name').min(1, 'Enter the scenario name'),
  sunOn: flag('Sun on the arrays', 'the sun is on the array').default(false),
  chargerOn: flag('Mains charging available', 'mains charging is available').default(false),
  /** Keyed by load, inverter or charger part id (see crossref.ts); parts not listed are off. */
  loads: z.record(z.string(), scenarioLoadSchema, { error: 'List loads as an object keyed by part id' }).default({}),
  motorStart: flag('Motor start', 'motor loads are starting').optional(),
})

export const designSchema = z.object({
  format: z.literal(DESIGN_FORMAT_ID, { error: `Not an Ampwright design (format must be "${DESIGN_FORMAT_ID}")` }),
  version: z.literal(DESIGN_FORMAT_VERSION, { error: `Unsupported format version (expected ${DESIGN_FORMAT_VERSION})` }),
  id: idSchema,
  name: labelText('design name', DESIGN_LIMITS.nameChars).min(1, 'Enter the design name'),
  settings: designSettingsSchema,
  parts: z.array(partSchema).max(DESIGN_LIMITS.parts, `A design holds at most ${DESIGN_LIMITS.parts} parts`),
  conductors: z.array(conductorSchema).max(DESIGN_LIMITS.conductors, `A design holds at most ${DESIGN_LIMITS.conductors} conductors`),
  scenarios: z
    .array(scenarioSchema)
    .min(1, 'Add at least one scenario')
    .max(DESIGN_LIMITS.scenarios, `A design holds at most ${DESIGN_LIMITS.scenarios} scenarios`),
})

export type Design = z.output<typeof designSchema>
export type DesignInput = z.input<typeof designSchema>
export type DesignSettings = z.output<typeof designSettingsSchema>
export type Part = z.output<typeof partSchema>
export type PartOf<T extends PartType> = Extract<Part, { type: T }>
export type Conductor = z.output<typeof conductorSchema>
export type Scenario = z.output<typeof scenarioSchema>
export type ScenarioLoad = z.output<typeof scenarioLoadSchema>
export type TerminalRef = z.output<typeof terminalRefSchema>

export interface DesignError {
  /** Where in the document, e.g. "parts[3].params.capacityAh"; "" for the document itself. */
  path: string
  message: string
}
export type ParseDesignResult = { ok: true; design: Design; migratedFrom?: number } | { ok: false; errors: DesignError[] }

/**
 * Validate a design from any source (file, API body, Yjs snapshot): migrate older versions, check
 * the shape, then cross-references. Never throws.
 * @example
 * const r = parseDesign(JSON.parse(text))
 * if (!r.ok) for (const e of r.errors) console.log(e.path, e.message)
 */
export function parseDesign(input: unknown): ParseDesignResult {
  try {
    const migrated = migrateDesign(input)
    if (!migrated.ok) return { ok: false, errors: migrated.errors }
    const parsed = designSchema.safeParse(migrated.design, { error: friendlyDefaultMessage })
    if (!parsed.success) {
      return { ok: false, errors: parsed.error.issues.map((i) => ({ path: formatIssuePath(i.path), message: i.message })) }
    }
    const crossErrors = checkCrossReferences(parsed.data)
    if (crossErrors.length > 0) return { ok: false, errors: crossErrors }
    return migrated.fromVersion === DESIGN_FORMAT_VERSION
      ? { ok: true, design: parsed.data }
      : { ok: true, design: parsed.data, migratedFrom: migrated.fromVersion }
  } catch {
    return { ok: false, errors: [{ path: '', message: 'The design could not be read (unexpected content)' }] }
  }
}
