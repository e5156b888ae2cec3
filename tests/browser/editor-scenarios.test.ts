// Scenarios and the bottom panel in Debian's chromium against the real server and a built client:
// add a scenario, rename it, turn a load off, show it and see findings and currents follow, undo;
// then a generated 500-part design whose tables draw only the rows in view. Screenshots at 1280×720.
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { makeConductor, makePart } from '../../shared/design/builder'
import type { Design, DesignSettings } from '../../shared/design/schema'
import { generatedDesign } from '../helpers/generatedDesign'
import { startBrowserSession, type BrowserSession } from '../helpers/browserSession'

let session: BrowserSession
let page: Page
const suffix = Math.random().toString(36).slice(2, 8)
const poll = <T>(fn: () => Promise<T> | T, timeout = 20_000) => expect.poll(fn, { timeout, interval: 100 })
const api: BrowserSession['api'] = (...args) => session.api(...args)
const shot = (name: string) => session.shot(name)

/** A project holding `design`, opened in the editor. */
async function openDesign(name: string, design: Design): Promise<void> {
  const project = await api('post', '/projects', { name, installationKind: 'vehicle', nominalVoltageV: 24 })
  const stored = await api('get', `/projects/${project.id}/design`)
  await api('put', `/projects/${project.id}/design`, { design, baseRevision: stored.revision })
  await page.goto(`${session.server.baseUrl}/projects/${project.id}/design`)
  await page.locator('.editor-canvas').waitFor().catch(async (error) => {
    throw new Error(`the editor did not open: ${(await page.locator('body').innerText()).slice(0, 400)}`, { cause: error })
  })
}

/** An invented 24 V van: a bank, one 15 A fuse, a 480 W water pump and 48 W of lights behind it.
 * Parked, only the lights run (2 A); with the pump as well the fuse carries 22 A and must open. */
function vanWithPump(): Design {
  const settings: DesignSettings = { nominalVoltageV: 24, unitSystem: 'metric', profile: 'vehicle', defaultAmbientC: 30 }
  const at = (x: number, y: number) => ({ x, y })
  return {
    format: 'ampwright.design', version: 1, id: `van-${suffix}`, name: 'Van with a pump', settings,
    parts: [
      makePart(settings, 'battery', 'bank', 'House bank', at(0, 100), { capacityAh: 100 }),
      makePart(settings, 'fuse', 'fuse1', 'Fuse 1', at(250, 40), { ratingA: 15 }),
      makePart(settings, 'load', 'pump', 'Water pump', at(520, 0), { model: 'power', powerW: 480 }),
      makePart(settings, 'load', 'lights', 'Cabin lights', at(520, 200), { model: 'power', powerW: 48 }),
    ],
    conductors: [
      makeConductor('w1', 'W1', 'bank.pos', 'fuse1.line', 'mm2-6', 1),
      makeConductor('w2', 'W2', 'fuse1.load', 'pump.pos', 'mm2-6', 3),
      makeConductor('w3', 'W3', 'fuse1.load', 'lights.pos', 'mm2-2.5', 3),
      makeConductor('w4', 'W4', 'pump.neg', 'bank.neg', 'mm2-6', 3),
      makeConductor('w5', 'W5', 'lights.neg', 'bank.neg', 'mm2-2.5', 3),
    ],
    scenarios: [{ id: 'parked', name: 'Parked', sunOn: false, chargerOn: false, loads: { lights: { on: true, level: 1 } } }],
  }
}

const findingRows = () => page.locator('.findings-table tbody tr[data-row-id]')
const fuseOpens = () => findingRows().filter({ hasText: 'Fuse 1' }).filter({ hasText: /Device (will open under normal load|rated below the load)/ })
const scheduleRow = (id: string) => page.locator(`.schedule-table tbody tr[data-row-id="${id}"]`)
/** The "Current" cell (the scenario shown) of a conductor in the schedule. */
const currentOf = async (id: string) => (await scheduleRow(id).locator('td').nth(5).innerText()).trim()
const dialog = () => page.locator('[data-testid="scenario-dialog"]')

beforeAll(async () => {
  // The client: dist/, or the one AMPWRIGHT_CLIENT_DIR names (see the helper's CLIENT_DIR).
  session = await startBrowserSession({
    signUp: {
      name: 'Maren Oduya',
      email: `maren.${suffix}@oduya-campers.test`,
      password: 'heat-shrink-and-lugs',
      organizationName: `Oduya Campers ${suffix}`,
    },
  })
  page = session.page
})

afterAll(async () => {
  await session?.close()
})

describe('scenarios in the browser', () => {
  it('adds a scenario, renames it, turns a load off, shows it, and undo takes the edits back', async () => {
    await openDesign(`Pump van ${suffix}`, vanWithPump())
    await page.locator('[data-tab="conductors"]').click()
    // Parked: 48 W at about 25 V is about 1.9 A in the lights' feed, nothing in the pump's.
    await poll(() => currentOf('w3')).toMatch(/^1\.\d+\u00a0A$/)
    expect(await currentOf('w2')).toBe('0\u00a0A')
    await page.locator('[data-tab="findings"]').click()
    expect(await fuseOpens().count()).toBe(0)

    await page.locator('[data-testid="edit-scenarios"]').click()
    await dialog().waitFor()
    await dialog().locator('[data-testid="scenario-add"]').click()
    const name = dialog().locator('[data-field="scenario-name"] input')
    await poll(() => name.inputValue()).toBe('New scenario')
    await name.fill('Parked')
    await name.press('Enter')
    await poll(() => dialog().innerText()).toContain('Another scenario is already called "Parked"')
    await name.fill('Shower running')
    await name.press('Enter')
    await poll(() => dialog().locator('[data-scenario-id]').allInnerTexts()).toEqual(['Parked\nshown on the drawing', 'Shower running'])
    // The new scenario runs both loads: 22 A through the 15 A fuse, which the analysis flags.
    await poll(() => fuseOpens().count()).toBeGreaterThan(0)

    // Turn the lights off in the new scenario; a level above 100 % is refused beside the field.
    await dialog().locator('[data-load-on="lights"] input').click()
    const pumpLevel = dialog().locator('[data-load-level="pump"] input')
    await pumpLevel.fill('120')
    await pumpLevel.press('Enter')
    await poll(() => dialog().innerText()).toContain('Load level must be at most 100 %')
    await pumpLevel.fill('100')
    await pumpLevel.press('Enter')
    await page.waitForTimeout(300)
    await shot('scenario-dialog')

    await dialog().locator('[data-testid="scenario-show"]').click()
    await poll(() => dialog().count()).toBe(0)
    await poll(() => page.locator('[data-testid="scenario-select"]').innerText()).toContain('Shower running')
    await page.locator('[data-tab="conductors"]').click()
    // 480 W at about 25 V: about 19 A in the pump's feed, nothing in the lights' now.
    await poll(() => currentOf('w2')).toMatch(/^1[89]\.\d\u00a0A$/)
    await poll(() => currentOf('w3')).toBe('0\u00a0A')
    await shot('scenario-conductor-schedule')

    // Undo turns the lights back on in this scenario (the refused 120 % never became a step).
    await page.getByRole('button', { name: 'Undo' }).click()
    await poll(() => currentOf('w3')).toMatch(/^1\.\d+\u00a0A$/)
    // Two more: the rename, then the scenario itself; the toolbar goes back to "Parked".
    await page.getByRole('button', { name: 'Undo' }).click()
    await poll(() => page.locator('[data-testid="scenario-select"]').innerText()).toContain('New scenario')
    await page.getByRole('button', { name: 'Undo' }).click()
    await poll(() => page.locator('[data-testid="scenario-select"]').innerText()).toContain('Parked')
    await page.locator('[data-tab="findings"]').click()
    await poll(() => fuseOpens().count()).toBe(0)
    expect(session.pageErrors).toEqual([])
    expect(session.serverErrors).toEqual([])
  })

  it('keeps a 500-part design’s tables to the rows in view, sortable and selectable', async () => {
    const design = generatedDesign(500)
    await openDesign(`Generated fleet ${suffix}`, design)
    await poll(() => findingRows().count(), 90_000).toBeGreaterThan(0)
    await page.waitForTimeout(300)
    await shot('bottom-panel-findings-500')

    await page.locator('[data-tab="conductors"]').click()
    await poll(() => page.locator('.schedule-table tbody tr[data-row-id]').count()).toBeGreaterThan(3)
    const drawn = await page.locator('.schedule-table tbody tr[data-row-id]').count()
    expect(drawn).toBeLessThan(design.conductors.length / 5)
    // Sort by length (longest first) and scroll to the end: the shortest conductors are drawn there.
    const lengthHeader = page.locator('.schedule-table thead th', { hasText: 'Length' })
    await lengthHeader.click()
    await lengthHeader.click()
    const longestM = Math.max(...design.conductors.map((c) => c.lengthM))
    const firstId = () => page.locator('.schedule-table tbody tr[data-row-id]').first().getAttribute('data-row-id')
    const lengthOf = (id: string | null) => design.conductors.find((c) => c.id === id)?.lengthM
    await poll(async () => lengthOf(await firstId())).toBe(longestM)
    await page.locator('.schedule-table .v-table__wrapper').evaluate((el) => el.scrollTo({ top: el.scrollHeight }))
    const shortestM = Math.min(...design.conductors.map((c) => c.lengthM))
    const lastId = () => page.locator('.schedule-table tbody tr[data-row-id]').last().getAttribute('data-row-id')
    await poll(async () => lengthOf(await lastId())).toBe(shortestM)
    expect(await page.locator('.schedule-table tbody tr[data-row-id]').count()).toBeLessThan(design.conductors.length / 5)

    // A click selects the conductor (the side panel shows it) and marks the row.
    const row = page.locator('.schedule-table tbody tr[data-row-id]').nth(3)
    const id = (await row.getAttribute('data-row-id'))!
    await row.locator('td').first().click()
    await poll(() => scheduleRow(id).getAttribute('class')).toContain('schedule-table__row--selected')
    await poll(() => page.locator('.inspector').innerText()).toContain(`Conductor ${design.conductors.find((c) => c.id === id)!.label}:`)
    await page.waitForTimeout(300)
    await shot('bottom-panel-conductors-500')

    await page.locator('[data-tab="devices"]').click()
    await poll(() => page.locator('.schedule-table tbody tr[data-row-id]').count()).toBeGreaterThan(3)
    expect(await page.locator('.schedule-table tbody tr[data-row-id]').count()).toBeLessThan(design.parts.length / 5)
    await page.waitForTimeout(300)
    await shot('bottom-panel-devices-500')
    const text = await page.locator('.bottom-panel').innerText()
    expect(text).not.toMatch(/\bNaN\b|\bundefined\b|Infinity/)
    expect(session.pageErrors).toEqual([])
    expect(session.serverErrors).toEqual([])
  })
})
