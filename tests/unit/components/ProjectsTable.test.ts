// @vitest-environment happy-dom
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it } from 'vitest'
import ProjectsTable from '@/components/projects/ProjectsTable.vue'
import type { Project } from '@shared/api/projects.schemas'
import { mountWithVuetify } from './mountWithVuetify'

const options = { page: 1, pageSize: 20, sort: 'updatedAt', order: 'desc' } as const

let unmount: (() => void) | undefined
afterEach(() => unmount?.())

function mountTable(props: Record<string, unknown>) {
  const { wrapper, inner } = mountWithVuetify(ProjectsTable, { props: { items: [], total: 0, options, ...props } })
  unmount = () => wrapper.unmount()
  return { wrapper, inner }
}

const sample: Project = {
  id: '5b0f3f5e-6b1e-4d7e-9a3c-3f1f6f0f9a01',
  name: 'Touring van, 24 V',
  clientName: 'Ridgeway Outfitters',
  installationKind: 'vehicle',
  nominalVoltageV: 24,
  notes: '',
  archived: false,
  createdAt: '2026-11-30T10:00:00.000Z',
  updatedAt: '2026-12-01T09:30:00.000Z',
  createdBy: null,
}

describe('ProjectsTable', () => {
  it('invites a designer to create the first project when there are none', async () => {
    const { wrapper, inner } = mountTable({ canWrite: true })
    await flushPromises()
    const empty = wrapper.get('[data-test="projects-empty"]')
    expect(empty.text()).toContain('No projects yet')
    const create = empty.findAll('button').find((b) => b.text().includes('New project'))
    expect(create).toBeDefined()
    await create!.trigger('click')
    expect(inner.emitted('create')).toHaveLength(1)
  })

  it('tells a read-only member that shared projects will appear, with no create button', async () => {
    const { wrapper } = mountTable({ canWrite: false })
    await flushPromises()
    const empty = wrapper.get('[data-test="projects-empty"]')
    expect(empty.text()).toContain('Projects shared with you will appear here.')
    expect(empty.text()).not.toContain('New project')
  })

  it('names the search that found nothing and offers to clear the filters', async () => {
    const { wrapper, inner } = mountTable({ canWrite: true, search: 'ketch' })
    await flushPromises()
    const empty = wrapper.get('[data-test="projects-empty"]')
    expect(empty.text()).toContain('No projects match “ketch”')
    await empty.findAll('button').find((b) => b.text().includes('Clear filters'))!.trigger('click')
    expect(inner.emitted('clear-filters')).toHaveLength(1)
  })

  it('shows a load error with a retry instead of the empty state', async () => {
    const { wrapper, inner } = mountTable({ error: 'Cannot reach the Ampwright server.' })
    await flushPromises()
    expect(wrapper.find('[data-test="projects-empty"]').exists()).toBe(false)
    const alert = wrapper.get('[data-test="projects-error"]')
    expect(alert.text()).toContain('Cannot reach the Ampwright server.')
    await alert.get('button').trigger('click')
    expect(inner.emitted('retry')).toHaveLength(1)
  })

  it('shows rows with labels and units, not the empty state, when there are projects', async () => {
    const { wrapper } = mountTable({ items: [sample], total: 1 })
    await flushPromises()
    expect(wrapper.find('[data-test="projects-empty"]').exists()).toBe(false)
    const row = wrapper.get('tbody tr')
    expect(row.text()).toContain('Touring van, 24 V')
    expect(row.text()).toContain('Ridgeway Outfitters')
    expect(row.text()).toContain('Vehicle')
    expect(row.text()).toContain('24 V')
  })
})
