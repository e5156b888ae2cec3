import { conductorResistanceOhm } from '../../conductors/resistance'
import type { Conductor, DesignSettings } from '../../design/schema'
import { finite } from './finite'

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

/** Resistance of one conductor at its operating temperature; null when the tables refuse the input. */
export function conductorOhm(c: Conductor, settings: DesignSettings): number | null {
  try {
    const r = conductorResistanceOhm({
      sizeId: c.sizeId,
      material: c.material,
      lengthM: c.lengthM,
      temperatureC: conductorTemperatureC(c, settings),
    })
    return Number.isFinite(r) && r > 0 ? r : null
  } catch {
    return null
  }
}

export { finite }
