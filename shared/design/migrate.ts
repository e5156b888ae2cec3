import { DESIGN_FORMAT_ID, DESIGN_FORMAT_VERSION } from './version'

// Upgrading stored designs. Each migration takes a document of version N and returns version
// N + 1; `migrateDesign` chains them up to DESIGN_FORMAT_VERSION. Migrations work on plain JSON
// and never throw: anything they cannot make sense of is passed along for the schema to report.
//
// Adding version 2: write `v1ToV2(doc)` below, register it as MIGRATIONS[1], bump
// DESIGN_FORMAT_VERSION in version.ts, change the schema, and add a test that a v1 example file
// still parses (docs/design-format.md, "Versioning").

type Json = Record<string, unknown>
type Migration = (doc: Json) => Json
type MigrateResult = { ok: true; design: Json; fromVersion: number } | { ok: false; errors: { path: string; message: string }[] }

const isObject = (value: unknown): value is Json => typeof value === 'object' && value !== null && !Array.isArray(value)
const asArray = (value: unknown): unknown[] | undefined => (Array.isArray(value) ? value : undefined)

/** "bat1.pos" → { partId: 'bat1', terminal: 'pos' } (v0 wrote terminal refs as one string). */
function splitTerminalRef(ref: unknown): unknown {
  if (typeof ref !== 'string') return ref
  const dot = ref.indexOf('.')
  return dot < 0 ? { partId: ref, terminal: '' } : { partId: ref.slice(0, dot), terminal: ref.slice(dot + 1) }
}

/**
 * Version 0, the pre-release format: `{ version: 0, name, systemVoltage, profile?, components:
 * [{ id, kind, label, x, y, props }], wires: [{ id, from: "part.terminal", to, gauge, lengthM }],
 * cases?: [{ name, on: [partId…] }] }`. Version 1 renames and nests these fields, adds the format
 * marker, settings and per-conductor installation fields (left to the schema's defaults).
 */
function v0ToV1(doc: Json): Json {
  const components = asArray(doc.components)
  const parts = components?.map((c) =>
    isObject(c) ? { id: c.id, type: c.kind, label: c.label ?? '', position: { x: c.x, y: c.y }, params: c.props } : c,
  )
  const wires = asArray(doc.wires)
  const conductors = wires?.map((w) =>
    isObject(w)
      ? { id: w.id, label: w.label ?? '', from: splitTerminalRef(w.from), to: splitTerminalRef(w.to), sizeId: w.gauge, lengthM: w.lengthM }
      : w,
  )
  const switchable = (components ?? []).filter((c): c is Json => isObject(c) && (c.kind === 'load' || c.kind === 'inverter'))
  const cases = asArray(doc.cases)
  const scenarios = cases
    ? cases.map((c, i) =>
        isObject(c)
          ? {
              id: `scenario-${i + 1}`,
              name: c.name,
              sunOn: false,
              chargerOn: false,
              loads: Object.fromEntries((asArray(c.on) ?? []).map((id) => [String(id), { on: true, level: 1 }])),
            }
          : c,
      )
    : [{ id: 'scenario-1', name: 'All loads on', sunOn: false, chargerOn: false,
        loads: Object.fromEntries(switchable.map((c) => [String(c.id), { on: true, level: 1 }])) }]
  return {
    format: DESIGN_FORMAT_ID,
    version: 1,
    id: typeof doc.id === 'string' ? doc.id : 'imported-design',
    name: doc.name,
    settings: { nominalVoltageV: doc.systemVoltage, unitSystem: 'metric', profile: doc.profile ?? 'vehicle', defaultAmbientC: 30 },
    parts: parts ?? doc.components,
    conductors: conductors ?? doc.wires,
    scenarios,
  }
}

/** MIGRATIONS[n] upgrades a version-n document to version n + 1. */
const MIGRATIONS: Record<number, Migration> = { 0: v0ToV1 }

/** Bring any stored design up to the current format version (the schema validates afterwards). */
export function migrateDesign(raw: unknown): MigrateResult {
  const fail = (path: string, message: string): MigrateResult => ({ ok: false, errors: [{ path, message }] })
  if (!isObject(raw)) return fail('', 'A design must be a JSON object')
  const hasFormat = raw.format !== undefined
  if (hasFormat && raw.format !== DESIGN_FORMAT_ID) return fail('format', `Not an Ampwright design (format must be "${DESIGN_FORMAT_ID}")`)
  if (!hasFormat && raw.version !== 0) return fail('format', `Not an Ampwright design (format must be "${DESIGN_FORMAT_ID}")`)
  const version = raw.version
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return fail('version', 'Format version must be a whole number such as 1')
  }
  if (version > DESIGN_FORMAT_VERSION) {
    return fail('version', `This design uses format version ${version}, newer than this app reads (${DESIGN_FORMAT_VERSION}); update Ampwright to open it`)
  }
  let doc: Json = raw
  for (let v = version; v < DESIGN_FORMAT_VERSION; v++) {
    const migration = MIGRATIONS[v]
    if (!migration) return fail('version', `No upgrade is known from format version ${v}`)
    doc = migration(doc)
  }
  return { ok: true, design: doc, fromVersion: version }
}
