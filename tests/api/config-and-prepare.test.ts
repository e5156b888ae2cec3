// loadConfig (the only reader of the environment) and the database preparation used by `npm start`
// and `npm test`: create when missing, migrate, seed once.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { randomUUID } from 'node:crypto'
import pg from 'pg'
import { afterAll, describe, expect, it } from 'vitest'
import { loadConfig } from '../../server/config'
import { prepareDatabase } from '../../server/db/prepare'
import { DEMO_ACCOUNTS } from '../../server/db/seed'

const tempDirs: string[] = []
function tempDataDir(): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'ampwright-config-'))
  tempDirs.push(dir)
  return dir
}
afterAll(() => tempDirs.forEach((dir) => fs.rmSync(dir, { recursive: true, force: true })))

const baseEnv = { DATABASE_URL: 'postgres://u:p@127.0.0.1:1/db' }

describe('loadConfig', () => {
  it('has the documented defaults', () => {
    const config = loadConfig({ ...baseEnv, AMPWRIGHT_DATA_DIR: tempDataDir() })
    expect(config.port).toBe(8080)
    expect(config.host).toBe('127.0.0.1')
    expect(config.sessionTtlSeconds).toBe(8 * 3600)
    expect(config.publicUrl).toBe('http://127.0.0.1:8080')
    expect(config.smtp.host).toBeUndefined()
    expect(config.bcryptCost).toBe(12)
    expect(config.secureCookies).toBe(false)
  })

  it('generates the JWT secret once into <dataDir>/jwt-secret with mode 0600, then reuses it', () => {
    const dataDir = tempDataDir()
    const first = loadConfig({ ...baseEnv, AMPWRIGHT_DATA_DIR: dataDir })
    const file = path.join(dataDir, 'jwt-secret')
    expect(fs.statSync(file).mode & 0o777).toBe(0o600)
    expect(first.jwtSecret.length).toBeGreaterThanOrEqual(32)
    const second = loadConfig({ ...baseEnv, AMPWRIGHT_DATA_DIR: dataDir })
    expect(Buffer.from(second.jwtSecret).equals(Buffer.from(first.jwtSecret))).toBe(true)
  })

  it('reads the environment: port, TTL, SMTP, public URL (https → secure cookies), allowed origins', () => {
    const config = loadConfig({
      ...baseEnv,
      PORT: '9000',
      AMPWRIGHT_JWT_SECRET: 's'.repeat(40),
      AMPWRIGHT_SESSION_TTL: '600',
      SMTP_HOST: 'mail.example.test',
      SMTP_USER: 'relay',
      SMTP_PASS: 'secret',
      SMTP_FROM: 'Workshop <office@example.test>',
      AMPWRIGHT_PUBLIC_URL: 'https://ampwright.example.test/',
      AMPWRIGHT_ALLOWED_ORIGINS: 'http://localhost:5173, http://127.0.0.1:5173/',
    })
    expect(config).toMatchObject({
      port: 9000,
      sessionTtlSeconds: 600,
      publicUrl: 'https://ampwright.example.test',
      secureCookies: true,
      allowedOrigins: ['http://localhost:5173', 'http://127.0.0.1:5173'],
      smtp: { host: 'mail.example.test', port: 587, user: 'relay', pass: 'secret', from: 'Workshop <office@example.test>' },
    })
    expect(new TextDecoder().decode(config.jwtSecret)).toBe('s'.repeat(40))
  })

  it('refuses bad values with a clear message', () => {
    expect(() => loadConfig({})).toThrow('DATABASE_URL is not set')
    expect(() => loadConfig({ ...baseEnv, PORT: 'eighty', AMPWRIGHT_JWT_SECRET: 's'.repeat(40) })).toThrow(
      'PORT must be a whole number, got "eighty"',
    )
    expect(() => loadConfig({ ...baseEnv, AMPWRIGHT_JWT_SECRET: 'short' })).toThrow('at least 32 characters')
  })
})

describe('prepareDatabase', () => {
  const adminUrl = process.env.PG_ADMIN_URL
  it.skipIf(!adminUrl)('creates a missing database, migrates it, seeds the demo once, and recreates it with fresh', async () => {
    const url = new URL(process.env.DATABASE_URL!)
    url.pathname = `/ampwright_prepare_${randomUUID().slice(0, 8)}`
    const databaseUrl = url.toString()
    const options = { databaseUrl, adminDatabaseUrl: adminUrl, bcryptCost: 4 }
    const countDemoUsers = async () => {
      const client = new pg.Client({ connectionString: databaseUrl })
      await client.connect()
      try {
        const emails = DEMO_ACCOUNTS.map((account) => account.email)
        const { rows } = await client.query('select count(*)::int as n from users where email = any($1)', [emails])
        return rows[0].n as number
      } finally {
        await client.end()
      }
    }
    try {
      expect(await prepareDatabase(options)).toEqual({ seeded: true })
      expect(await countDemoUsers()).toBe(DEMO_ACCOUNTS.length)
      expect(await prepareDatabase(options)).toEqual({ seeded: false })
      expect(await countDemoUsers()).toBe(DEMO_ACCOUNTS.length)
      expect(await prepareDatabase({ ...options, fresh: true })).toEqual({ seeded: true })
    } finally {
      const admin = new pg.Client({ connectionString: adminUrl })
      await admin.connect()
      await admin.query(`drop database if exists "${url.pathname.slice(1)}" with (force)`)
      await admin.end()
    }
  })
})
