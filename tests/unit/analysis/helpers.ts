// Minimal designs for the analysis tests, built from the catalogue defaults, and finding look-ups.
import { expect } from 'vitest'
import { makeConductor, makePart, type ConductorOptions } from '../../../shared/design/builder'
import type { ParamsOf } from '../../../shared/design/catalogue'
import { parseDesign, type Conductor, type Design, type DesignSettings, type Part, type PartType, type Scenario } from '../../../shared/design/schema'
import { analyzeDesign } from '../../../shared/analysis'
import type { AnalysisResult, Finding } from '../../../shared/analysis/types'

export interface DesignSpec {
  profile?: DesignSettings['profile']
  nominalVoltageV?: 12 | 24 | 48
  parts: Part[]
  conductors: Conductor[]
  scenarios?: Scenario[]
}

export function settingsFor(profile: DesignSettings['profile'] = 'marine', nominalVoltageV: 12 | 24 | 48 = 12): DesignSettings {
  return { nominalVoltageV, unitSystem: 'metric', profile, defaultAmbientC: 30 }
}

/** A parsed, valid design (throws in the test if the builder produced an invalid one). */
export function designOf(spec: DesignSpec): Design {
  const raw = {
    format: 'ampwright.design', version: 1, id: 'test-design', name: 'Test design',
    settings: settingsFor(spec.profile, spec.nominalVoltageV),
    parts: spec.parts, conductors: spec.conductors,
    scenarios: spec.scenarios ?? [{ id: 'all-on', name: 'All on', sunOn: true, chargerOn: false, loads: allOn(spec.parts) }],
  }
  const parsed = parseDesign(raw)
  if (!parsed.ok) throw new Error(`test design invalid: ${JSON.stringify(parsed.errors)}`)
  return parsed.design
}

export function allOn(parts: Part[]): Scenario['loads'] {
  return Object.fromEntries(parts.filter((p) => p.type === 'load' || p.type === 'inverter').map((p) => [p.id, { on: true, level: 1 }]))
}

let x = 0
export function part<T extends PartType>(type: T, id: string, params: Partial<ParamsOf<T>> = {}, settings = settingsFor()): Part {
  return makePart(settings, type, id, id, { x: (x += 10), y: 0 }, params)
}

export function wire(id: string, from: string, to: string, sizeId: Conductor['sizeId'], lengthM: number, options: ConductorOptions = {}): Conductor {
  return makeConductor(id, id, from, to, sizeId, lengthM, options)
}

/**
 * The 12 V branch most tests start from: bank → (0.1 m 4 AWG) → fuse → (lengthM, sizeId) → load,
 * load − → (lengthM, sizeId) → bank −.
 */
export function simpleBranch(opts: {
  profile?: DesignSettings['profile']
  load?: Partial<ParamsOf<'load'>>
  fuse?: Partial<ParamsOf<'fuse'>>
  battery?: Partial<ParamsOf<'battery'>>
  sizeId?: Conductor['sizeId']
  lengthM?: number
  feedM?: number
  wireOptions?: ConductorOptions
} = {}): Design {
  const sizeId = opts.sizeId ?? 'awg-12'
  const lengthM = opts.lengthM ?? 3
  return designOf({
    profile: opts.profile ?? 'marine',
    parts: [
      part('battery', 'bank', { chemistry: 'lfp', nominalVoltageV: 12.8, internalResistanceOhm: 0.004, seriesCount: 1, parallelCount: 1, ...opts.battery }),
      part('fuse', 'fuse', { family: 'blade-regular', ratingA: 15, dcVoltageRatingV: 32, interruptingRatingA: 10000, ...opts.fuse }),
      part('load', 'pump', { model: 'current', currentA: 8, duty: 'continuous', critical: false, ...opts.load }),
    ],
    conductors: [
      wire('feed', 'bank.pos', 'fuse.line', 'awg-4', opts.feedM ?? 0.1),
      wire('pos', 'fuse.load', 'pump.pos', sizeId, lengthM, opts.wireOptions),
      wire('neg', 'pump.neg', 'bank.neg', sizeId, lengthM, opts.wireOptions),
    ],
  })
}

export function findingsOf(design: Design, ruleId: string): Finding[] {
  return analyzeDesign(design).findings.filter((f) => f.ruleId === ruleId)
}

/** The one finding of `ruleId` (fails the test when there is none). */
export function expectFinding(design: Design, ruleId: string): Finding {
  const found = findingsOf(design, ruleId)
  expect(found.map((f) => f.ruleId), `expected a ${ruleId} finding`).toContain(ruleId)
  return found[0]
}

export function expectNoFinding(design: Design, ruleId: string): void {
  expect(findingsOf(design, ruleId).map((f) => f.message)).toEqual([])
}

/** Every number anywhere in the result is finite. */
export function expectAllFinite(result: AnalysisResult): void {
  const walk = (value: unknown, path: string): void => {
    if (typeof value === 'number') expect(Number.isFinite(value), `${path} = ${value}`).toBe(true)
    else if (Array.isArray(value)) value.forEach((v, i) => walk(v, `${path}[${i}]`))
    else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) walk(v, `${path}.${k}`)
  }
  walk(result, 'result')
}
