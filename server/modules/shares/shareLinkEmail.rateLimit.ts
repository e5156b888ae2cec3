// At most SHARE_LINK_MAILS_PER_HOUR e-mails of one link per hour (in memory, like the sign-in limits), so
// a link cannot be used to flood an inbox. Only sends that went out count.
import type { RequestHandler } from 'express'
import { rateLimit } from 'express-rate-limit'
import { SHARE_LINK_MAILS_PER_HOUR } from '../../../shared/api/shares.schemas'
import { rateLimited } from '../../http/errors'

const HOUR_MS = 60 * 60 * 1000

export function shareLinkEmailRateLimit(): RequestHandler {
  return rateLimit({
    windowMs: HOUR_MS,
    limit: SHARE_LINK_MAILS_PER_HOUR,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipFailedRequests: true,
    keyGenerator: (req) => `share-link:${String(req.params.linkId)}`,
    handler: (_req, _res, next) =>
      next(rateLimited(`This link was already e-mailed ${SHARE_LINK_MAILS_PER_HOUR} times in the last hour. Wait an hour before sending it again.`)),
  })
}
