import { z } from 'zod'
import { DEVICE_FAMILIES, DEVICE_FAMILY_IDS, type DeviceFamilyId } from '../protection/ratings'
import type { BillOfMaterials } from './billOfMaterials'

// The spare fuses to carry aboard: one of every fuse family and rating in use, two where a rating is
// used often (common practice), and a flag where the rating is not in the family's usual list (hard to
// find on the road). Breakers reset, so they get no spares. The list is editable before export.

/** From this many fuses of one family and rating, carry two spares (common practice). */
export const OFTEN_USED_COUNT = 3

export interface SpareLine {
  family: DeviceFamilyId
  familyLabel: string
  ratingA: number
  inUse: number
  quantity: number
  hardToFind: boolean
  note: string
}

export function buildSpares(bom: Pick<BillOfMaterials, 'devices'>): SpareLine[] {
  return bom.devices
    .filter((d) => d.kind === 'fuse')
    .map((d) => {
      const family = DEVICE_FAMILIES[d.family]
      const hardToFind = !family || !family.ratingsA.some((r) => Math.abs(r - d.ratingA) < 1e-9)
      const often = d.quantity >= OFTEN_USED_COUNT
      const notes = [often ? `used ${d.quantity} times: carry two (common practice)` : 'one spare of each rating used (common practice)']
      if (hardToFind) notes.push(`${d.ratingA} A is not a usual rating for this family: hard to find, carry it`)
      return { family: d.family, familyLabel: d.familyLabel, ratingA: d.ratingA, inUse: d.quantity, quantity: often ? 2 : 1, hardToFind, note: notes.join('; ') }
    })
}

/** An edited spares list sent back for the CSV (bounded so a request cannot grow without limit). */
export const spareEditSchema = z.object({
  family: z.enum(DEVICE_FAMILY_IDS, { error: 'Choose a fuse family' }),
  ratingA: z.number({ error: 'Enter the rating in A' }).positive('The rating must be above 0 A').max(1000, 'Ratings go up to 1000 A'),
  quantity: z.number({ error: 'Enter how many spares' }).int('Whole spares only').min(0, 'Zero or more spares').max(100, 'At most 100 spares of one kind'),
  note: z.string().max(200, 'Keep the note under 200 characters').optional(),
})
export const sparesEditSchema = z.object({
  spares: z.array(spareEditSchema).max(200, 'At most 200 spare lines'),
  wasteAllowancePct: z.number().min(0, 'The waste allowance cannot be negative').max(100, 'At most 100 % waste allowance').optional(),
})
export type SpareEdit = z.infer<typeof spareEditSchema>
export type SparesEdit = z.infer<typeof sparesEditSchema>

/** Spare lines from an edit: family labels and hard-to-find flags recomputed, notes kept. */
export function sparesFromEdit(edit: SpareEdit[], bom: Pick<BillOfMaterials, 'devices'>): SpareLine[] {
  return edit.map((e) => {
    const family = DEVICE_FAMILIES[e.family]
    const inUse = bom.devices.filter((d) => d.kind === 'fuse' && d.family === e.family && d.ratingA === e.ratingA).reduce((s, d) => s + d.quantity, 0)
    const hardToFind = !family.ratingsA.some((r) => Math.abs(r - e.ratingA) < 1e-9)
    return { family: e.family, familyLabel: family.label, ratingA: e.ratingA, inUse, quantity: e.quantity, hardToFind, note: e.note ?? '' }
  })
}
