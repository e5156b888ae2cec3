// Members of the organisation and its pending invitations (owners manage both).
import { acceptHMRUpdate, defineStore } from 'pinia'
import { computed, readonly, ref } from 'vue'
import * as membersApi from '@/api/members'
import { useDelayedFlag } from '@/composables/useDelayedFlag'
import type { Invitation, InvitationInput, Member } from '@shared/api/members.schemas'
import type { Role } from '@shared/api/roles'

export const useMembersStore = defineStore('members', () => {
  const byId = ref<Record<string, Member>>({})
  const invitations = ref<Invitation[]>([])
  const loaded = ref(false)
  const error = ref<unknown>(null)
  const loading = useDelayedFlag()
  let inFlight: Promise<void> | null = null

  const members = computed(() => Object.values(byId.value).sort((a, b) => a.name.localeCompare(b.name)))
  const clients = computed(() => members.value.filter((m) => m.role === 'client'))

  function setMembers(list: Member[]): void {
    byId.value = Object.fromEntries(list.map((m) => [m.userId, m]))
  }

  /** Members, plus pending invitations when the caller may manage them. Deduped while in flight. */
  function load(withInvitations: boolean): Promise<void> {
    inFlight ??= (async () => {
      loading.start()
      try {
        const [list, pending] = await Promise.all([
          membersApi.listMembers(),
          withInvitations ? membersApi.listInvitations() : Promise.resolve([]),
        ])
        setMembers(list)
        invitations.value = pending
        error.value = null
        loaded.value = true
      } catch (err) {
        error.value = err
        throw err
      } finally {
        loading.stop()
        inFlight = null
      }
    })()
    return inFlight
  }

  async function changeRole(userId: string, role: Role): Promise<Member> {
    const member = await membersApi.updateMemberRole(userId, role)
    byId.value[member.userId] = member
    return member
  }
  async function remove(userId: string): Promise<void> {
    await membersApi.removeMember(userId)
    delete byId.value[userId]
  }
  async function invite(input: InvitationInput): Promise<Invitation> {
    const invitation = await membersApi.createInvitation(input)
    invitations.value = [invitation, ...invitations.value]
    return invitation
  }
  async function revoke(id: string): Promise<void> {
    await membersApi.revokeInvitation(id)
    invitations.value = invitations.value.filter((i) => i.id !== id)
  }

  return {
    members,
    clients,
    invitations: readonly(invitations),
    loaded: readonly(loaded),
    error: readonly(error),
    isLoading: loading.flag,
    load,
    changeRole,
    remove,
    invite,
    revoke,
  }
})

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useMembersStore, import.meta.hot))
