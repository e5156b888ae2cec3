import { createHash, randomUUID } from 'node:crypto'
import path from 'node:path'
import { Router, type RequestHandler } from 'express'
import multer from 'multer'
import { z } from 'zod'
import { UPLOAD_MAX_BYTES, UPLOAD_MAX_LABEL, type Attachment, type UploadContentType } from '../../../shared/api/uploads.schemas'
import { ID_PATTERN } from '../../../shared/design/ids'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import { HttpError, invalidRequest, notFound } from '../../http/errors'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import type { ObjectStorage } from '../../storage/objectStorage'
import { getProject } from '../projects/projects.service'
import { deleteAttachment, findAttachment, insertAttachment, listAttachments, type AttachmentRow } from './attachments.repository'
import { detectFileType } from './fileType'

// Datasheets (PDF) and photos (PNG, JPEG) of a project or one of its parts. Files go to object storage;
// downloads pass through here so the project's role checks apply to every byte.

const TOO_LARGE = `The file is larger than ${UPLOAD_MAX_LABEL}. Upload a smaller file (compress the photo or split the PDF).`
const WRONG_TYPE = 'Only PDF, PNG and JPEG files can be uploaded (checked on the file content, not its name)'

function toAttachment(row: AttachmentRow): Attachment {
  return {
    id: row.id, partId: row.partId, filename: row.filename, contentType: row.contentType as UploadContentType, size: row.size,
    sha256: row.sha256, uploadedBy: row.uploadedByName ?? null, createdAt: row.createdAt.toISOString(),
  }
}

/** multer in memory with the shared size limit; its errors become our 413 / 400. */
function singleFile(): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: UPLOAD_MAX_BYTES, files: 1, fields: 5 } }).single('file')
  return (req, res, next) => {
    upload(req, res, (error: unknown) => {
      if (!error) return next()
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'payload_too_large', TOO_LARGE))
        return next(invalidRequest(`The upload could not be read (${error.message}). Send one file in the "file" field.`))
      }
      next(error)
    })
  }
}

/** A plain file name to show and to download as: no folders, no control characters. */
function cleanFilename(name: string): string {
  // eslint-disable-next-line no-control-regex
  const base = path.basename(name.replace(/\\/g, '/')).replace(/[\x00-\x1f\x7f"]/g, '').trim()
  return base.slice(0, 200) || 'file'
}

const partIdSchema = z.string().regex(ID_PATTERN, 'Not a valid part id').optional()

export function uploadsRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router({ mergeParams: true })
  const params = z.object({ id: idParam })
  const storageOf = (): ObjectStorage => {
    if (!deps.storage) throw new HttpError(503, 'internal', 'File storage is not configured on this server')
    return deps.storage
  }
  router.use(deps.requireSession)

  const projectInput = validate({ params })
  router.post('/', requirePermission('design.write', 'upload files'), projectInput, async (req, _res, next) => {
    await getProject(db, actorOf(req), projectInput.data(req).params.id)
    next()
  }, singleFile(), async (req, res) => {
    const projectId = projectInput.data(req).params.id
    const file = req.file
    if (!file) throw invalidRequest('Choose a file to upload', [{ path: 'file', message: 'Choose a file to upload' }])
    const contentType = detectFileType(file.buffer)
    if (!contentType) throw invalidRequest(WRONG_TYPE, [{ path: 'file', message: WRONG_TYPE }])
    const partId = partIdSchema.safeParse((req.body as { partId?: unknown } | undefined)?.partId || undefined)
    if (!partId.success) throw invalidRequest('Not a valid part id', [{ path: 'partId', message: 'Not a valid part id' }])
    const storageKey = `projects/${projectId}/${randomUUID()}`
    const storage = storageOf()
    await storage.put(storageKey, file.buffer, contentType)
    try {
      const id = await insertAttachment(db, {
        projectId, partId: partId.data ?? null, filename: cleanFilename(file.originalname), contentType, size: file.size,
        sha256: createHash('sha256').update(file.buffer).digest('hex'), storageKey, uploadedBy: actorOf(req).userId,
      })
      const row = await findAttachment(db, projectId, id)
      res.status(201).json(toAttachment(row!))
    } catch (error) {
      await storage.delete(storageKey).catch(() => undefined)
      throw error
    }
  })

  // ?partId= lists the files of one part only (the editor's part inspector).
  const listInput = validate({ params, query: z.object({ partId: partIdSchema }) })
  router.get('/', requirePermission('project.read'), listInput, async (req, res) => {
    const { params: p, query } = listInput.data(req)
    await getProject(db, actorOf(req), p.id)
    res.json((await listAttachments(db, p.id, query.partId)).map(toAttachment))
  })

  const oneInput = validate({ params: params.extend({ attachmentId: idParam }) })
  router.get('/:attachmentId/download', requirePermission('project.read'), oneInput, async (req, res) => {
    const { id, attachmentId } = oneInput.data(req).params
    await getProject(db, actorOf(req), id)
    const row = await findAttachment(db, id, attachmentId)
    if (!row) throw notFound('Attachment')
    const body = await storageOf().get(row.storageKey)
    res.type(row.contentType)
    res.set('Content-Disposition', `attachment; filename="${row.filename.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(row.filename)}`)
    res.send(body)
  })

  router.delete('/:attachmentId', requirePermission('design.write', 'delete files'), oneInput, async (req, res) => {
    const { id, attachmentId } = oneInput.data(req).params
    await getProject(db, actorOf(req), id)
    const row = await deleteAttachment(db, id, attachmentId)
    if (!row) throw notFound('Attachment')
    await storageOf().delete(row.storageKey).catch((error: unknown) => console.error('[storage] delete failed:', error instanceof Error ? error.message : error))
    res.status(204).end()
  })
  return router
}
