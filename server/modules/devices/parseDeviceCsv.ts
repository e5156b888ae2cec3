// Time-current points from CSV (csv-parse): a current column (A, or a multiple of the rating) and
// minimum-melting and/or maximum-clearing times in seconds. Every bad cell is reported with its line
// and column; nothing is returned unless every row is good.
import { parse } from 'csv-parse/sync'
import { DEVICE_POINTS_MAX, type DevicePoint } from '../../../shared/api/devices.schemas'
import type { FieldError } from '../../../shared/errors'

type Column = 'currentA' | 'multiple' | 'minMeltS' | 'maxClearS'

/** Header spellings accepted for each column (case, spaces, "_", "-", "/" and brackets ignored). */
const HEADERS: Record<Column, string[]> = {
  currentA: ['currenta', 'current', 'amps', 'a', 'ia'],
  multiple: ['multiple', 'multipleofrating', 'xin', 'iin'],
  minMeltS: ['minmelts', 'minmelt', 'minimummelting', 'minimummeltings', 'minmeltingtimes', 'mins'],
  maxClearS: ['maxclears', 'maxclear', 'maximumclearing', 'maximumclearings', 'maxclearingtimes', 'maxs'],
}
const norm = (h: string) => h.toLowerCase().replace(/[\s_\-/().[\]]/g, '')

export interface DeviceCsvResult {
  ok: boolean
  points: DevicePoint[]
  /** CSV line of each point, to report later checks (the band's) by line. */
  lines: number[]
  errors: FieldError[]
}

const fail = (line: number, column: string, message: string): FieldError => ({ path: `line ${line}.${column}`, message: `Line ${line}, column "${column}": ${message}` })

export function parseDeviceCsv(text: string): DeviceCsvResult {
  const bad = (errors: FieldError[]): DeviceCsvResult => ({ ok: false, points: [], lines: [], errors })
  let records: { record: Record<string, string>; info: { lines: number } }[]
  try {
    records = parse(text, { columns: (header: string[]) => header.map((h) => h.trim()), bom: true, trim: true, skip_empty_lines: true, info: true })
  } catch (error) {
    const e = error as { lines?: number; message?: string }
    return bad([{ path: `line ${e.lines ?? 1}`, message: `The CSV could not be read: ${e.message ?? 'unknown error'}` }])
  }
  if (records.length === 0) return bad([{ path: 'line 1', message: 'The file has no points under its header' }])
  if (records.length > DEVICE_POINTS_MAX) return bad([{ path: 'line 1', message: `At most ${DEVICE_POINTS_MAX} points per device` }])

  const headers = Object.keys(records[0].record)
  const columnOf = (key: Column) => headers.find((h) => HEADERS[key].includes(norm(h)))
  const columns: Record<Column, string | undefined> = { currentA: columnOf('currentA'), multiple: columnOf('multiple'), minMeltS: columnOf('minMeltS'), maxClearS: columnOf('maxClearS') }
  const missing: FieldError[] = []
  if (!columns.currentA && !columns.multiple) missing.push({ path: 'line 1.currentA', message: 'Line 1: add a "currentA" column (or "multiple" of the rating)' })
  if (!columns.minMeltS && !columns.maxClearS) missing.push({ path: 'line 1.minMeltS', message: 'Line 1: add a "minMeltS" and/or a "maxClearS" column' })
  if (missing.length > 0) return bad(missing)

  const errors: FieldError[] = []
  const points: DevicePoint[] = []
  const lines: number[] = []
  for (const { record, info } of records) {
    const line = info.lines
    const number = (key: Column, label: string): number | undefined => {
      const column = columns[key]
      const raw = column ? (record[column] ?? '').trim() : ''
      if (raw === '') return undefined
      const value = Number(raw.replace(',', '.'))
      if (!Number.isFinite(value) || value <= 0) {
        errors.push(fail(line, column!, `"${raw}" is not a positive ${label}`))
        return undefined
      }
      return value
    }
    const before = errors.length
    const point: DevicePoint = {
      currentA: number('currentA', 'current in A'),
      multiple: number('multiple', 'multiple of the rating'),
      minMeltS: number('minMeltS', 'time in s'),
      maxClearS: number('maxClearS', 'time in s'),
    }
    if (errors.length > before) continue
    if (point.currentA === undefined && point.multiple === undefined) errors.push(fail(line, (columns.currentA ?? columns.multiple)!, 'enter the current'))
    else if (point.currentA !== undefined && point.multiple !== undefined) errors.push(fail(line, columns.multiple!, 'give the current in A or the multiple, not both'))
    else if (point.minMeltS === undefined && point.maxClearS === undefined) errors.push(fail(line, (columns.minMeltS ?? columns.maxClearS)!, 'enter a minimum melting or a maximum clearing time'))
    else {
      points.push(Object.fromEntries(Object.entries(point).filter(([, v]) => v !== undefined)) as DevicePoint)
      lines.push(line)
    }
  }
  return errors.length > 0 ? bad(errors) : { ok: true, points, lines, errors: [] }
}

/** Turns an issue at `points.N.field` into one at the CSV line of point N. */
export function issueAtLine(issue: FieldError, lines: number[]): FieldError {
  const match = /^points\.(\d+)\.(\w+)$/.exec(issue.path)
  if (!match) return issue.path === 'points' ? { path: 'csv', message: issue.message } : issue
  const line = lines[Number(match[1])] ?? 1
  return { path: `line ${line}.${match[2]}`, message: `Line ${line}, column "${match[2]}": ${issue.message}` }
}
