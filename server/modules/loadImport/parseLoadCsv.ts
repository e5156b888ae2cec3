// A load list from CSV (csv-parse): name, watts or amps, hours per day, critical. Every bad cell is
// reported with its line and column; nothing is returned unless every row is good.
import { parse } from 'csv-parse/sync'
import type { FieldError } from '../../../shared/errors'
import { LOAD_CSV_MAX_ROWS } from '../../../shared/api/uploads.schemas'

export interface LoadRow {
  name: string
  watts?: number
  amps?: number
  hoursPerDay: number
  critical: boolean
}

/** Header spellings accepted for each column (case, spaces, "_" and "-" ignored). */
const HEADERS: Record<keyof LoadRow, string[]> = {
  name: ['name', 'load', 'description'],
  watts: ['watts', 'w', 'power', 'powerw'],
  amps: ['amps', 'a', 'current', 'currenta'],
  hoursPerDay: ['hoursperday', 'hours', 'hoursday', 'hday'],
  critical: ['critical'],
}
const norm = (h: string) => h.toLowerCase().replace(/[\s_\-/().]/g, '')
const YES = new Set(['yes', 'y', 'true', '1'])
const NO = new Set(['no', 'n', 'false', '0'])

const fail = (line: number, column: string, message: string): FieldError => ({ path: `line ${line}.${column}`, message: `Line ${line}, column "${column}": ${message}` })

export function parseLoadCsv(text: string): { ok: true; rows: LoadRow[] } | { ok: false; errors: FieldError[] } {
  let records: { record: Record<string, string>; info: { lines: number } }[]
  try {
    records = parse(text, { columns: (header: string[]) => header.map((h) => h.trim()), bom: true, trim: true, skip_empty_lines: true, info: true, relax_column_count: false })
  } catch (error) {
    const e = error as { lines?: number; message?: string }
    return { ok: false, errors: [{ path: `line ${e.lines ?? 1}`, message: `The CSV could not be read: ${e.message ?? 'unknown error'}` }] }
  }
  if (records.length === 0) return { ok: false, errors: [{ path: 'line 1', message: 'The file has no load rows under its header' }] }
  if (records.length > LOAD_CSV_MAX_ROWS) return { ok: false, errors: [{ path: 'line 1', message: `At most ${LOAD_CSV_MAX_ROWS} loads per import` }] }

  const headers = Object.keys(records[0].record)
  const columnOf = (key: keyof LoadRow) => headers.find((h) => HEADERS[key].includes(norm(h)))
  const columns = { name: columnOf('name'), watts: columnOf('watts'), amps: columnOf('amps'), hoursPerDay: columnOf('hoursPerDay'), critical: columnOf('critical') }
  const missing: FieldError[] = []
  if (!columns.name) missing.push({ path: 'line 1.name', message: 'Line 1: add a "name" column' })
  if (!columns.watts && !columns.amps) missing.push({ path: 'line 1.watts', message: 'Line 1: add a "watts" or an "amps" column' })
  if (!columns.hoursPerDay) missing.push({ path: 'line 1.hours per day', message: 'Line 1: add an "hours per day" column' })
  if (!columns.critical) missing.push({ path: 'line 1.critical', message: 'Line 1: add a "critical" column (yes/no)' })
  if (missing.length > 0) return { ok: false, errors: missing }

  const errors: FieldError[] = []
  const rows: LoadRow[] = []
  for (const { record, info } of records) {
    const line = info.lines
    const cell = (column: string | undefined) => (column ? (record[column] ?? '').trim() : '')
    const number = (column: string | undefined, label: string, max: number): number | undefined => {
      const raw = cell(column)
      if (raw === '') return undefined
      const value = Number(raw.replace(',', '.'))
      if (!Number.isFinite(value) || value < 0 || value > max) {
        errors.push(fail(line, column ?? label, `"${raw}" is not a number from 0 to ${max}`))
        return undefined
      }
      return value
    }
    const name = cell(columns.name)
    if (name === '') errors.push(fail(line, columns.name!, 'enter the load name'))
    else if (name.length > 120) errors.push(fail(line, columns.name!, 'keep the name under 120 characters'))
    const watts = number(columns.watts, 'watts', 20000)
    const amps = number(columns.amps, 'amps', 1000)
    const rawW = cell(columns.watts)
    const rawA = cell(columns.amps)
    if (rawW === '' && rawA === '') errors.push(fail(line, columns.watts ?? columns.amps!, 'give the watts or the amps'))
    if (rawW !== '' && rawA !== '') errors.push(fail(line, columns.amps ?? 'amps', 'give the watts or the amps, not both'))
    const hoursPerDay = number(columns.hoursPerDay, 'hours per day', 24)
    if (cell(columns.hoursPerDay) === '') errors.push(fail(line, columns.hoursPerDay!, 'enter the hours per day (0 to 24)'))
    const criticalText = cell(columns.critical).toLowerCase()
    const critical = YES.has(criticalText) ? true : NO.has(criticalText) ? false : undefined
    if (critical === undefined) errors.push(fail(line, columns.critical!, `"${cell(columns.critical)}" is not yes, no, true or false`))
    if (name && hoursPerDay !== undefined && critical !== undefined && (watts !== undefined) !== (amps !== undefined)) {
      rows.push({ name, watts, amps, hoursPerDay, critical })
    }
  }
  return errors.length > 0 ? { ok: false, errors } : { ok: true, rows }
}
