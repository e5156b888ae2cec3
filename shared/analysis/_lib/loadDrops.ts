import type { Design } from '../../design/schema'
import type { ProtectionTopology } from '../protectionTopology'
import type { LoadDrop } from '../rules/types'
import { finite } from './finite'
import type { IdLookup } from './idLookup'
import type { ScenarioSolve } from './solveScenario'

/**
 * Worst drop per load (and inverter) from its bank's terminals to the load's terminals, over the
 * scenarios: the round-trip drop of the ABYC E-11 method (out on the positive, back on the negative).
 * The bank is the one the load's positive conductor is fed from (protection topology).
 */
export function loadDrops(design: Design, solves: ScenarioSolve[], topology: ProtectionTopology, conductorsAt: IdLookup<Design['conductors']>): LoadDrop[] {
  const nominalV = design.settings.nominalVoltageV
  const worst = new Map<string, LoadDrop>()
  const batteryIds = new Set(design.parts.filter((p) => p.type === 'battery').map((p) => p.id))
  for (let index = 0; index < design.parts.length; index++) {
    const part = design.parts[index]
    if (part.type !== 'load' && part.type !== 'inverter') continue
    const attached = conductorsAt.get(part.id) ?? []
    const posConductor = attached.find((c) => (c.from.partId === part.id ? c.from : c.to).terminal === 'pos')
    const bankId = posConductor ? topology.conductors.get(posConductor.id)?.sourcePartId : null
    if (!bankId || !batteryIds.has(bankId)) continue
    // Inverter feeders are treated as main feeders (3 %): ABYC E-11 lists panelboard main feeders as critical.
    const critical = part.type === 'inverter' || (part.type === 'load' && part.params.critical)
    // The worst scenario first; its record is made once, after the loop.
    let worstSolve: ScenarioSolve | null = null
    let worstDropV = 0
    let worstPercent = 0
    for (const s of solves) {
      // A motor start is a transient: the drop limits are for running conditions.
      if (s.scenario.motorStart || s.compiled.partElementAt[index] < 0 || s.op.status !== 'ok') continue
      const bankV = s.voltageAcross(bankId, 'pos', 'neg')
      const loadV = s.voltageAcross(part.id, 'pos', 'neg')
      if (bankV === null || loadV === null) continue
      const dropV = finite(bankV - loadV)
      const dropPercent = finite((100 * dropV) / nominalV)
      if (!worstSolve || dropPercent > worstPercent) {
        worstSolve = s
        worstDropV = dropV
        worstPercent = dropPercent
      }
    }
    if (!worstSolve) continue
    // A part id repeated in the design: the later part's record replaces the earlier one's only when worse.
    const seen = worst.get(part.id)
    if (!seen || worstPercent > seen.dropPercent) {
      worst.set(part.id, {
        partId: part.id, scenarioId: worstSolve.scenario.id, dropV: worstDropV, dropPercent: worstPercent, critical,
        currentA: Math.abs(worstSolve.partCurrentA[index]), conductorIds: attached.map((c) => c.id),
      })
    }
  }
  return [...worst.values()]
}
