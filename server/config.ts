// The only place that reads the environment. Everything else receives an AppConfig.
import { randomBytes } from 'node:crypto'
import fs from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import type { S3Settings } from './storage/objectStorage'

export const REPO_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..')

export interface SmtpConfig {
  /** Unset: main.ts starts the local fake SMTP server and sends there. */
  host: string | undefined
  port: number
  user: string | undefined
  pass: string | undefined
  from: string
  /** Port for the local fake (0 = any free port). */
  fakePort: number
}

export interface AppConfig {
  port: number
  host: string
  databaseUrl: string
  /** Maintenance connection used to create or drop the application database. */
  adminDatabaseUrl: string | undefined
  jwtSecret: Uint8Array
  sessionTtlSeconds: number
  smtp: SmtpConfig
  /** Base for links in e-mails, e.g. http://127.0.0.1:8080 (no trailing slash). */
  publicUrl: string
  /** Extra origins allowed to send state-changing requests (besides the server's own Host). */
  allowedOrigins: string[]
  dataDir: string
  clientDir: string
  serveClient: boolean
  bcryptCost: number
  jsonBodyLimit: string
  loginRateLimit: { max: number; windowMs: number }
  resetRateLimit: { max: number; windowMs: number }
  secureCookies: boolean
  /** A real bucket (S3_BUCKET set); null: main.ts and the tests start the local fake in <dataDir>/s3. */
  s3: S3Settings | null
}

type Env = Record<string, string | undefined>

const EIGHT_HOURS_S = 8 * 60 * 60

function intFrom(env: Env, name: string, fallback: number): number {
  const raw = env[name]
  if (raw === undefined || raw === '') return fallback
  const value = Number(raw)
  if (!Number.isInteger(value) || value < 0) throw new Error(`${name} must be a whole number, got "${raw}"`)
  return value
}

/** AMPWRIGHT_JWT_SECRET, or a random secret generated once into <dataDir>/jwt-secret (mode 0600). */
function loadJwtSecret(env: Env, dataDir: string): Uint8Array {
  const fromEnv = env.AMPWRIGHT_JWT_SECRET
  if (fromEnv) {
    if (fromEnv.length < 32) throw new Error('AMPWRIGHT_JWT_SECRET must be at least 32 characters')
    return new TextEncoder().encode(fromEnv)
  }
  const file = path.join(dataDir, 'jwt-secret')
  if (!fs.existsSync(file)) {
    fs.mkdirSync(dataDir, { recursive: true })
    try {
      fs.writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600, flag: 'wx' })
    } catch (error) {
      // Another process created it between the check and the write: use theirs.
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error
    }
  }
  return new TextEncoder().encode(fs.readFileSync(file, 'utf8').trim())
}

export function loadConfig(env: Env = process.env, overrides: Partial<AppConfig> = {}): AppConfig {
  const port = intFrom(env, 'PORT', 8080)
  const host = '127.0.0.1'
  const databaseUrl = env.DATABASE_URL
  if (!databaseUrl) throw new Error('DATABASE_URL is not set: run `bash scripts/setup.sh` and `source .data/env`')
  const dataDir = env.AMPWRIGHT_DATA_DIR ?? path.join(REPO_ROOT, '.data')
  const publicUrl = (env.AMPWRIGHT_PUBLIC_URL ?? `http://${host}:${port}`).replace(/\/+$/, '')
  const config: AppConfig = {
    port,
    host,
    databaseUrl,
    adminDatabaseUrl: env.PG_ADMIN_URL || undefined,
    jwtSecret: overrides.jwtSecret ?? loadJwtSecret(env, dataDir),
    sessionTtlSeconds: intFrom(env, 'AMPWRIGHT_SESSION_TTL', EIGHT_HOURS_S),
    smtp: {
      host: env.SMTP_HOST || undefined,
      port: intFrom(env, 'SMTP_PORT', env.SMTP_HOST ? 587 : 0),
      user: env.SMTP_USER || undefined,
      pass: env.SMTP_PASS || undefined,
      from: env.SMTP_FROM ?? 'Ampwright <no-reply@ampwright.test>',
      fakePort: intFrom(env, 'AMPWRIGHT_FAKE_SMTP_PORT', 0),
    },
    publicUrl,
    allowedOrigins: (env.AMPWRIGHT_ALLOWED_ORIGINS ?? '')
      .split(',')
      .map((origin) => origin.trim().replace(/\/+$/, ''))
      .filter(Boolean),
    dataDir,
    clientDir: path.join(REPO_ROOT, 'dist'),
    serveClient: false,
    // bcrypt work factor: 12 by default; never below 10. The test run sets 10 to keep sign-ups quick.
    bcryptCost: Math.max(10, intFrom(env, 'AMPWRIGHT_BCRYPT_COST', 12)),
    jsonBodyLimit: '5mb',
    loginRateLimit: { max: 10, windowMs: 15 * 60 * 1000 },
    resetRateLimit: { max: 5, windowMs: 60 * 60 * 1000 },
    secureCookies: publicUrl.startsWith('https:'),
    s3: env.S3_BUCKET
      ? {
          endpoint: env.S3_ENDPOINT || undefined,
          bucket: env.S3_BUCKET,
          region: env.S3_REGION || 'us-east-1',
          accessKeyId: env.S3_ACCESS_KEY_ID ?? '',
          secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? '',
          // S3-compatible services on a custom endpoint usually need path-style addressing.
          forcePathStyle: Boolean(env.S3_ENDPOINT),
        }
      : null,
  }
  return { ...config, ...overrides }
}
