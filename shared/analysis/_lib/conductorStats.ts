import { conductorAmpacityA, type AmpacityResult } from '../../conductors/ampacity'
import type { Conductor, Design, PartOf } from '../../design/schema'
import type { ConductorProtection, ProtectionTopology } from '../protectionTopology'
import type { ProtectiveDevice } from './devices'
import { BRANCH_DISTANCE_LIMITS, maxDeviceRating } from './ocpdLimit'
import type { ConductorStats, PvGroup } from '../rules/types'
import type { ScenarioSolve } from './solveScenario'
import { conductorOhm, conductorTemperatureC } from './conductorFigures'
import type { PassiveCircuit } from './passiveCircuit'
import { finite } from './finite'
import { viewByIndex, type IdLookup } from './idLookup'
import { TupleMemo } from '../../tupleMemo'

type AmpacityFigure = { result: AmpacityResult | null; source: string }
/** Ampacity figures of one analysis, by their inputs (see ampacityOf). */
export type AmpacityMemo = TupleMemo<AmpacityFigure>

/**
 * Ampacity of a conductor (or of the same run in another size: `sizeId`) under the design's profile;
 * null (with the reason) when the tables refuse it.
 */
export function ampacityOf(c: Conductor, design: Design, circuitVoltageV: number, memo?: AmpacityMemo, sizeId: Conductor['sizeId'] = c.sizeId): AmpacityFigure {
  if (!memo) return ampacityUncached(c, sizeId, design, circuitVoltageV)
  // Most conductors of a design share size, insulation and installation: look each combination up once.
  const key = AMPACITY_KEY
  key[0] = sizeId
  key[1] = c.material
  key[2] = c.insulationRatingC
  key[3] = c.ambientC ?? null
  key[4] = c.installation
  key[5] = c.bundledCount
  key[6] = circuitVoltageV
  return memo.get(key) ?? memo.set([...key], ampacityUncached(c, sizeId, design, circuitVoltageV))
}
/** Reused look-up key: no array or string per conductor. */
const AMPACITY_KEY: unknown[] = new Array(7)

function ampacityUncached(c: Conductor, sizeId: Conductor['sizeId'], design: Design, circuitVoltageV: number): AmpacityFigure {
  try {
    const result = conductorAmpacityA({
      sizeId, material: c.material, insulationRatingC: c.insulationRatingC,
      ambientC: conductorTemperatureC(c, design.settings), installation: c.installation,
      bundledCount: c.bundledCount, profile: design.settings.profile, circuitVoltageV,
    })
    const factors = result.factors.map((f) => `${f.name} × ${f.value.toFixed(2)}`).join('; ')
    const source = result.ampacityA === null ? `${result.table}: ${result.unavailableReason ?? 'no value'}` : factors ? `${result.table}; ${factors}` : result.table
    return { result, source }
  } catch (e) {
    return { result: null, source: `no ampacity: ${e instanceof Error ? e.message : 'input refused'}` }
  }
}

/** The conductor's resistance: the circuit's resistor when it has one, else from the tables (0 when they refuse it). */
function conductorResistanceOhm(c: Conductor, design: Design, passive: PassiveCircuit, i: number): number {
  const e = passive.conductorElementAt[i]
  const el = e >= 0 ? passive.elements[e] : undefined
  return el?.kind === 'resistor' ? el.resistanceOhm : (conductorOhm(c, design.settings) ?? 0)
}

/** Worst case per conductor over the solved scenarios, with ampacity, protection and PV role. */
export function conductorStats(
  design: Design, solves: ScenarioSolve[], topology: ProtectionTopology, farEndA: Float64Array, pvGroups: PvGroup[],
  devices: ProtectiveDevice[], passive: PassiveCircuit,
): ConductorStats[] {
  const deviceById = viewByIndex(topology.deviceIndex, devices)
  const nominalV = design.settings.nominalVoltageV
  const groupOfArray = new Map<string, PvGroup>()
  for (const g of pvGroups) for (const a of g.arrays) groupOfArray.set(a.id, g)
  const arrayById = new Map(pvGroups.flatMap((g) => g.arrays.map((a) => [a.id, a] as const)))
  const controllerGroup = new Map(pvGroups.map((g) => [g.controller.id, g]))
  const ampacityMemo: AmpacityMemo = new TupleMemo()

  return design.conductors.map((c, i) => {
    let maxCurrentA = 0
    let maxScenarioId: string | null = null
    let steadyCurrentA = 0
    let steadyScenarioId: string | null = null
    let dropPercentMax = 0
    for (const s of solves) {
      const amps = Math.abs(s.conductorCurrentA[i])
      if (amps > maxCurrentA) { maxCurrentA = amps; maxScenarioId = s.scenario.id }
      if (!s.scenario.motorStart && amps > steadyCurrentA) { steadyCurrentA = amps; steadyScenarioId = s.scenario.id }
      dropPercentMax = Math.max(dropPercentMax, s.conductorDropPercent[i])
    }
    const tapped = topology.conductorList[i]
    const pv = pvRole(c, tapped.side === 'pv' ? tapped.sourcePartId : null, arrayById, groupOfArray, controllerGroup)
    const circuitVoltageV = pv ? Math.max(nominalV, ...pv.arrays.map((a) => a.params.moduleVocV * a.params.modulesPerString)) : nominalV
    const { result, source } = ampacityOf(c, design, circuitVoltageV, ampacityMemo)
    const protection = branchProtection(c, tapped, result?.ampacityA ?? null, design, deviceById)
    return {
      conductor: c, maxCurrentA: finite(maxCurrentA), maxScenarioId, steadyCurrentA: finite(steadyCurrentA), steadyScenarioId, ampacity: result,
      ampacityA: result?.ampacityA ?? null, ampacitySource: source, ambientC: conductorTemperatureC(c, design.settings),
      resistanceOhm: conductorResistanceOhm(c, design, passive, i), dropPercentMax: finite(dropPercentMax), protection,
      faultFarEndA: pv ? finite(pv.arrays.reduce((s, a) => s + a.params.moduleIscA * a.params.strings, 0)) : farEndA[i],
      pv,
    }
  })
}

/**
 * PV circuit conductors: positive ones fed only by arrays, and those on an array's or a controller's
 * PV negative. A conductor on an array's own terminal carries that array's strings; one further
 * along carries every string of the controller's input.
 */
function pvRole(
  c: Conductor, feedingArrayId: string | null, arrayById: Map<string, PartOf<'pv-array'>>,
  groupOfArray: Map<string, PvGroup>, controllerGroup: Map<string, PvGroup>,
): ConductorStats['pv'] {
  // No arrays wired to a controller (most designs): no conductor has a PV role; no look-ups per conductor.
  if (arrayById.size === 0 && controllerGroup.size === 0) return null
  const own = arrayById.get(c.from.partId) ?? arrayById.get(c.to.partId)
  if (own) return { arrays: [own], strings: own.params.strings }
  const pvEnd = (end: Conductor['from']) => (end.terminal === 'pv-neg' || end.terminal === 'pv-pos' ? controllerGroup.get(end.partId) : undefined)
  const group = (feedingArrayId ? groupOfArray.get(feedingArrayId) : undefined) ?? pvEnd(c.from) ?? pvEnd(c.to)
  if (!group) return null
  return { arrays: group.arrays, strings: group.arrays.reduce((s, a) => s + a.params.strings, 0) }
}

/**
 * A conductor tapped off a bus whose upstream device is too big for it is still protected when its
 * own device sits within the branch distance of the bus and is small enough: then that device is
 * the one at its source end.
 */
function branchProtection(
  c: Conductor, p: ConductorProtection, ampacityA: number | null, design: Design, deviceById: IdLookup<ProtectiveDevice>,
): ConductorProtection {
  if (p.protectedFrom !== 'upstream' || ampacityA === null || !p.protectingDeviceId || !p.downstreamDeviceId || p.downstreamRunM === null) return p
  const upstream = deviceById.get(p.protectingDeviceId)
  const own = deviceById.get(p.downstreamDeviceId)
  if (!upstream || !own) return p
  const profile = design.settings.profile
  if (upstream.ratingA <= (maxDeviceRating(c, ampacityA, profile, upstream.family)?.maxRatingA ?? 0) + 1e-9) return p
  const limitM = c.sheathed ? BRANCH_DISTANCE_LIMITS.sheathedM : BRANCH_DISTANCE_LIMITS.bareM
  if (p.downstreamRunM > limitM + 1e-9 || own.ratingA > (maxDeviceRating(c, ampacityA, profile, own.family)?.maxRatingA ?? 0) + 1e-9) return p
  return { ...p, protectingDeviceId: own.id, protectedFrom: 'branch', deviceDistanceM: p.downstreamRunM, runSheathed: c.sheathed }
}
