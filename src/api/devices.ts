// The organisation's device library (/api/devices).
import type { CustomDevice, CustomDeviceInput, DevicePoint } from '@shared/api/devices.schemas'
import { http } from './http'

const path = (id: string) => `/devices/${encodeURIComponent(id)}`

export const listDevices = () => http.get<CustomDevice[]>('/devices')
export const getDevice = (id: string) => http.get<CustomDevice>(path(id))
export const createDevice = (input: CustomDeviceInput) => http.post<CustomDevice>('/devices', input)
export const updateDevice = (id: string, input: Partial<CustomDeviceInput>) => http.patch<CustomDevice>(path(id), input)
export const deleteDevice = (id: string) => http.delete(path(id))
/** Parses a CSV of current/time points without saving (400 with line/column fields when it is bad). */
export const previewDeviceCsv = (csv: string) => http.post<{ points: DevicePoint[] }>('/devices/import-csv', { csv, preview: true })
