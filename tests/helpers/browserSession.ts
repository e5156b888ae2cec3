// One browser test's world: the real server serving a built client, Debian's chromium on a fresh
// profile, the page's errors and the server's 5xx answers collected for the test to check, and an
// API helper that calls the server with the page's session cookie.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { chromium, type BrowserContext, type Page } from 'playwright-core'
import { expect } from 'vitest'
import { startTestServer, type TestServer } from './server'
import { CHROMIUM_ARGS, CHROMIUM_PATH, SCREENSHOTS_DIR } from './browser'

export interface BrowserSession {
  server: TestServer
  context: BrowserContext
  page: Page
  /** Uncaught errors in the page, and errors the page logged to its console. */
  pageErrors: string[]
  /** Server answers with status 500 or more. */
  serverErrors: string[]
  /** Calls /api<url> as the signed-in page; fails the test on a non-2xx answer. */
  api(method: 'get' | 'post' | 'put', url: string, data?: unknown): Promise<any>
  /** Saves a screenshot of the page under SCREENSHOTS_DIR/<name>.png. */
  shot(name: string): Promise<Buffer>
  close(): Promise<void>
}

export interface BrowserSessionOptions {
  /** The built client; a path without dot-folders (the server will not send from those). */
  clientDir?: string
  viewport?: { width: number; height: number }
  /** A server another session started: a second person's page shares it and leaves it running at close. */
  server?: TestServer
  /** A new person and organisation to sign the page up as (POST /api/auth/signup) once it is open. */
  signUp?: { name: string; email: string; password: string; organizationName: string }
}

/** The client `npx vite build` made, unless AMPWRIGHT_CLIENT_DIR names one built elsewhere. */
export const CLIENT_DIR = process.env.AMPWRIGHT_CLIENT_DIR ?? path.resolve(import.meta.dirname, '../../dist')

export async function startBrowserSession(options: BrowserSessionOptions = {}): Promise<BrowserSession> {
  const clientDir = options.clientDir ?? CLIENT_DIR
  if (!fs.existsSync(path.join(clientDir, 'index.html'))) {
    throw new Error(`no client build in ${clientDir}: run \`npx vite build\` first`)
  }
  fs.mkdirSync(SCREENSHOTS_DIR, { recursive: true })
  const server = options.server ?? (await startTestServer({ serveClient: true, config: { clientDir } }))
  const profileDir = fs.mkdtempSync(path.join(os.tmpdir(), 'aw-browser-'))
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: options.viewport ?? { width: 1280, height: 720 },
  })
  const page = context.pages()[0] ?? (await context.newPage())
  const pageErrors: string[] = []
  const serverErrors: string[] = []
  page.on('pageerror', (err) => pageErrors.push(err.message))
  // The app's error channel logs every render error and unhandled rejection before it shows the
  // snackbar; Chromium's own lines for failed requests are expected (a 401 before signing in).
  page.on('console', (msg) => {
    if (msg.type() === 'error' && !msg.text().startsWith('Failed to load resource')) pageErrors.push(`console: ${msg.text()}`)
  })
  page.on('response', (res) => {
    if (res.status() >= 500) serverErrors.push(`${res.request().method()} ${res.url()} → ${res.status()}`)
  })
  await page.goto(server.baseUrl)
  const session: BrowserSession = {
    server,
    context,
    page,
    pageErrors,
    serverErrors,
    async api(method, url, data) {
      const res = await page.request[method](`${server.baseUrl}/api${url}`, { headers: { Origin: server.baseUrl }, data })
      expect(res.ok(), `${method} ${url} → ${res.status()} ${await res.text()}`).toBe(true)
      return res.json()
    },
    shot: (name) => page.screenshot({ path: path.join(SCREENSHOTS_DIR, `${name}.png`) }),
    async close() {
      await context.close()
      if (!options.server) await server.close()
      fs.rmSync(profileDir, { recursive: true, force: true })
    },
  }
  if (options.signUp) {
    // A failed sign-up fails the test before the caller holds the session: close it here.
    await session.api('post', '/auth/signup', options.signUp).catch(async (error) => {
      await session.close()
      throw error
    })
  }
  return session
}

/** Several people's pages on one server, each in a profile of its own (its own session cookie). */
export interface SharedServerSessions {
  server: TestServer
  /** A page signed in with these credentials; `label` (e.g. the user's role) marks its page errors. */
  signIn(label: string, credentials: { email: string; password: string }): Promise<BrowserSession>
  /** Every page's uncaught errors, each as `<label>: <message>`. */
  pageErrors(): string[]
  close(): Promise<void>
}

export async function startSharedServerSessions(options: Omit<BrowserSessionOptions, 'server'> = {}): Promise<SharedServerSessions> {
  const server = await startTestServer({ serveClient: true, config: { clientDir: options.clientDir ?? CLIENT_DIR } })
  const opened: { label: string; session: BrowserSession }[] = []
  return {
    server,
    async signIn(label, credentials) {
      const session = await startBrowserSession({ ...options, server })
      opened.push({ label, session })
      await session.api('post', '/auth/login', credentials)
      return session
    },
    pageErrors: () => opened.flatMap(({ label, session }) => session.pageErrors.map((message) => `${label}: ${message}`)),
    async close() {
      for (const { session } of opened) await session.close()
      await server.close()
    },
  }
}
