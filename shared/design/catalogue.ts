import type { z } from 'zod'
import { describeField, type FieldInfo } from './fields'
import * as P from './params'
import type { DesignSettings, PartType } from './schema'

// What the editor, the solver and the rules need to know about each part type: its terminals
// (electrical nodes), its parameter schema, sensible defaults for a new part and how a person
// would name it. One source of truth; the schema builds its part union from the same params.

export type PartGroup = 'sources' | 'storage' | 'conversion' | 'distribution' | 'protection' | 'loads'
export type TerminalPolarity = 'positive' | 'negative'
export interface TerminalInfo {
  id: string
  label: string
  polarity: TerminalPolarity
  side: 'left' | 'right' | 'top' | 'bottom'
}

export const PARAMS_SCHEMAS = {
  battery: P.batteryParamsSchema,
  'pv-array': P.pvArrayParamsSchema,
  'charge-controller': P.chargeControllerParamsSchema,
  'dc-dc-charger': P.dcDcChargerParamsSchema,
  'mains-charger': P.mainsChargerParamsSchema,
  inverter: P.inverterParamsSchema,
  'bus-bar': P.busBarParamsSchema,
  'fuse-panel': P.fusePanelParamsSchema,
  fuse: P.fuseParamsSchema,
  breaker: P.breakerParamsSchema,
  'battery-switch': P.batterySwitchParamsSchema,
  shunt: P.shuntParamsSchema,
  load: P.loadParamsSchema,
} as const

export type ParamsOf<T extends PartType> = z.output<(typeof PARAMS_SCHEMAS)[T]>

export interface PartTypeInfo<T extends PartType = PartType> {
  type: T
  label: string
  group: PartGroup
  /** One line in the trade's own words. */
  description: string
  /** Every terminal the type can have; see `partTerminals` for those a given part has. */
  terminals: TerminalInfo[]
  paramsSchema: (typeof PARAMS_SCHEMAS)[T]
  defaultParams: (settings: DesignSettings) => ParamsOf<T>
}

const t = (id: string, label: string, polarity: TerminalPolarity, side: TerminalInfo['side']): TerminalInfo => ({
  id,
  label,
  polarity,
  side,
})
const POS_NEG = [t('pos', '+', 'positive', 'right'), t('neg', '−', 'negative', 'right')]
const LINE_LOAD = [t('line', 'Line', 'positive', 'left'), t('load', 'Load', 'positive', 'right')]
export const BUS_BAR_STUD_IDS = ['a', 'b', 'c', 'd', 'e', 'f'] as const
export const FUSE_PANEL_OUT_IDS = ['out1', 'out2', 'out3', 'out4', 'out5', 'out6', 'out7', 'out8'] as const

/** Scale a 12 V figure to the system voltage (24 V → ×2, 48 V → ×4). */
const scale = (settings: DesignSettings, at12V: number) => Math.round(at12V * (settings.nominalVoltageV / 12) * 100) / 100
/** Blade and cartridge fuses are made for 32 V, some for 58 V (ISO 8820-3 scope). */
const bladeVoltageV = (settings: DesignSettings) => (settings.nominalVoltageV >= 48 ? 58 : 32)

export const PART_CATALOGUE: { [T in PartType]: PartTypeInfo<T> } = {
  battery: {
    type: 'battery', label: 'Battery bank', group: 'storage',
    description: 'Batteries in series and parallel; a voltage source with internal resistance.',
    terminals: POS_NEG, paramsSchema: P.batteryParamsSchema,
    defaultParams: (s) => ({ chemistry: 'lfp', nominalVoltageV: 12.8, capacityAh: 100, internalResistanceOhm: 0.004,
      seriesCount: s.nominalVoltageV / 12, parallelCount: 1 }),
  },
  'pv-array': {
    type: 'pv-array', label: 'Solar array', group: 'sources',
    description: 'PV modules wired in strings; strings in parallel feed one controller input.',
    terminals: [t('pos', '+', 'positive', 'right'), t('neg', '−', 'negative', 'right')],
    paramsSchema: P.pvArrayParamsSchema,
    defaultParams: (s) => ({ moduleVocV: 37, moduleIscA: 13.8, moduleVmpV: 31, moduleImpA: 12.9,
      vocTempCoeffPctPerC: -0.27, maxSeriesFuseA: 25, modulesPerString: s.nominalVoltageV / 12, strings: 1, recordLowC: -10 }),
  },
  'charge-controller': {
    type: 'charge-controller', label: 'Solar charge controller', group: 'conversion',
    description: 'Takes the array input and charges the bank up to its rated current.',
    terminals: [t('pv-pos', 'PV +', 'positive', 'left'), t('pv-neg', 'PV −', 'negative', 'left'),
      t('bat-pos', 'Battery +', 'positive', 'right'), t('bat-neg', 'Battery −', 'negative', 'right')],
    paramsSchema: P.chargeControllerParamsSchema,
    defaultParams: (s) => ({ maxPvVoltageV: s.nominalVoltageV >= 48 ? 150 : 100, maxPvCurrentA: 40, outputCurrentA: 30,
      efficiency: 0.97, mppt: true }),
  },
  'dc-dc-charger': {
    type: 'dc-dc-charger', label: 'DC-DC charger', group: 'conversion',
    description: 'Charges the house bank from the starter battery and alternator while the engine runs.',
    terminals: [t('in-pos', 'In +', 'positive', 'left'), t('in-neg', 'In −', 'negative', 'left'),
      t('out-pos', 'Out +', 'positive', 'right'), t('out-neg', 'Out −', 'negative', 'right')],
    paramsSchema: P.dcDcChargerParamsSchema,
    defaultParams: (s) => ({ outputCurrentA: 30, efficiency: 0.92, inputMinV: scale(s, 13) }),
  },
  'mains-charger': {
    type: 'mains-charger', label: 'Shore/mains charger', group: 'sources',
    description: 'Charges the bank from shore power, a generator or the grid.',
    terminals: [t('bat-pos', 'Battery +', 'positive', 'right'), t('bat-neg', 'Battery −', 'negative', 'right')],
    paramsSchema: P.mainsChargerParamsSchema,
    defaultParams: (s) => ({ outputCurrentA: 30, outputVoltageV: scale(s, 14.2) }),
  },
  inverter: {
    type: 'inverter', label: 'Inverter', group: 'conversion',
    description: 'Makes AC from the bank; draws AC watts ÷ efficiency from the DC side, more on surge.',
    terminals: [t('pos', '+', 'positive', 'left'), t('neg', '−', 'negative', 'left')],
    paramsSchema: P.inverterParamsSchema,
    defaultParams: () => ({ continuousW: 2000, surgeW: 4000, efficiency: 0.9 }),
  },
  'bus-bar': {
    type: 'bus-bar', label: 'Bus bar', group: 'distribution',
    description: 'A bar of studs that joins conductors of one polarity; every stud is the same node.',
    terminals: BUS_BAR_STUD_IDS.map((id) => t(id, id.toUpperCase(), 'positive', 'bottom')),
    paramsSchema: P.busBarParamsSchema,
    defaultParams: () => ({ ratingA: 250, polarity: 'positive', studs: 6 }),
  },
  'fuse-panel': {
    type: 'fuse-panel', label: 'Fuse panel', group: 'distribution',
    description: 'Distribution block with a fuse per way and a negative return bus.',
    terminals: [t('in-pos', 'Feed +', 'positive', 'left'), t('in-neg', 'Feed −', 'negative', 'left'),
      ...FUSE_PANEL_OUT_IDS.map((id, i) => t(id, `Way ${i + 1}`, 'positive', 'right')), t('neg', 'Return −', 'negative', 'bottom')],
    paramsSchema: P.fusePanelParamsSchema,
    defaultParams: (s) => ({ ratingA: 100, ways: 6, wayRatingsA: [15, 15, 10, 10, 5, 5], family: 'blade-regular',
      dcVoltageRatingV: bladeVoltageV(s), interruptingRatingA: 1000, ignitionProtected: false,
      resistanceOhm: P.DEFAULT_CONTACT_RESISTANCE_OHM }),
  },
  fuse: {
    type: 'fuse', label: 'Fuse', group: 'protection',
    description: 'Opens on overcurrent to protect the conductor on its load side.',
    terminals: LINE_LOAD, paramsSchema: P.fuseParamsSchema,
    defaultParams: (s) => ({ family: 'blade-regular', ratingA: 15, dcVoltageRatingV: bladeVoltageV(s), interruptingRatingA: 1000,
      ignitionProtected: false, closed: true, resistanceOhm: P.DEFAULT_CONTACT_RESISTANCE_OHM }),
  },
  breaker: {
    type: 'breaker', label: 'Circuit breaker', group: 'protection',
    description: 'Trips on overcurrent and can be reset; doubles as a switch for the circuit.',
    terminals: LINE_LOAD, paramsSchema: P.breakerParamsSchema,
    // Interrupting rating: a cautious figure for a thermal DC breaker (recalled, unverified); set it from the marking.
    defaultParams: (s) => ({ family: 'breaker-thermal-3', ratingA: 30, dcVoltageRatingV: s.nominalVoltageV >= 48 ? 58 : 32,
      interruptingRatingA: 2000, ignitionProtected: false, closed: true, resistanceOhm: P.DEFAULT_CONTACT_RESISTANCE_OHM }),
  },
  'battery-switch': {
    type: 'battery-switch', label: 'Battery switch', group: 'distribution',
    description: 'Isolates the bank from the system; on or off.',
    terminals: [t('a', 'A', 'positive', 'left'), t('b', 'B', 'positive', 'right')],
    paramsSchema: P.batterySwitchParamsSchema,
    defaultParams: () => ({ closed: true, ratingA: 300, ignitionProtected: false, resistanceOhm: P.DEFAULT_CONTACT_RESISTANCE_OHM }),
  },
  shunt: {
    type: 'shunt', label: 'Shunt', group: 'distribution',
    description: 'Low-value resistor in the negative lead that the battery monitor reads current from.',
    terminals: [t('battery', 'Battery', 'negative', 'left'), t('system', 'System', 'negative', 'right')],
    paramsSchema: P.shuntParamsSchema,
    defaultParams: () => ({ ratingA: 500, resistanceOhm: 0.0001 }),
  },
  load: {
    type: 'load', label: 'Load', group: 'loads',
    description: 'Anything that draws power: fridge, lights, pump, heater, winch…',
    terminals: [t('pos', '+', 'positive', 'left'), t('neg', '−', 'negative', 'left')],
    paramsSchema: P.loadParamsSchema,
    defaultParams: () => ({ model: 'power', powerW: 60, duty: 'continuous', critical: false, hoursPerDay: 4 }),
  },
}

/** Part types in catalogue order (palette order). */
export const PART_TYPE_LIST = Object.keys(PART_CATALOGUE) as PartType[]

/**
 * The terminals a given part actually has: bus bars up to their stud count (polarity from the
 * bar), fuse panels up to their number of ways; every other type has its catalogue terminals.
 * Read-only: the same list is handed out for every part with the same type, studs or ways.
 */
export function partTerminals(part: { type: PartType; params: unknown }): TerminalInfo[] {
  const info = PART_CATALOGUE[part.type]
  if (!info) return []
  const params = (part.params ?? {}) as Record<string, unknown>
  if (part.type === 'bus-bar') {
    const studs = typeof params.studs === 'number' ? params.studs : P.BUS_BAR_MAX_STUDS
    const polarity: TerminalPolarity = params.polarity === 'negative' ? 'negative' : 'positive'
    let lists = BUS_BAR_TERMINALS.get(studs)
    if (!lists) {
      const studsOf = (p: TerminalPolarity) => info.terminals.slice(0, studs).map((term) => ({ ...term, polarity: p }))
      BUS_BAR_TERMINALS.set(studs, (lists = { positive: studsOf('positive'), negative: studsOf('negative') }))
    }
    return lists[polarity]
  }
  if (part.type === 'fuse-panel') {
    const ways = typeof params.ways === 'number' ? params.ways : P.FUSE_PANEL_MAX_WAYS
    let list = FUSE_PANEL_TERMINALS.get(ways)
    if (!list) FUSE_PANEL_TERMINALS.set(ways, (list = info.terminals.filter((term) => !term.id.startsWith('out') || Number(term.id.slice(3)) <= ways)))
    return list
  }
  return info.terminals
}
// One list per stud count (and polarity) and per number of ways: a big design has thousands of bars.
const BUS_BAR_TERMINALS = new Map<number, Record<'positive' | 'negative', TerminalInfo[]>>()
const FUSE_PANEL_TERMINALS = new Map<number, TerminalInfo[]>()

export type ParamField = FieldInfo & { key: string }

/** The parameters of a part type in form order, with label, unit, limits and choices for each. */
export function paramFields(type: PartType): ParamField[] {
  const shape = (PART_CATALOGUE[type]?.paramsSchema as unknown as { shape: Record<string, z.ZodType> } | undefined)?.shape ?? {}
  return Object.entries(shape).flatMap(([key, schema]) => {
    const info = describeField(schema)
    return info ? [{ key, ...info }] : []
  })
}

export const PART_GROUP_LABELS: Record<PartGroup, string> = {
  sources: 'Sources',
  storage: 'Storage',
  conversion: 'Conversion',
  distribution: 'Distribution',
  protection: 'Protection',
  loads: 'Loads',
}
