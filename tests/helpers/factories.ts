// Test data inserted through the server's own repositories (fast: one bcrypt hash per process), with
// e-mail addresses unique to each call so test files never need to truncate tables.
import { randomUUID } from 'node:crypto'
import type { Role } from '../../shared/api/roles'
import type { ProjectValues } from '../../server/modules/projects/projects.repository'
import type { Db } from '../../server/db/client'
import { insertMember, insertOrganization } from '../../server/modules/auth/users.repository'
import { emptyDesignFor } from '../../server/modules/designs/design-document'
import { insertProjectWithDesign } from '../../server/modules/projects/projects.repository'
import { insertShare } from '../../server/modules/projects/project-shares.repository'
import { hashPassword } from '../../server/security/passwords'

export const TEST_PASSWORD = 'correct horse battery staple'

let passwordHash: Promise<string> | undefined
/** Same cost as production (12), computed once. */
function testPasswordHash(): Promise<string> {
  passwordHash ??= hashPassword(TEST_PASSWORD, 12)
  return passwordHash
}

export function uniqueEmail(label: string): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.test`
}

export interface TestUser {
  id: string
  email: string
  name: string
  role: Role
}

export async function createMember(db: Db, organizationId: string, role: Role, label: string = role): Promise<TestUser> {
  const email = uniqueEmail(label)
  const name = `${label[0].toUpperCase()}${label.slice(1)} Tester`
  const user = await insertMember(db, { organizationId, name, email, role, passwordHash: await testPasswordHash() })
  return { id: user.id, email, name, role }
}

export interface TestOrganization {
  id: string
  name: string
  owner: TestUser
  designer: TestUser
  reviewer: TestUser
  /** A client member the organisation's shared projects are shared with. */
  client: TestUser
  /** A client member nothing is shared with. */
  otherClient: TestUser
}

export async function createOrganization(db: Db, label = 'Org'): Promise<TestOrganization> {
  const name = `${label} ${randomUUID().slice(0, 6)}`
  const organization = await insertOrganization(db, name)
  const id = organization.id
  return {
    id,
    name,
    owner: await createMember(db, id, 'owner'),
    designer: await createMember(db, id, 'designer'),
    reviewer: await createMember(db, id, 'reviewer'),
    client: await createMember(db, id, 'client'),
    otherClient: await createMember(db, id, 'client', 'unshared-client'),
  }
}

export async function createProject(
  db: Db,
  organization: TestOrganization,
  values: Partial<ProjectValues> & { sharedWith?: TestUser[]; document?: unknown } = {},
): Promise<string> {
  const { sharedWith = [], document, ...rest } = values
  const projectValues: ProjectValues = {
    name: `Project ${randomUUID().slice(0, 6)}`,
    clientName: 'Test client',
    installationKind: 'vehicle',
    nominalVoltageV: 12,
    notes: '',
    ...rest,
  }
  const id = await insertProjectWithDesign(db, {
    organizationId: organization.id,
    createdBy: organization.owner.id,
    values: projectValues,
    document: document ?? emptyDesignFor(projectValues),
  })
  for (const user of sharedWith) await insertShare(db, id, user.id)
  return id
}
