import { and, asc, eq } from 'drizzle-orm'
import type { CustomDevice, CustomDeviceData, DevicePoint } from '../../../shared/api/devices.schemas'
import type { DbOrTx } from '../../db/client'
import { customDevices } from '../../db/schema'

// custom_devices rows, always scoped to one organisation: another organisation's id finds nothing.

type Row = typeof customDevices.$inferSelect

function toDevice(row: Row): CustomDevice {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind === 'breaker' ? 'breaker' : 'fuse',
    ratingA: row.ratingA,
    dcVoltageRatingV: row.dcVoltageRatingV,
    interruptingRatingA: row.interruptingRatingA,
    ignitionProtected: row.ignitionProtected,
    timeDelay: row.timeDelay,
    points: row.points as DevicePoint[],
    source: row.source,
    createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  }
}

export async function listDevices(db: DbOrTx, organizationId: string): Promise<CustomDevice[]> {
  const rows = await db.select().from(customDevices).where(eq(customDevices.organizationId, organizationId)).orderBy(asc(customDevices.name), asc(customDevices.id))
  return rows.map(toDevice)
}

export async function findDevice(db: DbOrTx, organizationId: string, id: string): Promise<CustomDevice | undefined> {
  const [row] = await db.select().from(customDevices).where(and(eq(customDevices.organizationId, organizationId), eq(customDevices.id, id))).limit(1)
  return row ? toDevice(row) : undefined
}

export async function insertDevice(db: DbOrTx, organizationId: string, createdBy: string, data: CustomDeviceData): Promise<CustomDevice> {
  const [row] = await db.insert(customDevices).values({ ...data, organizationId, createdBy }).returning()
  return toDevice(row)
}

export async function updateDevice(db: DbOrTx, organizationId: string, id: string, data: CustomDeviceData): Promise<CustomDevice | undefined> {
  const [row] = await db
    .update(customDevices)
    .set({ ...data, updatedAt: new Date() })
    .where(and(eq(customDevices.organizationId, organizationId), eq(customDevices.id, id)))
    .returning()
  return row ? toDevice(row) : undefined
}

export async function deleteDevice(db: DbOrTx, organizationId: string, id: string): Promise<boolean> {
  const rows = await db.delete(customDevices).where(and(eq(customDevices.organizationId, organizationId), eq(customDevices.id, id))).returning({ id: customDevices.id })
  return rows.length > 0
}
