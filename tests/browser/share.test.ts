// A client opens a share link in a fresh browser (no account, no session): sees the diagram and the
// findings, approves; the approval reaches the team's API and the designer's inbox. Screenshot kept.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { chromium, type BrowserContext, type Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { analyzeDesign } from '../../shared/analysis'
import { createDemoDesign } from '../../shared/design/demo'
import { createOrganization, createProject, type TestOrganization } from '../helpers/factories'
import { freshSessionClient } from '../helpers/http'
import { SESSION_COOKIE } from '../../server/security/session-token'
import { startTestServer, type TestServer } from '../helpers/server'
import { CHROMIUM_ARGS, CHROMIUM_PATH, SCREENSHOTS_DIR } from '../helpers/browser'

const ROOT = path.resolve(import.meta.dirname, '../..')
const SHOTS = SCREENSHOTS_DIR

let server: TestServer
let org: TestOrganization
let context: BrowserContext
let page: Page
let profileDir: string
const pageErrors: string[] = []
const offOrigin: string[] = []

beforeAll(async () => {
  if (!fs.existsSync(path.join(ROOT, 'dist/index.html'))) throw new Error('no client build: run `npx vite build` first')
  fs.mkdirSync(SHOTS, { recursive: true })
  server = await startTestServer({ serveClient: true })
  org = await createOrganization(server.db, 'Share page')
  profileDir = fs.mkdtempSync(path.join(os.tmpdir(), 'aw-share-'))
  context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_ARGS, viewport: { width: 1366, height: 900 },
  })
  page = context.pages()[0] ?? (await context.newPage())
  page.on('pageerror', (e) => pageErrors.push(e.message))
  page.on('request', (r) => {
    if (!r.url().startsWith(server.baseUrl) && !r.url().startsWith('data:')) offOrigin.push(r.url())
  })
})
afterAll(async () => {
  await context?.close()
  await server?.close()
  if (profileDir) fs.rmSync(profileDir, { recursive: true, force: true })
})

describe('share link page', () => {
  it('shows the diagram and findings read-only and records an approval', async () => {
    const demo = createDemoDesign()
    const projectId = await createProject(server.db, org, { name: 'Expedition truck — Okafor', clientName: 'Ada Okafor', nominalVoltageV: 24, document: demo })
    const designer = await freshSessionClient(server, { userId: org.designer.id, organizationId: org.id })
    const created = await designer.post(`/api/projects/${projectId}/share-links`, { label: 'Owner review', expiresInDays: 14 })
    expect(created.status).toBe(201)

    await page.goto(`${server.baseUrl}/s/${created.body.token}`)
    await expect.poll(() => page.locator('[data-test="shared-title"]').textContent(), { timeout: 15_000 }).toBe('Expedition truck — Okafor')
    const diagram = page.locator('[data-test="shared-diagram"]')
    await expect.poll(() => diagram.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth), { timeout: 15_000 }).toBeGreaterThan(500)
    const rows = page.locator('[data-test="shared-findings"] tbody tr')
    const findings = analyzeDesign(demo).findings
    await expect.poll(() => rows.count()).toBe(findings.length)
    for (const f of findings) expect(await page.locator('[data-test="shared-findings"]').textContent()).toContain(f.title)
    expect(await page.textContent('body')).toContain('authority having jurisdiction')
    await page.screenshot({ path: path.join(SHOTS, 'share-view.png'), fullPage: true })

    await page.locator('[data-test="approve-submit"]').click()
    await expect.poll(() => page.textContent('body')).toContain('Enter your name to approve')
    await page.locator('[data-test="approve-name"] input').fill('Ada Okafor')
    await page.locator('[data-test="approve-submit"]').click()
    await expect.poll(() => page.locator('[data-test="approval-done"]').textContent(), { timeout: 15_000 }).toContain('Approved by Ada Okafor')
    await page.screenshot({ path: path.join(SHOTS, 'share-approved.png') })

    const approvals = await designer.get(`/api/projects/${projectId}/approvals`)
    expect(approvals.body[0]).toMatchObject({ name: 'Ada Okafor', revisionName: 'Saved revision 1' })
    const notice = await server.outbox.latestTo(org.designer.email)
    expect(notice.subject).toContain('Ada Okafor approved')

    // A revoked link shows a clear refusal, not a broken page.
    await designer.delete(`/api/projects/${projectId}/share-links/${created.body.id}`)
    await page.reload()
    await expect.poll(() => page.locator('[data-test="share-refused"]').textContent(), { timeout: 15_000 }).toContain('revoked')
    expect(pageErrors).toEqual([])
    expect(offOrigin).toEqual([])
  })

  it("puts the deliverables on the designer's project page: BOM with spares, a new share link", async () => {
    const projectId = await createProject(server.db, org, { name: 'Liveaboard deliverables', nominalVoltageV: 24, document: createDemoDesign() })
    const designer = await freshSessionClient(server, { userId: org.designer.id, organizationId: org.id })
    const token = designer.cookie!.split('=').slice(1).join('=')
    const designerContext = await chromium.launchPersistentContext(fs.mkdtempSync(path.join(os.tmpdir(), 'aw-share-d-')), {
      executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_ARGS, viewport: { width: 1366, height: 900 },
    })
    try {
      await designerContext.addCookies([{ name: SESSION_COOKIE, value: token, url: server.baseUrl }])
      const p = designerContext.pages()[0] ?? (await designerContext.newPage())
      const errors: string[] = []
      p.on('pageerror', (e) => errors.push(e.message))
      await p.goto(`${server.baseUrl}/projects/${projectId}`)
      await p.locator('[data-test="deliverables"]').waitFor({ timeout: 15_000 })
      // Demo panel ways [10, 10, 15, 10, 10, 5] A regular blade: 10 A used four times → two spares.
      const spareRow = p.locator('[data-test="spares-table"] tbody tr').filter({ hasText: 'Blade fuse, regular size, 10 A' })
      await expect.poll(() => spareRow.locator('input').inputValue(), { timeout: 15_000 }).toBe('2')
      await p.getByRole('button', { name: 'Make link' }).click()
      await expect.poll(() => p.locator('[data-test="new-share-url"]').textContent(), { timeout: 15_000 }).toMatch(new RegExp(`${server.baseUrl}/s/[A-Za-z0-9_-]{43}`))
      await p.locator('[data-test="deliverables"]').screenshot({ path: path.join(SHOTS, 'deliverables-panel.png') })
      expect(errors).toEqual([])
    } finally {
      await designerContext.close()
    }
  })
})
