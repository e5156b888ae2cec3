// In-memory limits per client address and e-mail: sign-in attempts (config.loginRateLimit, 10 per
// 15 minutes; successful sign-ins do not count, so only guessing is slowed down) and password-reset
// e-mails (config.resetRateLimit, so nobody can flood an inbox).
import type { Request, RequestHandler } from 'express'
import { ipKeyGenerator, rateLimit } from 'express-rate-limit'
import type { AppConfig } from '../config'
import { rateLimited } from './errors'

function addressAndEmail(req: Request): string {
  const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : ''
  return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`
}

function limiter(options: { max: number; windowMs: number; skipSuccessfulRequests: boolean; message: string }) {
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: options.skipSuccessfulRequests,
    keyGenerator: addressAndEmail,
    handler: (_req, _res, next) => next(rateLimited(options.message)),
  })
}

const minutesIn = (windowMs: number) => Math.ceil(windowMs / 60_000)

export function loginRateLimit(config: AppConfig): RequestHandler {
  const { max, windowMs } = config.loginRateLimit
  return limiter({
    max,
    windowMs,
    skipSuccessfulRequests: true,
    message: `Too many sign-in attempts. Wait ${minutesIn(windowMs)} minutes and try again.`,
  })
}

export function passwordResetRateLimit(config: AppConfig): RequestHandler {
  const { max, windowMs } = config.resetRateLimit
  return limiter({
    max,
    windowMs,
    skipSuccessfulRequests: false,
    message: `Too many reset requests for this address. Wait ${minutesIn(windowMs)} minutes and try again.`,
  })
}
