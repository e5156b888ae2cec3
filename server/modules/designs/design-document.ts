// The one place the server learns what a design document is: shared/design validates it (migrating
// older format versions and checking cross-references) and makes the empty design of a new project.
import type { InstallationKind } from '../../../shared/api/projects.schemas'
import { createEmptyDesign } from '../../../shared/design/demo'
import { parseDesign, type Design, type DesignSettings } from '../../../shared/design/schema'
import type { FieldError } from '../../../shared/errors'

const PROFILE_BY_KIND: Record<InstallationKind, DesignSettings['profile']> = {
  vehicle: 'vehicle',
  vessel: 'marine',
  building: 'building',
  // No better guess for "other": the stationary profile makes no vehicle or marine assumptions.
  other: 'building',
}

export function emptyDesignFor(project: {
  name: string
  nominalVoltageV: number
  installationKind: InstallationKind
}): Design {
  return createEmptyDesign({
    name: project.name,
    nominalVoltageV: project.nominalVoltageV as DesignSettings['nominalVoltageV'],
    profile: PROFILE_BY_KIND[project.installationKind],
  })
}

/** The validated (and, for an older format version, migrated) design, or field errors under "design". */
export function validateDesign(input: unknown): { ok: true; design: Design } | { ok: false; fields: FieldError[] } {
  const result = parseDesign(input)
  if (result.ok) return { ok: true, design: result.design }
  return {
    ok: false,
    fields: result.errors.map((error) => ({
      path: error.path ? `design.${error.path}` : 'design',
      message: error.message,
    })),
  }
}
