// The foundation end to end in Debian's chromium against the real server and the built client:
// sign up, create projects, find one by search, open it, see members, sign out and in again.
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { chromium, type BrowserContext, type Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startTestServer, tokenFromLink, type TestServer } from '../helpers/server'
import { CHROMIUM_ARGS, CHROMIUM_PATH, SCREENSHOTS_DIR } from '../helpers/browser'

const ROOT = path.resolve(import.meta.dirname, '../..')
const SHOTS = SCREENSHOTS_DIR

let server: TestServer
let context: BrowserContext
let page: Page
let profileDir: string
const pageErrors: string[] = []
const foreignRequests: string[] = []

// An invented organisation; the suffix keeps reruns against the same database apart.
const suffix = Math.random().toString(36).slice(2, 8)
const owner = {
  organizationName: `Tidewater Power Works ${suffix}`,
  name: 'Mara Quillon',
  email: `mara.${suffix}@tidewater.test`,
  password: 'copper-lugs-and-heat-shrink',
}

/** Waits for the UI (up to 15 s) rather than vitest's default 1 s. */
const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 15_000, interval: 100 })
const dataRows = () => page.locator('[data-test="projects-table"] tbody tr.v-data-table__tr')

async function shot(name: string): Promise<void> {
  await page.screenshot({ path: path.join(SHOTS, `${name}.png`), fullPage: false })
}

async function createProject(name: string, clientName: string, kind: string, voltage: string): Promise<void> {
  await page.getByRole('button', { name: 'New project' }).first().click()
  const dialog = page.locator('[data-test="project-dialog"]')
  await dialog.getByLabel('Project name').fill(name)
  await dialog.getByLabel('Client name (optional)').fill(clientName)
  await dialog.locator('[data-test="field-kind"]').click()
  await page.getByRole('option', { name: kind }).click()
  await dialog.locator('[data-test="field-voltage"]').click()
  await page.getByRole('option', { name: voltage }).click()
  await dialog.getByRole('button', { name: 'Create project' }).click()
  await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/)
  await poll(() => page.locator('[data-test="project-title"]').textContent()).toBe(name)
}

beforeAll(async () => {
  if (!fs.existsSync(path.join(ROOT, 'dist/index.html'))) throw new Error('no client build: run `npx vite build` first')
  fs.mkdirSync(SHOTS, { recursive: true })
  server = await startTestServer({ serveClient: true })
  profileDir = fs.mkdtempSync(path.join(os.tmpdir(), 'aw-pw-'))
  context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: { width: 1440, height: 900 },
  })
  page = context.pages()[0] ?? (await context.newPage())
  page.on('pageerror', (err) => pageErrors.push(err.message))
  const origin = new URL(server.baseUrl).origin
  context.on('request', (req) => {
    const url = new URL(req.url())
    if (url.protocol !== 'data:' && url.protocol !== 'blob:' && url.origin !== origin) foreignRequests.push(req.url())
  })
})

afterAll(async () => {
  await context?.close()
  await server?.close()
  if (profileDir) fs.rmSync(profileDir, { recursive: true, force: true })
})

describe('foundation in the browser', () => {
  it('sends a visitor to sign in, keeping where they were going', async () => {
    await page.goto(`${server.baseUrl}/projects`)
    await page.waitForURL(/\/sign-in\?next=(%2F|\/)projects$/)
    await poll(() => page.getByRole('button', { name: 'Sign in' }).isVisible()).toBe(true)
    // Fonts ship with the app: Roboto is loaded from our own origin.
    await page.evaluate(() => document.fonts.ready)
    expect(await page.evaluate(() => document.fonts.check('16px Roboto'))).toBe(true)
    const loadedRoboto = await page.evaluate(() => [...document.fonts].filter((f) => f.family.replace(/"/g, '') === 'Roboto' && f.status === 'loaded').length)
    expect(loadedRoboto).toBeGreaterThan(0)
    await shot('sign-in')
  })

  it('refuses a wrong password with the server message, in the form', async () => {
    await page.getByLabel('E-mail').fill('nobody@tidewater.test')
    await page.getByLabel('Password').fill('not-the-password')
    await page.getByRole('button', { name: 'Sign in' }).click()
    await poll(() => page.locator('[data-test="form-error"]').textContent()).toContain('E-mail or password is incorrect')
  })

  it('signs up a new organisation and shows an empty projects list', async () => {
    await page.getByRole('link', { name: 'Create an organisation' }).click()
    await page.waitForURL(/\/sign-up$/)
    await page.getByLabel('Organisation name').fill(owner.organizationName)
    await page.getByLabel('Your name').fill(owner.name)
    await page.getByLabel('E-mail').fill(owner.email)
    await page.getByLabel('Password').fill(owner.password)
    await page.getByRole('button', { name: 'Create organisation' }).click()
    await page.waitForURL(/\/projects$/)
    await poll(() => page.locator('[data-test="projects-empty"]').textContent()).toContain('No projects yet')
    expect(await page.locator('[data-test="org-name"]').textContent()).toBe(owner.organizationName)
  })

  it('shows the shared schema message under a field and keeps the dialog open', async () => {
    await page.getByRole('button', { name: 'New project' }).first().click()
    const dialog = page.locator('[data-test="project-dialog"]')
    const name = dialog.getByLabel('Project name')
    await name.fill('x')
    await name.fill('   ')
    await poll(() => dialog.locator('[data-test="field-name"]').textContent()).toContain('Enter a project name')
    expect(await dialog.getByRole('button', { name: 'Create project' }).isDisabled()).toBe(true)
    await shot('project-form-field-error')
    await dialog.getByRole('button', { name: 'Cancel' }).click()
    await poll(() => dialog.isVisible()).toBe(false)
  })

  it('creates two projects and finds one through the search box', async () => {
    await createProject('Harbour ketch house bank', 'Ostrander family', 'Vessel', '24 V')
    await page.getByRole('link', { name: 'Projects' }).first().click()
    await page.waitForURL(/\/projects$/)
    await createProject('Ridgeway touring van', 'Ridgeway Outfitters', 'Vehicle', '12 V')
    await page.goto(`${server.baseUrl}/projects`)
    const rows = dataRows()
    await poll(() => rows.count()).toBe(2)

    await page.getByRole('textbox', { name: 'Search name, client or notes' }).fill('ketch')
    await page.waitForURL(/[?&]q=ketch/)
    await poll(() => rows.count()).toBe(1)
    expect(await rows.first().textContent()).toContain('Harbour ketch house bank')
    expect(await rows.first().textContent()).toContain('24 V')
    await shot('projects-table')
  })

  it('opens the project overview with its fields, the caution and the way into the design', async () => {
    await page.getByRole('link', { name: 'Harbour ketch house bank' }).click()
    await page.waitForURL(/\/projects\/[0-9a-f-]{36}$/)
    const body = page.locator('main')
    await poll(() => body.textContent()).toContain('Ostrander family')
    const text = (await body.textContent()) ?? ''
    expect(text).toContain('Vessel')
    expect(text).toContain('24 V')
    expect(text).toContain('the authority having jurisdiction')
    const design = page.locator('[data-test="open-design"]')
    expect(await design.getAttribute('href')).toMatch(/\/projects\/[0-9a-f-]{36}\/design$/)
    await shot('project-overview')
  })

  it('lists the owner on the members page and records an invitation', async () => {
    await page.getByRole('link', { name: 'Members' }).click()
    await page.waitForURL(/\/members$/)
    const table = page.locator('[data-test="members-table"]')
    await poll(() => table.textContent()).toContain(owner.email)
    await page.getByRole('button', { name: 'Invite a colleague' }).click()
    await page.locator('[data-test="invite-email"] input').fill(`ines.${suffix}@tidewater.test`)
    await page.locator('[data-test="invite-submit"]').click()
    await poll(() => page.locator('[data-test="invitations"]').textContent()).toContain(`ines.${suffix}@tidewater.test`)
    await poll(() => page.locator('.v-overlay--active').count()).toBe(0)
    const mail = await server.outbox.latestTo(`ines.${suffix}@tidewater.test`)
    expect(mail.text).toContain('/accept-invitation?token=')
    await shot('members')
  })

  it('lets the invited colleague join, then follows the role the owner gives them', async () => {
    const invitee = `ines.${suffix}@tidewater.test`
    const token = tokenFromLink(await server.outbox.latestTo(invitee), '/accept-invitation', server.baseUrl)
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'aw-pw-'))
    const other = await chromium.launchPersistentContext(dir, {
      executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_ARGS, viewport: { width: 1280, height: 720 },
    })
    try {
      const colleague = other.pages()[0] ?? (await other.newPage())
      colleague.on('pageerror', (err) => pageErrors.push(`colleague: ${err.message}`))
      await colleague.goto(`${server.baseUrl}/accept-invitation?token=${encodeURIComponent(token)}`)
      await poll(() => colleague.locator('main').textContent()).toContain(owner.organizationName)
      await colleague.getByLabel('Your name').fill('Ines Varga')
      await colleague.getByLabel('Choose a password').fill('fuse-holders-near-source')
      await colleague.getByRole('button', { name: /^Join/ }).click()
      await colleague.waitForURL(/\/projects$/)
      // A designer (the invitation's role) may create projects and sees all of the organisation's.
      await poll(() => colleague.getByRole('button', { name: 'New project' }).count()).toBeGreaterThan(0)
      await poll(() => colleague.locator('[data-test="projects-table"] tbody tr.v-data-table__tr').count()).toBe(2)

      // The owner makes her a reviewer; her next page load follows the new role.
      await page.reload()
      const roleSelect = page.getByRole('combobox', { name: 'Role of Ines Varga' })
      await poll(() => roleSelect.count()).toBe(1)
      await page.locator('.v-select', { has: roleSelect }).click()
      await page.getByRole('option', { name: /Reviewer/ }).click()
      await poll(() => page.locator('.v-snackbar').last().textContent()).toContain('Ines Varga is now reviewer')
      await colleague.reload()
      await poll(() => colleague.locator('[data-test="projects-table"] tbody tr.v-data-table__tr').count()).toBe(2)
      expect(await colleague.getByRole('button', { name: 'New project' }).count()).toBe(0)
      await colleague.locator('[data-test="user-menu"]').click()
      await poll(() => colleague.locator('[data-test="user-role"]').textContent()).toBe('Reviewer')

      // Removing her ends her access at once.
      await page.getByRole('button', { name: 'Remove Ines Varga' }).click()
      await page.locator('[data-test="confirm"]').click()
      await poll(() => page.locator('[data-test="members-table"]').textContent()).not.toContain('Ines Varga')
      await colleague.goto(`${server.baseUrl}/projects`)
      await colleague.waitForURL(/\/sign-in/)
    } catch (err) {
      await page.screenshot({ path: path.join(SHOTS, 'failure-owner.png') })
      throw err
    } finally {
      await other.close()
      fs.rmSync(dir, { recursive: true, force: true })
    }
  })

  it('signs out and back in, returning to the projects', async () => {
    await page.locator('[data-test="user-menu"]').click()
    await page.locator('[data-test="sign-out"]').click()
    await page.waitForURL(/\/sign-in/)
    await page.goto(`${server.baseUrl}/projects`)
    await page.waitForURL(/\/sign-in\?next=/)
    await page.getByLabel('E-mail').fill(owner.email)
    await page.getByLabel('Password').fill(owner.password)
    await page.getByRole('button', { name: 'Sign in' }).click()
    await page.waitForURL(/\/projects$/)
    await poll(() => dataRows().count()).toBe(2)
  })

  it('fits a 1280×720 window without sideways scrolling', async () => {
    await page.setViewportSize({ width: 1280, height: 720 })
    await page.reload()
    await poll(() => dataRows().count()).toBe(2)
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)
    expect(overflow).toBeLessThanOrEqual(0)
    await shot('projects-table-1280x720')
  })

  it('raised no page error and sent no request off the origin', () => {
    expect(pageErrors).toEqual([])
    expect(foreignRequests).toEqual([])
  })
})
