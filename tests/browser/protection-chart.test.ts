// The time-current chart in Debian's chromium against the real server and the built client: the demo
// design (shared/design/demo.ts, an invented van with a water pump that starts at 6 × its current)
// is loaded through the API, the fuse panel feeding the pump is selected in the editor and its chart
// opened; the canvas must be drawn, the PNG export must give a PNG, and no page error may occur.
import fs from 'node:fs'
import path from 'node:path'
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../shared/design/demo'
import { INKED_SHARE, SCREENSHOTS_DIR } from '../helpers/browser'
import { startBrowserSession, type BrowserSession } from '../helpers/browserSession'

const SHOTS = SCREENSHOTS_DIR

let session: BrowserSession
let page: Page
const suffix = Math.random().toString(36).slice(2, 8)
const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 15_000, interval: 100 })
const api: BrowserSession['api'] = (...args) => session.api(...args)

// Persistent contexts accept downloads by default: the PNG export below relies on it.
beforeAll(async () => {
  session = await startBrowserSession({
    viewport: { width: 1440, height: 900 },
    signUp: {
      name: 'Odile Brack', email: `odile.${suffix}@brack-marine.test`, password: 'heat-shrink-and-lugs', organizationName: `Brack Mobile Power ${suffix}`,
    },
  })
  page = session.page
})

afterAll(async () => {
  await session?.close()
})

describe('time-current chart in the editor', () => {
  it('draws the chart of the fuse feeding the water pump, exports it as PNG, without page errors', async () => {
    const project = await api('post', '/projects', { name: `Pump circuit ${suffix}`, installationKind: 'vehicle', nominalVoltageV: 24 })
    const { revision } = await api('get', `/projects/${project.id}/design`)
    await api('put', `/projects/${project.id}/design`, { design: createDemoDesign(), baseRevision: revision })

    await page.goto(`${session.server.baseUrl}/projects/${project.id}/design`)
    await page.locator('.editor-canvas').waitFor()
    await page.locator('.vue-flow__node[data-id="panel"]').click()
    const open = page.locator('[data-test="open-time-current"]')
    await open.waitFor()
    // The analysis runs in a worker: wait for the panel's figures before opening the chart.
    await poll(() => page.locator('.part-inspector__figures').textContent()).toMatch(/Way 3: fault current\s*[\d.,\s]+\sA/)
    await open.click()

    const dialog = page.locator('[data-test="time-current-dialog"]')
    await dialog.waitFor()
    // The first way feeding a load with a start comes first: way 1, the fridge (demo.ts); choose the pump's way 3.
    const device = dialog.locator('[data-test="chart-device"]')
    await poll(() => device.textContent()).toContain('Habitation fuse panel, way 1 (10 A)')
    await device.click()
    await page.getByRole('option', { name: 'Habitation fuse panel, way 3 (15 A)' }).click()
    await poll(() => device.textContent()).toContain('Habitation fuse panel, way 3 (15 A)')
    await page.locator('[data-test="time-current-canvas"]').waitFor()
    await poll(() => page.evaluate(INKED_SHARE) as Promise<number>).toBeGreaterThan(0.05)
    const text = (await dialog.textContent()) ?? ''
    expect(text).toContain('ISO 8820-3')
    expect(text).toContain('ICEA P-32-382')
    expect(text).toMatch(/authority having\s+jurisdiction/)
    expect(text).not.toMatch(/NaN|undefined|Infinity/)

    await dialog.screenshot({ path: path.join(SHOTS, 'time-current-motor-circuit.png') })

    const [download] = await Promise.all([page.waitForEvent('download'), dialog.locator('[data-test="export-png"]').click()])
    expect(download.suggestedFilename()).toBe('time-current-habitation-fuse-panel-way-3-15-a.png')
    const file = await download.path()
    const png = fs.readFileSync(file)
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])
    fs.copyFileSync(file, path.join(SHOTS, 'time-current-motor-circuit-export.png'))

    expect(session.pageErrors).toEqual([])
    expect(session.serverErrors).toEqual([])
  })
})

describe('device library in the browser', () => {
  it('adds a device from datasheet points with a live band preview, flagging a bad point at its cell', async () => {
    await page.goto(`${session.server.baseUrl}/devices`)
    await page.locator('[data-test="add-device"]').click()
    const form = page.locator('[data-test="device-form"]')
    await form.waitFor()
    await form.locator('[data-field="name"] input').fill('Workshop strip fuse 20 A')
    await form.locator('[data-field="ratingA"] input').fill('20')
    await form.locator('[data-field="source"] input').fill('Maker datasheet rev. B, figure 2 (invented)')
    // Invented points; the second current is lower than the first (a typing slip) until corrected.
    const cells = (row: number) => form.locator('[data-test="points-table"] tbody tr').nth(row).locator('input')
    const points = [['27', '120', '1800'], ['24', '0.8', '5']]
    for (const [row, values] of points.entries()) for (const [col, value] of values.entries()) await cells(row).nth(col).fill(value)
    await form.locator('[data-test="save-device"]').click()
    await poll(() => form.textContent()).toContain('Currents must rise from one point to the next')
    await cells(1).nth(0).fill('40')
    await page.getByRole('button', { name: 'Add point' }).click()
    for (const [col, value] of ['200', '0.003', '0.02'].entries()) await cells(2).nth(col).fill(value)
    await form.locator('[data-test="time-current-canvas"]').waitFor()
    await poll(() => page.evaluate(INKED_SHARE) as Promise<number>).toBeGreaterThan(0.03)
    await page.screenshot({ path: path.join(SHOTS, 'device-library-form.png') })
    await form.locator('[data-test="save-device"]').click()
    await poll(() => page.locator('[data-test="devices-table"]').textContent()).toContain('Workshop strip fuse 20 A')
    expect(await page.locator('[data-test="devices-table"]').textContent()).toContain('20 A')
    expect(session.pageErrors).toEqual([])
    expect(session.serverErrors).toEqual([])
  })
})
