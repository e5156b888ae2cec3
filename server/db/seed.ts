// Invented demo data: one organisation with a member of each role and one project shared with the
// client. Inserted once (skipped when the demo owner exists), so restarts keep what people changed.
import { sql } from 'drizzle-orm'
import type { Role } from '../../shared/api/roles'
import { createDemoDesign } from '../../shared/design/demo'
import { findUserByEmail, insertMember, insertOrganization } from '../modules/auth/users.repository'
import { insertProjectWithDesign } from '../modules/projects/projects.repository'
import { insertShare } from '../modules/projects/project-shares.repository'
import { hashPassword } from '../security/passwords'
import type { Db } from './client'

export const DEMO_PASSWORD = 'ampwright-demo'
export const DEMO_ORGANIZATION = 'Tidewater & Trail Electric'

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: 'demo@ampwright.test', name: 'Maren Okafor', role: 'owner' },
  { email: 'designer@ampwright.test', name: 'Theo Lindqvist', role: 'designer' },
  { email: 'reviewer@ampwright.test', name: 'Priya Raman', role: 'reviewer' },
  { email: 'client@ampwright.test', name: 'Cal Brennan', role: 'client' },
]

export const DEMO_PROJECT = {
  name: 'Expedition truck house battery',
  clientName: 'Brennan Overland',
  installationKind: 'vehicle' as const,
  nominalVoltageV: 24,
  notes:
    'Habitation system for a 4×4 expedition truck: 24 V lithium iron phosphate bank, roof solar, a DC-DC ' +
    'charger from the chassis alternator, compressor fridge, diesel heater, water pump and a 2 kW inverter.',
}

// Any fixed number: keeps two processes from seeding at the same moment.
const SEED_LOCK_KEY = 4_127_001

/** Inserts the demo organisation once; returns true if it did. */
export async function seedDemoData(db: Db, options: { bcryptCost: number }): Promise<boolean> {
  if (await findUserByEmail(db, DEMO_ACCOUNTS[0].email)) return false
  const passwordHash = await hashPassword(DEMO_PASSWORD, options.bcryptCost)
  return db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(${SEED_LOCK_KEY})`)
    if (await findUserByEmail(tx, DEMO_ACCOUNTS[0].email)) return false
    const organization = await insertOrganization(tx, DEMO_ORGANIZATION)
    const members = []
    for (const account of DEMO_ACCOUNTS) {
      members.push(await insertMember(tx, { ...account, organizationId: organization.id, passwordHash }))
    }
    const owner = members[0]
    const client = members[DEMO_ACCOUNTS.findIndex((account) => account.role === 'client')]
    const projectId = await insertProjectWithDesign(tx, {
      organizationId: organization.id,
      createdBy: owner.id,
      values: DEMO_PROJECT,
      document: { ...createDemoDesign(), name: DEMO_PROJECT.name },
    })
    await insertShare(tx, projectId, client.id)
    return true
  })
}
