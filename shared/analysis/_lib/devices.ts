import type { Design } from '../../design/schema'
import type { CustomDeviceParams } from '../../design/customDevice'

/** A protective device: a fuse, a breaker, or one way of a fuse panel. */
export interface ProtectiveDevice {
  /** The part id, or "panelId#wayN" for way N of a fuse panel. */
  id: string
  partId: string
  kind: 'fuse' | 'breaker' | 'panel-way'
  family: string
  ratingA: number
  dcVoltageRatingV: number
  interruptingRatingA: number
  ignitionProtected: boolean
  closed: boolean
  resistanceOhm: number
  lineTerminal: string
  loadTerminal: string
  /** Field an editor patch sets to change the rating, e.g. 'params.ratingA' or 'params.wayRatingsA.2'. */
  ratingField: string
  label: string
  /** A library device embedded in a fuse or breaker: its band replaces the family's. */
  customDevice?: CustomDeviceParams
}

export function protectiveDevices(design: Design): ProtectiveDevice[] {
  const devices: ProtectiveDevice[] = []
  for (const part of design.parts) {
    if (part.type === 'fuse' || part.type === 'breaker') {
      const p = part.params
      devices.push({
        id: part.id, partId: part.id, kind: part.type, family: p.family, ratingA: p.ratingA,
        dcVoltageRatingV: p.dcVoltageRatingV, interruptingRatingA: p.interruptingRatingA,
        ignitionProtected: p.ignitionProtected, closed: p.closed, resistanceOhm: p.resistanceOhm,
        lineTerminal: 'line', loadTerminal: 'load', ratingField: 'params.ratingA', label: part.label || part.id,
        ...(p.customDevice ? { customDevice: p.customDevice } : {}),
      })
    } else if (part.type === 'fuse-panel') {
      const p = part.params
      for (let i = 0; i < p.ways; i++) {
        const ratingA = p.wayRatingsA[i]
        if (ratingA === undefined) continue
        devices.push({
          id: `${part.id}#way${i + 1}`, partId: part.id, kind: 'panel-way', family: p.family, ratingA,
          dcVoltageRatingV: p.dcVoltageRatingV, interruptingRatingA: p.interruptingRatingA,
          ignitionProtected: p.ignitionProtected, closed: true, resistanceOhm: p.resistanceOhm,
          lineTerminal: 'in-pos', loadTerminal: `out${i + 1}`, ratingField: `params.wayRatingsA.${i}`,
          label: `${part.label || part.id}, way ${i + 1}`,
        })
      }
    }
  }
  return devices
}
