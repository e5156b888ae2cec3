import { describe, expect, it } from 'vitest'
import { fieldMessages, useServerFieldErrors, useZodRules, zodRule } from '@/composables/useZodRules'
import { signUpSchema } from '@shared/api/auth.schemas'
import { invitationInputSchema } from '@shared/api/members.schemas'
import { PROJECT_NAME_MAX, projectInputSchema } from '@shared/api/projects.schemas'

describe('zodRule', () => {
  it('accepts what the shared schema accepts and returns its first message otherwise', () => {
    const name = zodRule(projectInputSchema.shape.name)
    expect(name('Shore power, 30 A inlet')).toBe(true)
    expect(name('')).toBe('Enter a project name')
    expect(name('   ')).toBe('Enter a project name') // the schema trims before its minimum length
    expect(name('x'.repeat(PROJECT_NAME_MAX + 1))).toBe(projectInputSchema.shape.name.safeParse('x'.repeat(PROJECT_NAME_MAX + 1)).error?.issues[0]?.message)
  })

  it('uses the schema messages for voltages and e-mail addresses', () => {
    const voltage = zodRule(projectInputSchema.shape.nominalVoltageV)
    expect([12, 24, 48].map(voltage)).toEqual([true, true, true])
    expect(voltage(36)).toBe('Choose 12, 24 or 48 V')
    expect(voltage(null)).toBe('Choose 12, 24 or 48 V')
    const email = zodRule(invitationInputSchema.shape.email)
    expect(email('  Ines@Example.TEST ')).toBe(true)
    expect(email('ines@')).toBe('Enter a valid e-mail address')
  })
})

describe('useZodRules', () => {
  it('gives one rule list per field of the object schema', () => {
    const rules = useZodRules(signUpSchema)
    expect(Object.keys(rules).sort()).toEqual(['email', 'name', 'organizationName', 'password'])
    expect(rules.password[0]!('short')).toBe('Use at least 10 characters')
    expect(rules.organizationName[0]!('Harbour Lane Marine')).toBe(true)
  })
})

describe('server field errors', () => {
  it('groups messages by top-level field, from API fields and zod issues alike', () => {
    expect(fieldMessages([{ path: 'name', message: 'Taken' }, { path: 'design.nodes.3.x', message: 'Bad' }])).toEqual({
      name: ['Taken'],
      design: ['Bad'],
    })
    const parsed = projectInputSchema.safeParse({ name: '', installationKind: 'vehicle', nominalVoltageV: 7 })
    expect(parsed.success).toBe(false)
    expect(fieldMessages(parsed.error!.issues)).toEqual({ name: ['Enter a project name'], nominalVoltageV: ['Choose 12, 24 or 48 V'] })
  })

  it('puts known fields under their field and keeps the rest as a form message', () => {
    const errors = useServerFieldErrors(['email', 'role'] as const)
    errors.set([
      { path: 'email', message: 'Already a member' },
      { path: 'token', message: 'Expired' },
    ])
    expect(errors.byField.email).toEqual(['Already a member'])
    expect(errors.byField.role).toEqual([])
    expect(errors.state.form).toEqual(['Expired'])
    errors.clear('email')
    expect(errors.byField.email).toEqual([])
    expect(errors.state.form).toEqual(['Expired'])
    errors.clear()
    expect(errors.state.form).toEqual([])
  })
})
