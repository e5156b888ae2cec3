import { and, desc, eq } from 'drizzle-orm'
import type { DbOrTx } from '../../db/client'
import { attachments, users } from '../../db/schema'

const columns = {
  id: attachments.id,
  projectId: attachments.projectId,
  partId: attachments.partId,
  filename: attachments.filename,
  contentType: attachments.contentType,
  size: attachments.size,
  sha256: attachments.sha256,
  storageKey: attachments.storageKey,
  uploadedByName: users.name,
  createdAt: attachments.createdAt,
}
export type AttachmentRow = Awaited<ReturnType<typeof listAttachments>>[number]

export async function insertAttachment(db: DbOrTx, values: typeof attachments.$inferInsert): Promise<string> {
  const [row] = await db.insert(attachments).values(values).returning({ id: attachments.id })
  return row.id
}

/** The project's files, newest first; only one part's when partId is given. */
export async function listAttachments(db: DbOrTx, projectId: string, partId?: string) {
  const where = partId ? and(eq(attachments.projectId, projectId), eq(attachments.partId, partId)) : eq(attachments.projectId, projectId)
  return db.select(columns).from(attachments).leftJoin(users, eq(users.id, attachments.uploadedBy))
    .where(where).orderBy(desc(attachments.createdAt), desc(attachments.id))
}

export async function findAttachment(db: DbOrTx, projectId: string, id: string) {
  const [row] = await db.select(columns).from(attachments).leftJoin(users, eq(users.id, attachments.uploadedBy))
    .where(and(eq(attachments.projectId, projectId), eq(attachments.id, id)))
  return row
}

export async function deleteAttachment(db: DbOrTx, projectId: string, id: string) {
  const [row] = await db.delete(attachments).where(and(eq(attachments.projectId, projectId), eq(attachments.id, id)))
    .returning({ storageKey: attachments.storageKey })
  return row
}
