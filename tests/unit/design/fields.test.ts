import { describe, expect, it } from 'vitest'
import { PART_CATALOGUE, paramFields } from '../../../shared/design/catalogue'
import { describeField } from '../../../shared/design/fields'
import { conductorSchema, PART_TYPES, type DesignSettings } from '../../../shared/design/schema'

// Forms are drawn from the schema's own metadata: every parameter needs a label and, for numbers,
// the unit and limits the schema enforces.

const SETTINGS: DesignSettings = { nominalVoltageV: 24, unitSystem: 'metric', profile: 'marine', defaultAmbientC: 30 }

describe('paramFields', () => {
  it.each(PART_TYPES)('describes every parameter of %s', (type) => {
    const shape = (PART_CATALOGUE[type].paramsSchema as unknown as { shape: Record<string, unknown> }).shape
    const fields = paramFields(type)
    expect(fields.map((f) => f.key)).toEqual(Object.keys(shape))
    const defaults = PART_CATALOGUE[type].defaultParams(SETTINGS) as Record<string, unknown>
    for (const field of fields) {
      expect(field.label.length, field.key).toBeGreaterThan(1)
      if (field.kind === 'number') {
        expect(field.min!, field.key).toBeLessThan(field.max!)
        expect(typeof field.unit, field.key).toBe('string')
        const value = defaults[field.key]
        if (typeof value === 'number') {
          expect(value, field.key).toBeGreaterThanOrEqual(field.min!)
          expect(value, field.key).toBeLessThanOrEqual(field.max!)
        }
      }
      if (field.kind === 'choice') expect(field.options!.length, field.key).toBeGreaterThan(1)
    }
  })

  it('gives units in the field and marks optional and defaulted fields', () => {
    const battery = paramFields('battery')
    expect(battery.find((f) => f.key === 'capacityAh')).toEqual({
      key: 'capacityAh', label: 'Capacity per battery', kind: 'number', unit: 'Ah', min: 1, max: 5000, integer: false })
    expect(battery.find((f) => f.key === 'seriesCount')).toMatchObject({ integer: true, min: 1, max: 32 })
    expect(battery.find((f) => f.key === 'stateOfChargeVoltageV')).toMatchObject({ optional: true, unit: 'V' })
    expect(paramFields('fuse').find((f) => f.key === 'closed')).toEqual({
      key: 'closed', label: 'Closed (not blown or tripped)', kind: 'boolean', defaultValue: true })
  })

  it('describes conductor fields too', () => {
    expect(describeField(conductorSchema.shape.lengthM)).toMatchObject({ label: 'Length', unit: 'm', kind: 'number' })
    expect(describeField(conductorSchema.shape.sizeId)).toMatchObject({ kind: 'choice', label: 'Size' })
    expect(describeField(conductorSchema.shape.ambientC)).toMatchObject({ label: 'Ambient temperature', unit: '°C', optional: true, defaultValue: null })
  })
})
