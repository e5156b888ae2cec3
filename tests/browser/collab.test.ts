// Live co-editing in two chromium pages against the real server, the built client and the real
// /collab endpoint: a designer's edit appears on a reviewer's page, each sees the other in the
// presence strip, and the reviewer's page offers no editing.
import path from 'node:path'
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { TestServer } from '../helpers/server'
import { TEST_PASSWORD, createOrganization, createProject, type TestOrganization, type TestUser } from '../helpers/factories'
import { SCREENSHOTS_DIR } from '../helpers/browser'
import { startSharedServerSessions, type SharedServerSessions } from '../helpers/browserSession'

let server: TestServer
let organization: TestOrganization
let projectId: string
let people: SharedServerSessions

const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 15_000, interval: 100 })

/** A signed-in page of its own browser profile (its own session cookie), on the design. */
async function openAs(user: TestUser): Promise<Page> {
  const { page } = await people.signIn(user.role, { email: user.email, password: TEST_PASSWORD })
  await page.goto(`${server.baseUrl}/projects/${projectId}/design`)
  await page.locator('.editor-canvas').waitFor()
  return page
}

const nodes = (page: Page) => page.locator('.vue-flow__node')

beforeAll(async () => {
  people = await startSharedServerSessions()
  server = people.server
  organization = await createOrganization(server.db, 'Collab')
  projectId = await createProject(server.db, organization)
})

afterAll(async () => {
  await people?.close()
})

describe('two people on one design', () => {
  it("shows the designer's edit live on the reviewer's read-only page, with presence", async () => {
    const designer = await openAs(organization.designer)
    const reviewer = await openAs(organization.reviewer)

    for (const page of [designer, reviewer]) await poll(() => page.locator('[data-testid="connection-state"]').getAttribute('data-state')).toBe('live')
    // Each sees the other in the presence strip, by name.
    await poll(() => designer.locator(`[data-testid="presence-strip"] [data-name="${organization.reviewer.name}"]`).count()).toBe(1)
    await poll(() => reviewer.locator(`[data-testid="presence-strip"] [data-name="${organization.designer.name}"]`).count()).toBe(1)

    // The designer drops a battery; it appears on the reviewer's canvas without a reload.
    const before = await nodes(reviewer).count()
    await designer.locator('.parts-list__item[data-part-type="battery"]').dragTo(designer.locator('.editor-canvas'), { targetPosition: { x: 300, y: 200 } })
    await poll(() => nodes(designer).count()).toBe(before + 1)
    await poll(() => nodes(reviewer).count()).toBe(before + 1)

    // The designer selects the battery and points at the canvas: the reviewer sees both in the
    // designer's colour, with the designer's name by the pointer.
    await nodes(designer).first().click()
    await designer.mouse.move(700, 400, { steps: 4 })
    await poll(() => reviewer.locator('[data-testid="remote-selection"]').count()).toBe(1)
    await poll(() => reviewer.locator('[data-testid="remote-pointer"]').textContent()).toContain(organization.designer.name)

    // The reviewer's page is view-only: read-only state, no dragging parts in.
    expect(await reviewer.locator('[data-testid="save-state"]').getAttribute('data-state')).toBe('read-only')
    await reviewer.locator('.parts-list__item[data-part-type="battery"]').dragTo(reviewer.locator('.editor-canvas'), { targetPosition: { x: 500, y: 300 } })
    await reviewer.waitForTimeout(500)
    expect(await nodes(reviewer).count()).toBe(before + 1)
    expect(await nodes(designer).count()).toBe(before + 1)

    await designer.screenshot({ path: path.join(SCREENSHOTS_DIR, 'collab-designer.png') })
    await reviewer.screenshot({ path: path.join(SCREENSHOTS_DIR, 'collab-reviewer.png') })

    // The designer names a revision; it is listed with its author, and the reviewer sees it too
    // (without the naming form or restore).
    await designer.locator('[data-testid="open-revisions"]').click()
    await designer.locator('[data-testid="revision-name"] input').fill('Issued for review')
    await designer.locator('[data-testid="revision-save"]').click()
    const designerRow = designer.locator('[data-testid="revision-list"] .v-list-item').filter({ hasText: 'Issued for review' })
    await poll(() => designerRow.count()).toBe(1)
    expect(await designerRow.textContent()).toContain(organization.designer.name)

    // A fuse added after that and a second revision: comparing the two lists the added fuse.
    await designer.getByRole('button', { name: 'Close' }).click()
    await designer.locator('.parts-list__item[data-part-type="fuse"]').dragTo(designer.locator('.editor-canvas'), { targetPosition: { x: 550, y: 120 } })
    await poll(() => nodes(designer).count()).toBe(before + 2)
    await designer.locator('[data-testid="open-revisions"]').click()
    await designer.locator('[data-testid="revision-name"] input').fill('As built')
    await designer.locator('[data-testid="revision-save"]').click()
    await poll(() => designer.locator('[data-testid="revision-list"] .v-list-item').count()).toBe(2)
    for (const [label, revision] of [['From', 'Issued for review'], ['To', 'As built']]) {
      await designer.locator('[data-testid="revisions-dialog"] .v-select').filter({ hasText: label }).click()
      // This select's own list: the other one's may still be closing, with the same options in it.
      await designer.getByRole('listbox', { name: label, exact: true }).getByRole('option', { name: revision }).click()
    }
    await designer.getByRole('button', { name: 'Compare' }).click()
    await poll(() => designer.locator('[data-testid="revision-comparison"]').textContent()).toContain('Parts added (1)')
    await designer.screenshot({ path: path.join(SCREENSHOTS_DIR, 'collab-revisions.png') })
    await reviewer.locator('[data-testid="open-revisions"]').click()
    await poll(() => reviewer.locator('[data-testid="revision-list"] .v-list-item').filter({ hasText: 'Issued for review' }).count()).toBe(1)
    expect(await reviewer.locator('[data-testid="revision-name"]').count()).toBe(0)
    expect(await reviewer.getByRole('button', { name: 'Restore' }).count()).toBe(0)

    expect(people.pageErrors()).toEqual([])
  })
})
