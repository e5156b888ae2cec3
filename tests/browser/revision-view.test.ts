// A named revision opened read-only in chromium against the real server and the built client: the
// revisions dialog opens it on its own screen (the editor's canvas in view-only mode, its findings and
// schedules) under a label naming it, its time and author; a reviewer gets no restore, a designer
// restores it and is back on the live design. Then an owner demotes that designer: the open design
// page says the role changed instead of staying "Live" (the server's notice on the open connection).
import path from 'node:path'
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createDemoDesign } from '../../shared/design/demo'
import type { TestServer } from '../helpers/server'
import { freshSessionClient } from '../helpers/http'
import { TEST_PASSWORD, createMember, createOrganization, createProject, type TestOrganization, type TestUser } from '../helpers/factories'
import { SCREENSHOTS_DIR } from '../helpers/browser'
import { startSharedServerSessions, type SharedServerSessions } from '../helpers/browserSession'

let server: TestServer
let organization: TestOrganization
let projectId: string
let people: SharedServerSessions

const poll = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 15_000, interval: 100 })
const nodes = (page: Page) => page.locator('.vue-flow__node')

/** A signed-in page of its own browser profile (its own session cookie). */
async function signedInPage(user: TestUser): Promise<Page> {
  return (await people.signIn(user.role, { email: user.email, password: TEST_PASSWORD })).page
}

beforeAll(async () => {
  people = await startSharedServerSessions({ viewport: { width: 1280, height: 760 } })
  server = people.server
  organization = await createOrganization(server.db, 'Revision view')
  projectId = await createProject(server.db, organization, { name: 'Sailboat refit', document: createDemoDesign() })
})

afterAll(async () => {
  await people?.close()
})

describe('a revision, read-only', () => {
  it('opens from the revisions dialog with its label, diagram, findings and schedules; restore for a designer only', async () => {
    const designerApi = await freshSessionClient(server, { userId: organization.designer.id, organizationId: organization.id })
    const named = await designerApi.post(`/api/projects/${projectId}/revisions`, { name: 'issued for review' })
    expect(named.status).toBe(201)
    // The design moves on: one part more than in the revision.
    const current = (await designerApi.get(`/api/projects/${projectId}/design`)).body
    const revisionParts: number = current.design.parts.length
    const added = { ...current.design.parts[0], id: 'added-after-review', label: 'Added after review', position: { x: 40, y: 640 } }
    const moved = { ...current.design, parts: [...current.design.parts, added] }
    expect((await designerApi.put(`/api/projects/${projectId}/design`, { design: moved, baseRevision: current.revision })).status).toBe(200)

    const designer = await signedInPage(organization.designer)
    await designer.goto(`${server.baseUrl}/projects/${projectId}/design`)
    await poll(() => nodes(designer).count()).toBe(revisionParts + 1)
    await designer.locator('[data-testid="open-revisions"]').click()
    const row = designer.locator('[data-testid="revision-list"] .v-list-item').filter({ hasText: 'issued for review' })
    await row.locator('[data-testid="revision-open"]').click()
    await poll(() => new URL(designer.url()).pathname).toBe(`/projects/${projectId}/revisions/${named.body.id}`)

    const label = designer.locator('[data-testid="revision-label"]')
    await poll(() => label.textContent()).toContain('Revision “issued for review” — read-only, saved')
    expect(await label.textContent()).toContain(`by ${organization.designer.name}`)
    // The revision's diagram (without the part added since), not the current design; nothing can be dragged.
    await poll(() => nodes(designer).count()).toBe(revisionParts)
    expect(await designer.locator('.vue-flow__node.draggable').count()).toBe(0)
    // Findings of the revision's analysis, then its conductor schedule.
    await poll(() => designer.locator('.bottom-panel__status').count()).toBe(0) // the analysis has finished
    await poll(() => designer.locator('.bottom-panel tbody').textContent()).toContain('Error')
    await designer.screenshot({ path: path.join(SCREENSHOTS_DIR, 'revision-view.png') })
    await designer.locator('.bottom-panel [data-tab="conductors"]').click()
    await poll(() => designer.locator('.bottom-panel tbody tr').count()).toBeGreaterThan(0)
    await designer.screenshot({ path: path.join(SCREENSHOTS_DIR, 'revision-view-schedule.png') })

    // A reviewer sees the same screen without the restore action.
    const reviewer = await signedInPage(organization.reviewer)
    await reviewer.goto(designer.url())
    await poll(() => reviewer.locator('[data-testid="revision-label"]').textContent()).toContain('read-only')
    expect(await reviewer.locator('[data-testid="revision-restore"]').count()).toBe(0)

    // The designer restores it: back on the live design, which is the revision's again.
    await designer.locator('[data-testid="revision-restore"]').click()
    await designer.locator('[data-testid="restore-confirm"]').click()
    await poll(() => new URL(designer.url()).pathname).toBe(`/projects/${projectId}/design`)
    await poll(() => nodes(designer).count()).toBe(revisionParts)
    await poll(() => designer.locator('[data-testid="connection-state"]').getAttribute('data-state')).toBe('live')
    expect(people.pageErrors()).toEqual([])
  })

  it('an open design page explains a role change and a removal instead of staying live', async () => {
    const member = await createMember(server.db, organization.id, 'designer', 'demoted-in-browser')
    const page = await signedInPage(member)
    await page.goto(`${server.baseUrl}/projects/${projectId}/design`)
    await poll(() => page.locator('[data-testid="connection-state"]').getAttribute('data-state')).toBe('live')
    const ownerApi = await freshSessionClient(server, { userId: organization.owner.id, organizationId: organization.id })

    expect((await ownerApi.patch(`/api/members/${member.id}`, { role: 'reviewer' })).status).toBe(200)
    await poll(() => page.locator('[data-testid="connection-state"]').getAttribute('data-state')).toBe('roleChanged')
    const banner = page.locator('[data-testid="connection-banner"]')
    expect(await banner.textContent()).toContain('Your role was changed by an owner — reload to continue')
    await page.screenshot({ path: path.join(SCREENSHOTS_DIR, 'collab-role-changed.png') })

    expect((await ownerApi.delete(`/api/members/${member.id}`)).status).toBe(204)
    await poll(() => page.locator('[data-testid="connection-state"]').getAttribute('data-state')).toBe('accessRemoved')
    expect(await banner.textContent()).toContain('You no longer have access to this design')
    await page.screenshot({ path: path.join(SCREENSHOTS_DIR, 'collab-access-removed.png') })
    expect(people.pageErrors()).toEqual([])
  })
})
