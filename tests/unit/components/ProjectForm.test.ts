// @vitest-environment happy-dom
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it } from 'vitest'
import ProjectForm from '@/components/projects/ProjectForm.vue'
import { PROJECT_NAME_MAX, projectInputSchema } from '@shared/api/projects.schemas'
import { mountWithVuetify } from './mountWithVuetify'

/** The message the shared schema gives for a value of one field (the API sends the same). */
function schemaMessage(field: 'name' | 'clientName', value: string): string {
  const result = projectInputSchema.shape[field].safeParse(value)
  if (result.success) throw new Error(`${field}=${JSON.stringify(value)} is valid`)
  return result.error.issues[0]!.message
}

async function settle(): Promise<void> {
  await flushPromises()
  await new Promise((resolve) => setTimeout(resolve, 0))
  await flushPromises()
}

let unmount: (() => void) | undefined
afterEach(() => unmount?.())

function mountForm(props: Record<string, unknown> = {}) {
  const { wrapper, inner } = mountWithVuetify(ProjectForm, { props })
  unmount = () => wrapper.unmount()
  const submitButton = () => wrapper.get('[data-test="project-submit"]')
  const nameInput = () => wrapper.get('[data-test="field-name"] input')
  return { wrapper, inner, submitButton, nameInput }
}

describe('ProjectForm', () => {
  it('shows the shared schema message for a blank name and disables submit', async () => {
    const { wrapper, submitButton, nameInput } = mountForm({ initial: { name: 'Van 12 V' } })
    await nameInput().setValue('   ')
    await settle()
    const expected = schemaMessage('name', '   ')
    expect(expected).toBe('Enter a project name')
    expect(wrapper.get('[data-test="field-name"]').text()).toContain(expected)
    expect(submitButton().attributes('disabled')).toBeDefined()
  })

  it('shows the schema message for a name over the limit', async () => {
    const { wrapper, submitButton, nameInput } = mountForm()
    const long = 'x'.repeat(PROJECT_NAME_MAX + 1)
    await nameInput().setValue(long)
    await settle()
    expect(wrapper.get('[data-test="field-name"]').text()).toContain(schemaMessage('name', long))
    expect(submitButton().attributes('disabled')).toBeDefined()
  })

  it('blocks submitting an untouched empty form and shows why', async () => {
    const { wrapper, inner } = mountForm()
    await wrapper.get('form').trigger('submit')
    await settle()
    expect(inner.emitted('submit')).toBeUndefined()
    expect(wrapper.get('[data-test="field-name"]').text()).toContain('Enter a project name')
  })

  it('emits the parsed values (trimmed, defaults filled) for valid input', async () => {
    const { wrapper, inner, submitButton, nameInput } = mountForm()
    await nameInput().setValue('  Cabin array  ')
    await wrapper.get('[data-test="field-client"] input').setValue('Harbour Lane Cottage')
    await settle()
    expect(submitButton().attributes('disabled')).toBeUndefined()
    await wrapper.get('form').trigger('submit')
    await settle()
    expect(inner.emitted('submit')).toEqual([
      [{ name: 'Cabin array', clientName: 'Harbour Lane Cottage', installationKind: 'vehicle', nominalVoltageV: 12, notes: '' }],
    ])
  })

  it('shows server field errors under their fields until the field is edited', async () => {
    const { wrapper, submitButton, nameInput } = mountForm({
      initial: { name: 'Sloop house bank' },
      serverErrors: { name: ['A project with this name already exists'] },
    })
    await settle()
    expect(wrapper.get('[data-test="field-name"]').text()).toContain('A project with this name already exists')
    expect(submitButton().attributes('disabled')).toBeDefined()
    await nameInput().setValue('Sloop house bank, rev B')
    await settle()
    expect(wrapper.get('[data-test="field-name"]').text()).not.toContain('already exists')
    expect(submitButton().attributes('disabled')).toBeUndefined()
  })
})
