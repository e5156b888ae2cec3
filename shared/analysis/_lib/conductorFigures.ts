import { resistancePerMetreOhm } from '../../conductors/resistance'
import type { Conductor, DesignSettings } from '../../design/schema'
import { finite } from './finite'
import { TupleMemo } from '../../tupleMemo'

/**
 * Conductor temperature used for its resistance: the conductor's ambient (or the design default).
 * Why ambient and not the insulation rating: the voltage-drop rule we check against (ABYC E-11,
 * CM = 10.75 × I × L / E) is built on copper at about 29 °C (standards.md §4), and for fault currents
 * a cool conductor is the conservative (higher-current) case. The hot, rated-temperature figure would
 * flag runs that the published method accepts.
 */
export function conductorTemperatureC(c: Conductor, settings: DesignSettings): number {
  return c.ambientC ?? settings.defaultAmbientC
}

/**
 * Resistance of one conductor at its operating temperature; null when the tables refuse the input.
 * Ω/m depends only on size, material and temperature — a handful of combinations per design — so it
 * is looked up once per combination (the table functions also build their source text every call).
 */
export function conductorOhm(c: Conductor, settings: DesignSettings): number | null {
  if (!(Number.isFinite(c.lengthM) && c.lengthM >= 0)) return null
  const temperatureC = conductorTemperatureC(c, settings)
  OHM_KEY[0] = c.sizeId
  OHM_KEY[1] = c.material
  OHM_KEY[2] = temperatureC
  let perM = OHM_PER_M.get(OHM_KEY)
  if (perM === undefined) {
    try {
      perM = resistancePerMetreOhm({ sizeId: c.sizeId, material: c.material, temperatureC })
    } catch {
      perM = Number.NaN
    }
    OHM_PER_M.set([c.sizeId, c.material, temperatureC], perM)
  }
  const r = perM * c.lengthM
  return Number.isFinite(r) && r > 0 ? r : null
}
const OHM_PER_M = new TupleMemo<number>()
/** Reused look-up key (size, material, °C): no array per conductor. */
const OHM_KEY: unknown[] = [undefined, undefined, undefined]

export { finite }
