import { Router } from 'express'
import { z } from 'zod'
import { memberRoleUpdateSchema } from '../../../shared/api/members.schemas'
import { actorOf, idParam } from '../../http/actor'
import { requirePermission } from '../../http/auth'
import type { RouteDeps } from '../../http/route-deps'
import { validate } from '../../http/validate'
import { changeMemberRole, members, removeMember } from './members.service'

const params = z.object({ userId: idParam })

export function membersRoutes(deps: RouteDeps): Router {
  const { db } = deps
  const router = Router()
  router.use(deps.requireSession)

  router.get('/', requirePermission('member.read'), async (req, res) => {
    res.json(await members(db, actorOf(req)))
  })

  const roleInput = validate({ params, body: memberRoleUpdateSchema })
  router.patch('/:userId', requirePermission('member.manage'), roleInput, async (req, res) => {
    const { params: p, body } = roleInput.data(req)
    const member = await changeMemberRole(db, actorOf(req), p.userId, body.role)
    // Open live-editing connections of this member take the new role at once.
    deps.hub.access.emit({ kind: 'memberRole', organizationId: actorOf(req).organizationId, userId: p.userId, role: body.role })
    res.json(member)
  })

  const removeInput = validate({ params })
  router.delete('/:userId', requirePermission('member.manage'), removeInput, async (req, res) => {
    const { userId } = removeInput.data(req).params
    await removeMember(db, actorOf(req), userId)
    deps.hub.access.emit({ kind: 'memberRemoved', organizationId: actorOf(req).organizationId, userId })
    res.status(204).end()
  })

  return router
}
