// Limits and shapes of project attachments (datasheets and photos), shared by the API and the client.

/** Largest file accepted, bytes (10 MiB). */
export const UPLOAD_MAX_BYTES = 10 * 1024 * 1024
export const UPLOAD_MAX_LABEL = '10 MB'
/** What may be uploaded; the server checks the content's magic bytes, not the name. */
export const UPLOAD_CONTENT_TYPES = ['application/pdf', 'image/png', 'image/jpeg'] as const
export type UploadContentType = (typeof UPLOAD_CONTENT_TYPES)[number]
export const UPLOAD_ACCEPT = '.pdf,.png,.jpg,.jpeg,application/pdf,image/png,image/jpeg'

export interface Attachment {
  id: string
  partId: string | null
  filename: string
  contentType: UploadContentType
  size: number
  sha256: string
  uploadedBy: string | null
  createdAt: string
}

/** Load-list CSV import: the largest file and number of rows accepted. */
export const LOAD_CSV_MAX_BYTES = 256 * 1024
export const LOAD_CSV_MAX_ROWS = 200
