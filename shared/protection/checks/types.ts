import type { Finding } from '../../analysis/types'
import type { Material } from '../../conductors/materials'
import type { InsulationClass } from '../withstand'
import type { EmbeddedDevice } from '../timeCurrent/libraryDevice'
import type { RuleProfile, RuleProfileId } from './profiles'

// Plain inputs of the protection checks: everything the analysis has already worked out (fault
// currents, load starts, which device protects which conductor), so these checks stay pure.

export interface ProtectedConductor {
  id: string
  sizeId?: string
  areaCmil?: number
  areaMm2?: number
  material: Material
  /** Insulation temperature rating, °C (design field insulationRatingC). */
  insulationRatingC: number
  /** Thermoplastic (PVC) or thermoset (XLPE/EPR); by default read from the rating (see withstand.ts). */
  insulation?: InsulationClass
  /** Conductor temperature when a fault starts; by default its insulation rating (ICEA practice). */
  operatingC?: number
  /** Largest device rating the conductor's ampacity rule allows, A (for "next rating" suggestions). */
  maxDeviceRatingA?: number
}

export interface LoadStart {
  loadId: string
  runningCurrentA: number
  /** Start current as a multiple of the running current. */
  inrushMultiple: number
  startDurationS: number
  isMotor?: boolean
}

export interface ProtectionDevice {
  /** Device id (a part id, or "panelId#wayN" for a fuse panel's way). */
  id: string
  /** Part the finding points at; the device id when absent. */
  partId?: string
  familyId: string
  ratingA: number
  /** A library device's own datasheet band, used instead of the family's band when present. */
  customDevice?: EmbeddedDevice
  /** The conductor this device protects (on its load side). */
  conductor?: ProtectedConductor
  /** Prospective fault current at the device's load terminals (the largest it must clear), A. */
  faultCurrentAtDeviceA?: number
  /** Prospective fault current at the far end of the protected conductor (the smallest), A. */
  faultCurrentFarEndA?: number
  /** Steady current of the other loads on this device while a start happens, A. */
  baseCurrentA?: number
  loadStarts?: LoadStart[]
  /** The next device towards the source, in series with this one. */
  upstreamId?: string
}

export interface ProtectionContext {
  devices: ProtectionDevice[]
  /** Rule profile (which installation code is followed); 'vehicle' when absent. */
  profile?: RuleProfileId | RuleProfile
  scenarioId?: string
}

/** One check: pure, table-driven, returns findings instead of throwing. */
export interface ProtectionRule {
  ruleId: string
  /** The requirement in one line, and the published source (or "common practice"). */
  requirement: string
  source: string
  run(device: ProtectionDevice, context: ResolvedContext): Finding[]
}

export interface ResolvedContext {
  byId: ReadonlyMap<string, ProtectionDevice>
  profile: RuleProfile
  scenarioId?: string
}
