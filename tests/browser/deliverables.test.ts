// Deliverables in Debian's chromium against the real server and the built client: a designer files a
// datasheet under a part (part picker), sees each file with its part and filters by part; the part's
// files show in the editor's part inspector with a download; an existing share link is e-mailed from the
// share-links card (the fake SMTP receives the link); a reviewer sees and downloads but cannot upload or
// delete. Screenshots kept for people to look at.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { chromium, type BrowserContext, type Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../shared/design/demo'
import { shareLinks } from '../../server/db/schema'
import { newOneTimeToken } from '../../server/security/one-time-tokens'
import { SESSION_COOKIE } from '../../server/security/session-token'
import { createOrganization, createProject, uniqueEmail, type TestOrganization } from '../helpers/factories'
import { freshSessionClient, type Api } from '../helpers/http'
import { startTestServer, type TestServer } from '../helpers/server'
import { CHROMIUM_ARGS, CHROMIUM_PATH, SCREENSHOTS_DIR } from '../helpers/browser'

const ROOT = path.resolve(import.meta.dirname, '../..')
const SHOTS = SCREENSHOTS_DIR
const PDF = Buffer.from('%PDF-1.4\n% fridge datasheet\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n')
const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(400, 7)])

let server: TestServer
let org: TestOrganization
let projectId: string
let designer: Api
const contexts: BrowserContext[] = []
const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 15_000, interval: 100 })

/** A browser page signed in as the given member (session cookie from the real sign-in path). */
async function pageAs(user: { id: string }): Promise<{ page: Page; errors: string[] }> {
  const api = await freshSessionClient(server, { userId: user.id, organizationId: org.id })
  const context = await chromium.launchPersistentContext(fs.mkdtempSync(path.join(os.tmpdir(), 'aw-deliver-')), {
    executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_ARGS, viewport: { width: 1366, height: 900 },
  })
  contexts.push(context)
  await context.addCookies([{ name: SESSION_COOKIE, value: api.cookie!.split('=').slice(1).join('='), url: server.baseUrl }])
  const page = context.pages()[0] ?? (await context.newPage())
  const errors: string[] = []
  page.on('pageerror', (e) => errors.push(e.message))
  return { page, errors }
}

/** Picks an option of a Vuetify autocomplete: types part of its text, then clicks the match. */
async function choose(page: Page, field: string, typed: string, option: string | RegExp = typed) {
  await page.locator(`[data-field="${field}"] input`).click()
  await page.locator(`[data-field="${field}"] input`).fill(typed)
  await page.locator('.v-overlay--active .v-list-item').filter({ hasText: option }).first().click()
}

beforeAll(async () => {
  if (!fs.existsSync(path.join(ROOT, 'dist/index.html'))) throw new Error('no client build: run `npx vite build` first')
  fs.mkdirSync(SHOTS, { recursive: true })
  server = await startTestServer({ serveClient: true })
  org = await createOrganization(server.db, 'Deliverables page')
  projectId = await createProject(server.db, org, { name: 'Expedition truck — files', nominalVoltageV: 24, document: createDemoDesign() })
  designer = await freshSessionClient(server, { userId: org.designer.id, organizationId: org.id })
})
afterAll(async () => {
  for (const context of contexts) await context.close()
  await server?.close()
})

describe('deliverables', () => {
  it('files a datasheet under a part, lists files with their part and filters by part', async () => {
    const { page, errors } = await pageAs(org.designer)
    await page.goto(`${server.baseUrl}/projects/${projectId}`)
    const card = page.locator('[data-test="attachments-card"]')
    await card.waitFor({ timeout: 15_000 })
    await poll(() => card.textContent()).toContain('No files yet.')

    await choose(page, 'upload-part', 'Compressor fridge')
    await card.locator('[data-test="upload-input"]').setInputFiles({ name: 'fridge datasheet.pdf', mimeType: 'application/pdf', buffer: PDF })
    await poll(() => card.locator('.v-list-item').filter({ hasText: 'fridge datasheet.pdf' }).textContent()).toContain('Compressor fridge')
    await choose(page, 'upload-part', 'Whole project')
    await card.locator('[data-test="upload-input"]').setInputFiles({ name: 'van photo.png', mimeType: 'image/png', buffer: PNG })
    await poll(() => card.locator('.v-list-item').filter({ hasText: 'van photo.png' }).textContent()).toContain('Whole project')

    const listed = await designer.get(`/api/projects/${projectId}/attachments`)
    expect(listed.body.map((a: { filename: string; partId: string | null }) => [a.filename, a.partId]).sort()).toEqual([
      ['fridge datasheet.pdf', 'fridge'], ['van photo.png', null],
    ])

    await choose(page, 'attachment-filter', 'Compressor', /^Compressor fridge \(1\)$/)
    await poll(() => card.locator('.v-list-item[data-attachment-id]').count()).toBe(1)
    expect(await card.textContent()).not.toContain('van photo.png')
    await card.screenshot({ path: path.join(SHOTS, 'attachments-card-part-filter.png') })
    await choose(page, 'upload-part', 'Compressor fridge')
    await card.screenshot({ path: path.join(SHOTS, 'attachments-card.png') })
    expect(errors).toEqual([])
  })

  it("shows a part's files in the editor's part inspector, with a download", async () => {
    const { page, errors } = await pageAs(org.designer)
    await page.goto(`${server.baseUrl}/projects/${projectId}/design`)
    await page.locator('.vue-flow__node [data-part-id="fridge"]').waitFor({ timeout: 20_000 })
    await page.locator('.vue-flow__node [data-part-id="fridge"]').click()
    const files = page.locator('[data-test="part-attachments"]')
    await poll(() => files.locator('h4').textContent()).toBe('Datasheets and photos (1)')
    const link = files.getByRole('link', { name: 'Download fridge datasheet.pdf' })
    const href = await link.getAttribute('href')
    const download = await page.request.get(`${server.baseUrl}${href}`)
    expect(download.status()).toBe(200)
    expect(Buffer.compare(await download.body(), PDF)).toBe(0)
    await files.scrollIntoViewIfNeeded()
    await page.locator('.inspector').screenshot({ path: path.join(SHOTS, 'part-inspector-attachments.png') })

    await page.locator('.vue-flow__node [data-part-id="lights"]').click()
    await poll(() => files.locator('h4').textContent()).toBe('Datasheets and photos (0)')
    expect(await files.textContent()).toContain('None filed under this part')
    expect(errors).toEqual([])
  })

  it('e-mails an existing share link from the share-links card; an older link says to re-create it', async () => {
    const created = await designer.post(`/api/projects/${projectId}/share-links`, { label: 'Owner review', expiresInDays: 14 })
    expect(created.status).toBe(201)
    const [old] = await server.db.insert(shareLinks)
      .values({ projectId, label: 'Made last year', tokenHash: newOneTimeToken().tokenHash, createdBy: org.designer.id, expiresAt: new Date(Date.now() + 86_400_000) })
      .returning({ id: shareLinks.id })

    const { page, errors } = await pageAs(org.designer)
    await page.goto(`${server.baseUrl}/projects/${projectId}`)
    await page.locator(`[data-test="email-link-${old.id}"]`).waitFor({ timeout: 15_000 })
    expect(await page.locator(`[data-test="email-link-${old.id}"]`).getAttribute('title')).toContain('make a new link to send it by e-mail')
    expect(await page.locator('[data-test="share-links-not-kept"]').textContent()).toContain('make a new link to send one of these by e-mail')

    await page.locator(`[data-test="email-link-${created.body.id}"]`).click()
    const dialog = page.locator('[data-test="share-email-dialog"]')
    await dialog.locator('[data-field="share-email"] input').fill('not an address')
    await dialog.getByRole('button', { name: 'Send' }).click()
    await poll(() => dialog.textContent()).toContain('Enter a valid e-mail address')
    const to = uniqueEmail('boat-owner')
    await dialog.locator('[data-field="share-email"] input').fill(to)
    await page.screenshot({ path: path.join(SHOTS, 'share-link-email-dialog.png') })
    await dialog.getByRole('button', { name: 'Send' }).click()
    await poll(() => page.textContent('body')).toContain(`Link e-mailed to ${to}`)
    const mail = await server.outbox.latestTo(to)
    expect(mail.text).toContain(`${server.baseUrl}/s/${created.body.token}`)
    await page.locator('[data-test="deliverables"]').screenshot({ path: path.join(SHOTS, 'share-link-emailed.png') })
    expect(errors).toEqual([])
  })

  it('lets a reviewer see and download files but not upload or delete them', async () => {
    const { page, errors } = await pageAs(org.reviewer)
    await page.goto(`${server.baseUrl}/projects/${projectId}`)
    const card = page.locator('[data-test="attachments-card"]')
    await poll(() => card.locator('.v-list-item[data-attachment-id]').count()).toBe(2)
    expect(await card.locator('[data-field="upload-part"]').count()).toBe(0)
    expect(await card.getByRole('button', { name: /^Delete / }).count()).toBe(0)
    expect(await card.getByRole('link', { name: 'Download fridge datasheet.pdf' }).count()).toBe(1)
    expect(errors).toEqual([])
  })
})
