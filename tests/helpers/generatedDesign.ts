// A generated radial design of about N parts, laid out like real systems: bank → Class T main fuse →
// main bus → feeder fuses → chains of distribution buses → branch fuses → loads; returns on negative
// buses, every seventh load straight back to the bank (meshed negatives). Pure: shared by the
// analysis benchmark and the solver-cache unit test.
import { makeConductor, makePart } from '../../shared/design/builder'
import type { Conductor, Design, DesignSettings, Part } from '../../shared/design/schema'

/** A generated design with about `targetParts` parts (shape above). Built directly, not parsed:
 * the schema caps real documents at 2 000 parts, the benchmark goes beyond on purpose. */
export function generatedDesign(targetParts: number): Design {
  const settings: DesignSettings = { nominalVoltageV: 24, unitSystem: 'metric', profile: 'vehicle', defaultAmbientC: 30 }
  const at = { x: 0, y: 0 }
  const parts: Part[] = [
    makePart(settings, 'battery', 'bank', 'House bank', at, { nominalVoltageV: 12.8, seriesCount: 2, parallelCount: 4, internalResistanceOhm: 0.004, capacityAh: 200 }),
    makePart(settings, 'fuse', 'main', 'Main fuse', at, { family: 'class-t', ratingA: 400, interruptingRatingA: 20000, dcVoltageRatingV: 125 }),
    makePart(settings, 'bus-bar', 'mainbus', 'Main bus', at),
    makePart(settings, 'bus-bar', 'mainneg', 'Main negative', at, { polarity: 'negative' }),
  ]
  const conductors: Conductor[] = [
    makeConductor('feed', 'Feed', 'bank.pos', 'main.line', 'awg-4/0', 0.15),
    makeConductor('trunk', 'Trunk', 'main.load', 'mainbus.a', 'awg-4/0', 1),
    makeConductor('trunkneg', 'Trunk −', 'mainneg.a', 'bank.neg', 'awg-4/0', 1),
  ]
  const loads: Record<string, { on: boolean; level: number }> = {}
  const branches = Math.max(4, Math.round((targetParts - 4) / 2.6)) // per branch: fuse + load, plus a bus pair per 4 branches
  // Feeders and bus chains both grow as √n so the distribution stays a few tens of buses deep.
  const feeders = Math.max(1, Math.ceil(Math.sqrt(branches / 4)))
  const perFeeder = Math.ceil(branches / feeders)
  let branch = 0
  let mainBus = 'mainbus'
  let mainNeg = 'mainneg'
  for (let f = 0; f < feeders && branch < branches; f++) {
    const stud = 'bcde'[f % 4]
    if (f > 0 && f % 4 === 0) {
      // Next main bus pair in the chain, fed from the previous one's last stud.
      const nextBus = `mainbus${f}`
      const nextNeg = `mainneg${f}`
      parts.push(makePart(settings, 'bus-bar', nextBus, `Main bus ${f}`, at), makePart(settings, 'bus-bar', nextNeg, `Main negative ${f}`, at, { polarity: 'negative' }))
      conductors.push(
        makeConductor(`${nextBus}in`, `${nextBus} feed`, `${mainBus}.f`, `${nextBus}.a`, 'awg-4/0', 0.2),
        makeConductor(`${nextNeg}out`, `${nextNeg} return`, `${nextNeg}.a`, `${mainNeg}.f`, 'awg-4/0', 0.2),
      )
      mainBus = nextBus
      mainNeg = nextNeg
    }
    const feederFuse = `ff${f}`
    parts.push(makePart(settings, 'fuse', feederFuse, `Feeder ${f}`, at, { family: 'class-t', ratingA: 150, interruptingRatingA: 20000, dcVoltageRatingV: 125 }))
    conductors.push(makeConductor(`ffin${f}`, `Feeder ${f} tap`, `${mainBus}.${stud}`, `${feederFuse}.line`, 'awg-2/0', 0.1))
    let previousPos = `${feederFuse}.load`
    let previousNeg = `${mainNeg}.${stud}`
    for (let g = 0; g * 4 < perFeeder && branch < branches; g++) {
      const bus = `b${f}_${g}`
      const neg = `n${f}_${g}`
      parts.push(makePart(settings, 'bus-bar', bus, `Bus ${f}.${g}`, at), makePart(settings, 'bus-bar', neg, `Neg ${f}.${g}`, at, { polarity: 'negative' }))
      conductors.push(
        makeConductor(`${bus}in`, `${bus} feed`, previousPos, `${bus}.a`, 'awg-2/0', 0.3),
        makeConductor(`${neg}out`, `${neg} return`, `${neg}.a`, previousNeg, 'awg-2/0', 0.3),
      )
      previousPos = `${bus}.f`
      previousNeg = `${neg}.f`
      for (let k = 0; k < 4 && branch < branches; k++, branch++) {
        const id = `L${branch}`
        const model = (['power', 'current', 'resistance'] as const)[branch % 3]
        const amount = model === 'power' ? { powerW: 24 + (branch % 5) * 12 } : model === 'current' ? { currentA: 1 + (branch % 4) } : { resistanceOhm: 12 + (branch % 7) }
        parts.push(
          makePart(settings, 'fuse', `F${branch}`, `Fuse ${branch}`, at, { ratingA: 10, interruptingRatingA: 1000 }),
          makePart(settings, 'load', id, `Load ${branch}`, at, { model, ...amount, duty: branch % 5 === 0 ? 'intermittent' : 'continuous', critical: branch % 9 === 0, start: branch % 6 === 0 ? { inrushMultiple: 4, durationS: 0.3 } : undefined }),
        )
        conductors.push(
          makeConductor(`T${branch}`, `Tap ${branch}`, `${bus}.${'bcde'[k]}`, `F${branch}.line`, 'awg-14', 0.1),
          makeConductor(`P${branch}`, `+ ${branch}`, `F${branch}.load`, `${id}.pos`, 'awg-14', 2 + (branch % 8)),
          makeConductor(`N${branch}`, `− ${branch}`, `${id}.neg`, branch % 7 === 0 ? 'bank.neg' : `${neg}.${'bcde'[k]}`, 'awg-14', 2 + (branch % 8)),
        )
        loads[id] = { on: true, level: 1 }
      }
    }
  }
  const half = Object.fromEntries(Object.keys(loads).map((id, i) => [id, { on: i % 2 === 0, level: 0.5 }]))
  return {
    format: 'ampwright.design', version: 1, id: `bench-${targetParts}`, name: `Generated ${targetParts}`, settings, parts, conductors,
    scenarios: [
      { id: 'all', name: 'All on', sunOn: false, chargerOn: false, loads },
      { id: 'night', name: 'Night, half', sunOn: false, chargerOn: false, loads: half },
      { id: 'start', name: 'Motor start', sunOn: false, chargerOn: false, loads, motorStart: true },
    ],
  }
}
