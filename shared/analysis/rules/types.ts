import type { AmpacityResult } from '../../conductors/ampacity'
import type { Conductor, Design, Part, PartOf } from '../../design/schema'
import type { ProtectiveDevice } from '../_lib/devices'
import type { IdLookup } from '../_lib/idLookup'
import type { TerminalNodes } from '../_lib/terminalNodes'

export type { IdLookup }
import type { ConductorProtection, DeviceTopology, ProtectionTopology } from '../protectionTopology'
import type { Finding, Severity } from '../types'

/** Worst-case figures of one conductor over the scenarios, with what the rules need beside them. */
export interface ConductorStats {
  conductor: Conductor
  maxCurrentA: number
  maxScenarioId: string | null
  /** Highest current outside motor-start scenarios (ampacity is a running, thermal limit). */
  steadyCurrentA: number
  steadyScenarioId: string | null
  /** null when the conductor's tables refused the input */
  ampacity: AmpacityResult | null
  ampacityA: number | null
  ampacitySource: string
  ambientC: number
  resistanceOhm: number
  dropPercentMax: number
  protection: ConductorProtection
  faultFarEndA: number
  /** PV circuit conductor: the arrays behind it and how many strings it carries */
  pv: { arrays: PartOf<'pv-array'>[]; strings: number } | null
}

export interface DeviceStats {
  device: ProtectiveDevice
  maxCurrentA: number
  maxScenarioId: string | null
  /** Highest current of continuous-duty loads through the device (intermittent loads and motor starts left out). */
  continuousA: number
  continuousScenarioId: string | null
  faultCurrentA: number
  topology: DeviceTopology
  protectsConductorIds: string[]
  /** Highest voltage the device can see, and why (charging set-point or cold PV open-circuit voltage). */
  highestVoltageV: number
  highestVoltageBasis: string
}

/** Worst drop from a load's bank terminals to the load's terminals, over the scenarios. */
export interface LoadDrop {
  partId: string
  scenarioId: string
  dropV: number
  dropPercent: number
  currentA: number
  critical: boolean
  /** conductors on the load's own terminals */
  conductorIds: string[]
}

export interface PvGroup {
  controller: PartOf<'charge-controller'>
  arrays: PartOf<'pv-array'>[]
}

export interface RuleContext {
  design: Design
  profile: Design['settings']['profile']
  nominalV: number
  conductors: ConductorStats[]
  conductorById: IdLookup<ConductorStats>
  devices: DeviceStats[]
  deviceById: IdLookup<DeviceStats>
  partById: IdLookup<Part>
  conductorsAtPart: IdLookup<Conductor[]>
  loadDrops: LoadDrop[]
  /** Running current of each load: the highest outside motor starts, else its rating at nominal voltage. */
  loadRunningA: IdLookup<number>
  /** Highest current through each part (bus bars: the current fed into the bar), over the scenarios. */
  partMaxCurrent: IdLookup<{ currentA: number; scenarioId: string }>
  pvGroups: PvGroup[]
  nodes: TerminalNodes
  topology: ProtectionTopology
}

/** A check as data: what it is, where it comes from, and how it finds problems. Never throws. */
export interface Rule {
  id: string
  title: string
  severity: Severity
  source: string
  run(ctx: RuleContext): Finding[]
}
