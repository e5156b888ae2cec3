import type { Member } from '../../../shared/api/members.schemas'
import type { Role } from '../../../shared/api/roles'
import type { Db } from '../../db/client'
import type { Actor } from '../../http/actor'
import { conflict, notFound } from '../../http/errors'
import {
  countOwners,
  deleteMemberAccount,
  findMemberInOrganization,
  listMembers,
  lockOrganization,
  setMemberRole,
  type MemberRow,
} from './members.repository'

export const LAST_OWNER_MESSAGE = 'An organisation needs at least one owner: make someone else owner first'

function toMember(row: MemberRow): Member {
  return { ...row, joinedAt: row.joinedAt.toISOString() }
}

export async function members(db: Db, actor: Actor): Promise<Member[]> {
  return (await listMembers(db, actor.organizationId)).map(toMember)
}

export async function changeMemberRole(db: Db, actor: Actor, userId: string, role: Role): Promise<Member> {
  return db.transaction(async (tx) => {
    await lockOrganization(tx, actor.organizationId)
    const member = await findMemberInOrganization(tx, actor.organizationId, userId)
    if (!member) throw notFound('Member')
    if (member.role === 'owner' && role !== 'owner' && (await countOwners(tx, actor.organizationId)) <= 1) {
      throw conflict(LAST_OWNER_MESSAGE)
    }
    await setMemberRole(tx, actor.organizationId, userId, role)
    return toMember({ ...member, role })
  })
}

export async function removeMember(db: Db, actor: Actor, userId: string): Promise<void> {
  await db.transaction(async (tx) => {
    await lockOrganization(tx, actor.organizationId)
    const member = await findMemberInOrganization(tx, actor.organizationId, userId)
    if (!member) throw notFound('Member')
    if (member.role === 'owner' && (await countOwners(tx, actor.organizationId)) <= 1) throw conflict(LAST_OWNER_MESSAGE)
    await deleteMemberAccount(tx, userId)
  })
}
