// State-changing requests must come from our own pages: their Origin (or, failing that, Referer) must
// match the Host they were sent to, the public URL, or an origin allowed in the config. With the
// SameSite=Lax cookie this closes cross-site request forgery.
import type { Request, RequestHandler } from 'express'
import type { AppConfig } from '../config'
import { badOrigin } from './errors'

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS'])

function originOf(value: string | undefined): URL | undefined {
  if (!value || value === 'null') return undefined
  try {
    return new URL(value)
  } catch {
    return undefined
  }
}

function sourceOrigin(req: Request): URL | undefined {
  return originOf(req.get('origin')) ?? originOf(req.get('referer'))
}

export function originCheck(config: AppConfig): RequestHandler {
  const allowed = new Set([new URL(config.publicUrl).origin, ...config.allowedOrigins])
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next()
    const source = sourceOrigin(req)
    const ok = source !== undefined && (source.host === req.get('host') || allowed.has(source.origin))
    if (!ok) throw badOrigin()
    next()
  }
}
