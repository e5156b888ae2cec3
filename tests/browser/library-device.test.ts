// Choosing a device from the organisation's library for a fuse in the editor, in Debian's chromium
// against the real server and the built client. A device is added to the library through the API (our
// own invented points), the pump circuit of examples/motor-start-nuisance.json is loaded, its fuse is
// set to the library device in the part inspector, and the saved design must carry the copy
// (params.customDevice) with the device's rating; the motor-start finding of the blade band is gone,
// the chart draws the library band, and "Back to a generic family" brings the finding back.
import path from 'node:path'
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { motorStartNuisance } from '../../server/cli/examples/timeCurrent'
import { INKED_SHARE, SCREENSHOTS_DIR } from '../helpers/browser'
import { startBrowserSession, type BrowserSession } from '../helpers/browserSession'

let session: BrowserSession
let page: Page
const suffix = Math.random().toString(36).slice(2, 8)
const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 20_000, interval: 150 })
const api: BrowserSession['api'] = (...args) => session.api(...args)

beforeAll(async () => {
  session = await startBrowserSession({
    viewport: { width: 1440, height: 900 },
    signUp: {
      name: 'Rune Maelstad', email: `rune.${suffix}@maelstad-fitout.test`, password: 'crimp-then-solder', organizationName: `Maelstad Fit-out ${suffix}`,
    },
  })
  page = session.page
})

afterAll(async () => {
  await session?.close()
})

describe('a library device in a design', () => {
  it('sets the pump fuse to a library device, saves the copy, draws its band and goes back to the family', async () => {
    // Invented points in A and as multiples of 15 A (the library stores both), with a 32 V / 2 kA marking.
    const entry = await api('post', '/devices', {
      name: 'Workshop time-delay fuse 15 A', kind: 'fuse', ratingA: 15, dcVoltageRatingV: 32, interruptingRatingA: 2000,
      ignitionProtected: true, timeDelay: true, source: 'Invented datasheet, figure 1',
      points: [
        { currentA: 18, minMeltS: 3600 },
        { currentA: 22, maxClearS: 3600 },
        { multiple: 2, minMeltS: 60, maxClearS: 600 },
        { currentA: 48, minMeltS: 2.5, maxClearS: 20 },
        { multiple: 10, minMeltS: 0.05, maxClearS: 0.3 },
        { currentA: 300, minMeltS: 0.008, maxClearS: 0.03 },
      ],
    })
    // A breaker-kind entry must not be offered for a fuse.
    await api('post', '/devices', {
      name: 'Workshop breaker 15 A', kind: 'breaker', ratingA: 15, timeDelay: true, source: 'Invented datasheet, figure 2',
      points: [{ currentA: 20, minMeltS: 100, maxClearS: 1000 }, { currentA: 100, minMeltS: 0.5, maxClearS: 3 }],
    })
    const project = await api('post', '/projects', { name: `Pump circuit ${suffix}`, installationKind: 'vehicle', nominalVoltageV: 12 })
    const { revision } = await api('get', `/projects/${project.id}/design`)
    await api('put', `/projects/${project.id}/design`, { design: motorStartNuisance(), baseRevision: revision })

    await page.goto(`${session.server.baseUrl}/projects/${project.id}/design`)
    await page.locator('.editor-canvas').waitFor()
    await page.locator('.vue-flow__node[data-id="branch-device"]').click()
    const inspector = page.locator('.part-inspector[data-part-id="branch-device"]')
    await inspector.waitFor()
    // The blade band opens on the 48 A start (motor-start-nuisance.json).
    await poll(() => inspector.textContent()).toMatch(/may open on the start pulse/i)

    const select = inspector.locator('[data-test="library-device-select"]')
    await select.click()
    const option = page.getByRole('option', { name: 'Workshop time-delay fuse 15 A (15 A, time-delay)' })
    await option.waitFor()
    expect(await page.getByRole('option', { name: /Workshop breaker/ }).count()).toBe(0)
    await option.click()
    const current = inspector.locator('[data-test="library-device-current"]')
    await poll(() => current.textContent()).toContain('Workshop time-delay fuse 15 A')
    await poll(() => inspector.textContent()).not.toMatch(/may open on the start pulse/i)
    await inspector.screenshot({ path: path.join(SCREENSHOTS_DIR, 'library-device-inspector.png') })

    // The saved design carries the copy; the library's markings went into the part's own fields.
    await poll(async () => {
      const { design } = await api('get', `/projects/${project.id}/design`)
      return design.parts.find((p: { id: string }) => p.id === 'branch-device').params
    }).toMatchObject({
      ratingA: 15, dcVoltageRatingV: 32, interruptingRatingA: 2000, ignitionProtected: true, family: 'blade-regular',
      customDevice: {
        libraryId: entry.id, name: 'Workshop time-delay fuse 15 A', kind: 'fuse', ratingA: 15, timeDelay: true,
        minMeltPoints: [{ currentA: 18, timeS: 3600 }, { currentA: 30, timeS: 60 }, { currentA: 48, timeS: 2.5 }, { currentA: 150, timeS: 0.05 }, { currentA: 300, timeS: 0.008 }],
      },
    })

    await inspector.locator('[data-test="open-time-current"]').click()
    const dialog = page.locator('[data-test="time-current-dialog"]')
    await dialog.waitFor()
    await page.locator('[data-test="time-current-canvas"]').waitFor()
    await poll(async () => (await dialog.textContent()) ?? '').toContain('Workshop time-delay fuse 15 A (library device)')
    const text = (await dialog.textContent()) ?? ''
    expect(text).toContain('Invented datasheet, figure 1')
    expect(text).not.toMatch(/NaN|undefined/)
    await poll(() => page.evaluate(INKED_SHARE) as Promise<number>).toBeGreaterThan(0.05)
    await dialog.screenshot({ path: path.join(SCREENSHOTS_DIR, 'library-device-chart.png') })
    await page.keyboard.press('Escape')
    await dialog.waitFor({ state: 'hidden' })

    await inspector.locator('[data-test="library-device-clear"]').click()
    await poll(() => current.count()).toBe(0)
    await poll(() => inspector.textContent()).toMatch(/may open on the start pulse/i)
    await poll(async () => {
      const { design } = await api('get', `/projects/${project.id}/design`)
      return 'customDevice' in design.parts.find((p: { id: string }) => p.id === 'branch-device').params
    }).toBe(false)

    expect(session.pageErrors).toEqual([])
    expect(session.serverErrors).toEqual([])
  })
})
