import { PART_CATALOGUE, partTerminals } from './catalogue'
import { formatIssuePath } from './issues'
import type { Design, DesignError, TerminalRef } from './schema'

// Checks a schema-valid design for references that only make sense together: ids unique across
// parts and conductors, conductor ends on real terminals, scenario loads naming load parts.

/** Part types a scenario can switch on or off: loads and inverters, and chargers (a DC-DC charger
 * listed as on means the engine is running; a mains charger also runs whenever `chargerOn`). */
export const SWITCHABLE_LOAD_TYPES = ['load', 'inverter', 'dc-dc-charger', 'mains-charger'] as const

export function checkCrossReferences(design: Design): DesignError[] {
  const errors: DesignError[] = []
  const push = (path: readonly PropertyKey[], message: string) => errors.push({ path: formatIssuePath(path), message })

  const firstUse = new Map<string, string>()
  const claimId = (id: string, where: readonly PropertyKey[]) => {
    const earlier = firstUse.get(id)
    if (earlier !== undefined) push([...where, 'id'], `Id "${id}" is already used by ${earlier}`)
    else firstUse.set(id, formatIssuePath(where))
  }
  design.parts.forEach((part, i) => claimId(part.id, ['parts', i]))
  design.conductors.forEach((conductor, i) => claimId(conductor.id, ['conductors', i]))

  const partsById = new Map(design.parts.map((part) => [part.id, part]))
  const checkEnd = (ref: TerminalRef, where: readonly PropertyKey[]) => {
    const part = partsById.get(ref.partId)
    if (!part) {
      push([...where, 'partId'], `No part has the id "${ref.partId}"`)
      return
    }
    const terminals = partTerminals(part)
    if (!terminals.some((terminal) => terminal.id === ref.terminal)) {
      const label = PART_CATALOGUE[part.type].label.toLowerCase()
      const ids = terminals.map((terminal) => terminal.id).join(', ')
      push([...where, 'terminal'], `A ${label} has no terminal "${ref.terminal}" (this one has: ${ids})`)
    }
  }
  design.conductors.forEach((conductor, i) => {
    checkEnd(conductor.from, ['conductors', i, 'from'])
    checkEnd(conductor.to, ['conductors', i, 'to'])
    if (conductor.from.partId === conductor.to.partId && conductor.from.terminal === conductor.to.terminal) {
      push(['conductors', i, 'to'], 'A conductor must join two different terminals')
    }
  })

  const scenarioIds = new Map<string, number>()
  const scenarioNames = new Map<string, number>()
  design.scenarios.forEach((scenario, i) => {
    const sameId = scenarioIds.get(scenario.id)
    if (sameId !== undefined) push(['scenarios', i, 'id'], `Id "${scenario.id}" is already used by scenarios[${sameId}]`)
    else scenarioIds.set(scenario.id, i)
    const nameKey = scenario.name.trim().toLowerCase()
    const sameName = scenarioNames.get(nameKey)
    if (sameName !== undefined) push(['scenarios', i, 'name'], `Another scenario (scenarios[${sameName}]) is already called "${scenario.name}"`)
    else scenarioNames.set(nameKey, i)

    for (const partId of Object.keys(scenario.loads)) {
      const part = partsById.get(partId)
      if (!part) push(['scenarios', i, 'loads', partId], `No part has the id "${partId}"`)
      else if (!(SWITCHABLE_LOAD_TYPES as readonly string[]).includes(part.type)) {
        push(['scenarios', i, 'loads', partId], `"${partId}" is a ${PART_CATALOGUE[part.type].label.toLowerCase()}; scenarios switch only loads, inverters and chargers`)
      }
    }
  })
  return errors
}
