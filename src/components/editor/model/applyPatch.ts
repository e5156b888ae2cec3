import { PART_CATALOGUE } from '@shared/design/catalogue'
import { conductorSchema, type Conductor, type Design } from '@shared/design/schema'
import type { DesignMutations } from '@shared/collab/designYDoc'
import type { FindingPatch } from './analysisTypes'
import { validateParamEdit } from './paramFields'

// Applies a finding's suggested patch ('sizeId', 'params.ratingA', 'params.wayRatingsA.2') through
// the same validation as the forms: a patch that would make the design invalid is refused.

export function applyFindingPatch(design: Design, mutate: DesignMutations, patch: FindingPatch): string | null {
  const path = patch.field.split('.')
  if (patch.kind === 'conductor') {
    const conductor = design.conductors.find((c) => c.id === patch.id)
    if (!conductor) return 'That conductor is no longer in the design'
    if (path.length !== 1) return `Cannot apply a change to ${patch.field}`
    const message = validateParamEdit(conductorSchema, conductor as unknown as Record<string, unknown>, path[0], patch.value)
    if (message) return message
    mutate.setConductorField(conductor.id, path[0] as keyof Conductor, patch.value)
    return null
  }
  const part = design.parts.find((p) => p.id === patch.id)
  if (!part) return 'That part is no longer in the design'
  if (path[0] === 'label' && path.length === 1) {
    mutate.setPartLabel(part.id, String(patch.value))
    return null
  }
  if (path[0] !== 'params' || path.length < 2 || path.length > 3) return `Cannot apply a change to ${patch.field}`
  const params = part.params as Record<string, unknown>
  const key = path[1]
  let value: unknown = patch.value
  if (path.length === 3) {
    const list = params[key]
    const index = Number(path[2])
    if (!Array.isArray(list) || !Number.isInteger(index) || index < 0 || index >= list.length) return `Cannot apply a change to ${patch.field}`
    value = list.map((item, i) => (i === index ? patch.value : item))
  }
  const message = validateParamEdit(PART_CATALOGUE[part.type].paramsSchema, params, key, value)
  if (message) return message
  mutate.setPartParam(part.id, key, value)
  return null
}
