import { PART_CATALOGUE, type ParamsOf } from './catalogue'
import type { Conductor, DesignSettings, Part, PartType } from './schema'

// Small helpers for writing designs in code (the demo, example files, tests): a part from the
// catalogue defaults plus overrides, and a conductor between "partId.terminal" references.

export function makePart<T extends PartType>(
  settings: DesignSettings,
  type: T,
  id: string,
  label: string,
  position: { x: number; y: number },
  params: Partial<ParamsOf<T>> = {},
): Part {
  const merged = { ...PART_CATALOGUE[type].defaultParams(settings), ...params }
  return { id, type, label, position: { ...position }, params: merged } as unknown as Part
}

export type ConductorOptions = Partial<Omit<Conductor, 'id' | 'label' | 'from' | 'to' | 'sizeId' | 'lengthM'>>

/** "bank.pos" → { partId: 'bank', terminal: 'pos' }. */
export function terminalRef(text: string): Conductor['from'] {
  const dot = text.indexOf('.')
  return dot < 0 ? { partId: text, terminal: '' } : { partId: text.slice(0, dot), terminal: text.slice(dot + 1) }
}

export function makeConductor(
  id: string,
  label: string,
  from: string,
  to: string,
  sizeId: Conductor['sizeId'],
  lengthM: number,
  options: ConductorOptions = {},
): Conductor {
  return {
    id, label, from: terminalRef(from), to: terminalRef(to), sizeId, lengthM,
    material: 'copper', insulationRatingC: 105, installation: 'free-air', bundledCount: 1, ambientC: null, sheathed: false,
    ...options,
  }
}

/** The conductor maker of a design written in code (each picks its own material and colours). */
export type WireMaker = (id: string, label: string, from: string, to: string, sizeId: Conductor['sizeId'], lengthM: number, options?: ConductorOptions) => Conductor

export interface WirePair {
  /** Conductor ids are `<id>-pos` and `<id>-neg`. */
  id: string
  /** Labels are "<name> +" and "<name> −". */
  name: string
  /** The part fed: its `pos` and `neg` terminals. */
  partId: string
  /** Where the positive run starts, e.g. "panel.out3", and where the negative run returns, e.g. "panel.neg". */
  feed: string
  ret: string
  sizeId: Conductor['sizeId']
  lengthM: number
  options?: ConductorOptions
}

/**
 * The out-and-back pair of one load or branch: the same size, length and options each way.
 * @example wirePair(wire, { id: 'pump', name: 'Pump', partId: 'water-pump', feed: 'panel.out3', ret: 'panel.neg', sizeId: 'awg-14', lengthM: 2 })
 */
export function wirePair(wire: WireMaker, p: WirePair): [Conductor, Conductor] {
  return [
    wire(`${p.id}-pos`, `${p.name} +`, p.feed, `${p.partId}.pos`, p.sizeId, p.lengthM, p.options),
    wire(`${p.id}-neg`, `${p.name} −`, `${p.partId}.neg`, p.ret, p.sizeId, p.lengthM, p.options),
  ]
}

/** Places and sizes of the main distribution every house system in code shares. */
export interface MainDistribution {
  /** Main fuse position; the switch sits 140 to the right, the bus bars 280; the shunt and the negative bus at `negY`. */
  x: number
  y: number
  negY: number
  mainFuseA: number
  switchLabel: string
  busRatingA: number
  busStuds: number
}

type PartMaker = <T extends PartType>(type: T, id: string, label: string, x: number, y: number, params?: Partial<ParamsOf<T>>) => Part

/**
 * Class T main fuse marked 160 V DC / 20 kA (the family's DC figure, recalled, unverified: shared/protection/families.ts),
 * battery switch, 500 A / 50 mV shunt and the positive and negative bus bars, ids `main-fuse`,
 * `main-switch`, `shunt`, `pos-bus`, `neg-bus`.
 */
export function mainDistribution(part: PartMaker, d: MainDistribution): Part[] {
  return [
    part('fuse', 'main-fuse', `Main fuse Class T ${d.mainFuseA} A`, d.x, d.y, { family: 'class-t', ratingA: d.mainFuseA, dcVoltageRatingV: 160,
      interruptingRatingA: 20000 }),
    part('battery-switch', 'main-switch', d.switchLabel, d.x + 176, d.y, { ratingA: 300 }),
    part('shunt', 'shunt', 'Shunt 500 A / 50 mV', d.x, d.negY, { ratingA: 500, resistanceOhm: 0.0001 }),
    part('bus-bar', 'pos-bus', 'Positive bus', d.x + 352, d.y, { ratingA: d.busRatingA, polarity: 'positive', studs: d.busStuds }),
    part('bus-bar', 'neg-bus', 'Negative bus', d.x + 352, d.negY, { ratingA: d.busRatingA, polarity: 'negative', studs: d.busStuds }),
  ]
}

export interface MainDistributionWires {
  /** The house bank's part id and what the labels call it ("Battery", "Bank"). */
  bankId: string
  bankName: string
  sizeId: Conductor['sizeId']
  /** Lengths of bank + → main fuse, main fuse → switch, switch → positive bus, bank − → shunt, shunt → negative bus. */
  lengthsM: [number, number, number, number, number]
  shuntLabel?: string
}

/** The conductors of mainDistribution(): the positive runs sheathed (they carry the bank's full fault current). */
export function mainDistributionWires(wire: WireMaker, w: MainDistributionWires): Conductor[] {
  const [bankPosM, fuseSwitchM, switchBusM, bankNegM, shuntBusM] = w.lengthsM
  const sheathed: ConductorOptions = { sheathed: true }
  return [
    wire('bank-pos', `${w.bankName} + to main fuse`, `${w.bankId}.pos`, 'main-fuse.line', w.sizeId, bankPosM, sheathed),
    wire('fuse-switch', 'Main fuse to switch', 'main-fuse.load', 'main-switch.a', w.sizeId, fuseSwitchM, sheathed),
    wire('switch-bus', 'Switch to positive bus', 'main-switch.b', 'pos-bus.a', w.sizeId, switchBusM, sheathed),
    wire('bank-neg', `${w.bankName} − to shunt`, `${w.bankId}.neg`, 'shunt.battery', w.sizeId, bankNegM),
    wire('shunt-bus', w.shuntLabel ?? 'Shunt − to negative bus', 'shunt.system', 'neg-bus.a', w.sizeId, shuntBusM),
  ]
}
