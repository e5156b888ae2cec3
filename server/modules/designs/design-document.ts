// The one place the server learns what a design document is. Until shared/design/schema.ts exists,
// any JSON object is accepted and a new project starts with an empty object.
import { z } from 'zod'

export const designDocumentSchema = z.object({}).passthrough()

export function emptyDesignDocument(): Record<string, unknown> {
  return {}
}
