import { z } from 'zod'

export const REVISION_NAME_MAX = 120

/** POST /api/projects/:id/revisions — e.g. "issued for review", "as built". */
export const revisionInputSchema = z.object({
  name: z
    .string({ error: 'Enter a name for the revision' })
    .trim()
    .min(1, 'Enter a name for the revision')
    .max(REVISION_NAME_MAX, `A revision name has at most ${REVISION_NAME_MAX} characters`),
})
export type RevisionInput = z.input<typeof revisionInputSchema>

/** GET /api/projects/:id/revisions/compare?from=&to= */
export const revisionCompareQuerySchema = z.object({
  from: z.string({ error: 'Choose the revision to compare from' }).uuid('Not a valid revision id'),
  to: z.string({ error: 'Choose the revision to compare to' }).uuid('Not a valid revision id'),
})

export interface Revision {
  id: string
  name: string
  createdAt: string
  author: { id: string; name: string } | null
  /** The revision this one restored, when it was recorded by a restore. */
  restoredFrom: string | null
}
