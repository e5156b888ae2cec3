// The bill of materials as CSV (csv-stringify): one row per line, a `section` column and explicit
// numeric columns, so a spreadsheet can total them.
import { stringify } from 'csv-stringify/sync'
import type { BillOfMaterials, SpareLine } from '../../../shared/export'

export const BOM_COLUMNS = ['section', 'item', 'size', 'colour', 'material', 'family', 'rating_a', 'quantity', 'unit', 'length_m', 'order_length_m', 'note'] as const

/** A cell a spreadsheet would run as a formula (=, +, -, @, tab, CR) is prefixed with an apostrophe (OWASP CSV injection). */
export function safeCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value
}

export function bomCsv(bom: BillOfMaterials, spares: SpareLine[]): string {
  const rows: (string | number)[][] = []
  const row = (cells: Partial<Record<(typeof BOM_COLUMNS)[number], string | number>>) =>
    rows.push(BOM_COLUMNS.map((c) => {
      const v = cells[c]
      return typeof v === 'string' ? safeCell(v) : v ?? ''
    }))
  for (const p of bom.parts) row({ section: 'part', item: p.kind, size: p.description, quantity: p.quantity, unit: 'pcs', note: p.labels.join('; ') })
  for (const c of bom.conductors) {
    row({ section: 'conductor', item: `${c.sizeLabel} ${c.colour} ${c.material}`, size: c.sizeLabel, colour: c.colour, material: c.material,
      quantity: c.runs, unit: 'runs', length_m: c.lengthM, order_length_m: c.orderLengthM, note: `${bom.wasteAllowancePct} % waste allowance (common practice)` })
  }
  for (const t of bom.terminals) row({ section: 'terminal', item: `Crimp terminal / lug for ${t.sizeLabel}`, size: t.sizeLabel, quantity: t.quantity, unit: 'pcs', note: 'one per conductor end; match the stud size of each part' })
  for (const d of bom.devices) row({ section: d.kind, item: d.familyLabel, family: d.family, rating_a: d.ratingA, quantity: d.quantity, unit: 'pcs' })
  for (const s of spares) {
    row({ section: 'spare', item: `Spare: ${s.familyLabel}`, family: s.family, rating_a: s.ratingA, quantity: s.quantity, unit: 'pcs',
      note: `${s.hardToFind ? 'HARD TO FIND; ' : ''}${s.note}` })
  }
  return stringify(rows, { header: true, columns: [...BOM_COLUMNS] })
}
