// The design editor end to end in Debian's chromium against the real server and the built client:
// build battery → fuse → load by drag and drop and wiring, see the under-rated fuse flagged, fix it
// in the side form, undo brings the finding back; then the demo system with screenshots.
import type { Locator, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startBrowserSession, type BrowserSession } from '../helpers/browserSession'

let session: BrowserSession
let page: Page

const suffix = Math.random().toString(36).slice(2, 8)
const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 15_000, interval: 100 })
const shot = (name: string) => session.shot(name)
const api: BrowserSession['api'] = (...args) => session.api(...args)

async function openNewProjectDesign(name: string): Promise<string> {
  const project = await api('post', '/projects', { name, installationKind: 'vehicle', nominalVoltageV: 24 })
  await page.goto(`${session.server.baseUrl}/projects/${project.id}`)
  await page.locator('[data-test="open-design"]').click()
  await page.waitForURL(/\/design$/)
  await page.locator('.editor-canvas').waitFor()
  return project.id
}

/** Drags a part from the parts list onto the drawing at a point relative to the canvas. */
async function dropPart(type: string, x: number, y: number) {
  await page.locator(`.parts-list__item[data-part-type="${type}"]`).dragTo(page.locator('.editor-canvas'), { targetPosition: { x, y } })
}

const node = (type: string) => page.locator(`.vue-flow__node .part-node--${type}`)
const terminal = (type: string, id: string) => node(type).locator(`[data-terminal="${id}"]`)

/** Draws a conductor by dragging from one terminal to another with the mouse. */
async function wire(from: Locator, to: Locator) {
  const a = (await from.boundingBox())!
  const b = (await to.boundingBox())!
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2)
  await page.mouse.down()
  await page.mouse.move((a.x + b.x) / 2, (a.y + b.y) / 2 + 20, { steps: 5 })
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 5 })
  await page.mouse.up()
}

/** Types into a side-panel field and commits with Enter. */
async function setField(key: string, value: string) {
  const input = page.locator(`.inspector [data-field="${key}"] input`)
  await input.fill(value)
  await input.press('Enter')
}

const findingRows = () => page.locator('.findings-table tbody tr[data-row-id]')
const fuseFindings = () => findingRows().filter({ hasText: 'Fuse 1' }).filter({ hasText: /Device (will open under normal load|rated below the load)/ })

beforeAll(async () => {
  // The default 1280×720 viewport: the smallest screen the editor is laid out for.
  session = await startBrowserSession({
    signUp: {
      name: 'Ines Harrow',
      email: `ines.${suffix}@harrow-vans.test`,
      password: 'ferrules-and-crimp-dies',
      organizationName: `Harrow Van Works ${suffix}`,
    },
  })
  page = session.page
})

afterAll(async () => {
  await session?.close()
})

describe('design editor in the browser', () => {
  it('builds battery → fuse → load, flags the under-rated fuse, fixes it and undoes the fix', async () => {
    await openNewProjectDesign(`Ridge camper ${suffix}`)
    await poll(() => page.getByText('Drag a battery from the parts list to start').isVisible()).toBe(true)

    await dropPart('battery', 140, 170)
    await dropPart('fuse', 380, 110)
    await dropPart('load', 620, 170)
    await poll(() => page.locator('.vue-flow__node').count()).toBe(3)
    await poll(() => page.getByText('Drag a battery from the parts list to start').count()).toBe(0)

    await wire(terminal('battery', 'pos'), terminal('fuse', 'line'))
    await wire(terminal('fuse', 'load'), terminal('load', 'pos'))
    await wire(terminal('load', 'neg'), terminal('battery', 'neg'))
    await poll(() => page.locator('.vue-flow__edge').count()).toBe(3)
    await shot('editor-small-system')

    // 480 W at 24 V is 20 A: the default 15 A fuse cannot carry it (rating ≥ 125 % of the load is
    // common practice; here it is below even 100 %).
    await node('load').click()
    await poll(() => page.locator('.inspector').innerText()).toContain('Load')
    await setField('powerW', 'abc')
    await poll(() => page.locator('.inspector [data-field="powerW"]').innerText()).toContain('Enter a number')
    await setField('powerW', '480')
    await poll(() => fuseFindings().count()).toBeGreaterThan(0)
    await poll(() => node('fuse').locator('.part-node__mark').isVisible()).toBe(true)
    await shot('editor-underrated-fuse')

    // Fix the fuse in the side form: 30 A carries 20 A with margin and 6 mm² is rated above 30 A.
    await node('fuse').click()
    await setField('ratingA', '30')
    await poll(() => fuseFindings().count()).toBe(0)

    // Undo restores the 15 A fuse and with it the finding; redo removes it again.
    await page.getByRole('button', { name: 'Undo' }).click()
    await poll(() => fuseFindings().count()).toBeGreaterThan(0)
    await poll(() => page.locator('.inspector [data-field="ratingA"] input').inputValue()).toBe('15')
    await page.locator('.vue-flow__pane').click({ position: { x: 20, y: 20 } })
    await page.keyboard.press('Control+Shift+Z')
    await poll(() => fuseFindings().count()).toBe(0)

    // The design was saved through the API: a reload shows the same three parts and conductors.
    await poll(() => page.locator('[data-testid="save-state"]').getAttribute('data-state')).toBe('saved')
    await page.reload()
    await poll(() => page.locator('.vue-flow__node').count()).toBe(3)
    await poll(() => page.locator('.vue-flow__edge').count()).toBe(3)
    await poll(() => fuseFindings().count()).toBe(0)
  })

  it('opens the demo system with findings, schedules and no NaN on screen', async () => {
    await openNewProjectDesign(`Demo expedition truck ${suffix}`)
    await page.getByRole('button', { name: 'Or open the demo system' }).click()
    await poll(() => page.locator('.vue-flow__node').count()).toBeGreaterThan(10)
    await poll(() => findingRows().filter({ has: page.locator('[data-severity]') }).count()).toBeGreaterThanOrEqual(2)
    await page.waitForTimeout(400)
    await shot('editor-demo')

    // Clicking a finding selects its part and shows it in the side panel.
    const first = findingRows().first()
    const where = (await first.locator('td').nth(2).textContent())?.trim() ?? ''
    await first.click()
    await poll(() => page.locator('.inspector [data-field="label"] input').inputValue()).toBe(where.split(',')[0])
    await page.waitForTimeout(400)
    await shot('editor-findings')

    await page.locator('[data-tab="conductors"]').click()
    // The tab counts every conductor; the virtual table draws only the rows in view.
    await poll(() => page.locator('[data-tab="conductors"]').innerText()).toMatch(/Conductors \(\d{2,}\)/)
    await poll(() => page.locator('.schedule-table tbody tr[data-row-id]').count()).toBeGreaterThan(3)
    await shot('editor-conductor-schedule')
    await page.locator('[data-tab="devices"]').click()
    await poll(() => page.locator('.schedule-table tbody tr[data-row-id]').count()).toBeGreaterThan(3)
    await shot('editor-device-schedule')

    const text = await page.locator('body').innerText()
    expect(text).not.toMatch(/\bNaN\b|\bundefined\b|Infinity/)

    await page.keyboard.press('?')
    await poll(() => page.getByText('Keyboard and mouse').isVisible()).toBe(true)
    await shot('editor-shortcuts')
    await page.keyboard.press('Escape')
    expect(session.pageErrors).toEqual([])
    expect(session.serverErrors).toEqual([])
  })
})
