// Sign-in attempts per client address and e-mail (config.loginRateLimit, 10 per 15 minutes), counted in
// memory. Successful sign-ins do not count, so only guessing is slowed down.
import type { RequestHandler } from 'express'
import { ipKeyGenerator, rateLimit } from 'express-rate-limit'
import type { AppConfig } from '../config'
import { rateLimited } from './errors'

export function loginRateLimit(config: AppConfig): RequestHandler {
  const { max, windowMs } = config.loginRateLimit
  return rateLimit({
    windowMs,
    limit: max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    keyGenerator: (req) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : ''
      return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`
    },
    handler: (_req, _res, next) => {
      const minutes = Math.ceil(windowMs / 60_000)
      next(rateLimited(`Too many sign-in attempts. Wait ${minutes} minutes and try again.`))
    },
  })
}
