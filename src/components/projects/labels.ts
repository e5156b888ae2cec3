import { INSTALLATION_KIND_LABELS, NOMINAL_VOLTAGES_V } from '@shared/api/projects.schemas'

export const installationKindItems = Object.entries(INSTALLATION_KIND_LABELS).map(([value, title]) => ({ value, title }))
export const nominalVoltageItems = NOMINAL_VOLTAGES_V.map((value) => ({ value, title: `${value} V` }))

const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' })
export function formatDateTime(iso: string): string {
  const date = new Date(iso)
  return Number.isNaN(date.getTime()) ? '—' : dateTime.format(date)
}
