// @vitest-environment happy-dom
// The side form: fields come from the catalogue's zod schemas; an invalid entry shows the field's
// message and leaves the Y.Doc untouched; a valid entry lands in the Y.Doc (and undo takes it back).
import { flushPromises } from '@vue/test-utils'
import type * as Y from 'yjs'
import { afterEach, describe, expect, it } from 'vitest'
import { createEmptyDesign } from '@shared/design/demo'
import type { Design } from '@shared/design/schema'
import PartInspector from '@/components/editor/PartInspector.vue'
import ConductorInspector from '@/components/editor/ConductorInspector.vue'
import { newConductor, newPart } from '@/components/editor/model/partFactory'
import type { useDesignEditorStore } from '@/stores/designEditor'
import { mountEditor } from './mountEditor'

let unmount: (() => void) | undefined
afterEach(() => {
  unmount?.()
  document.body.innerHTML = ''
})

function designWithBatteryAndFuse(unitSystem: 'metric' | 'imperial' = 'metric'): Design {
  const design = createEmptyDesign({ name: 'Bench test', nominalVoltageV: 24, profile: 'vehicle', unitSystem })
  const battery = newPart(design, 'battery', { x: 0, y: 0 })
  design.parts.push(battery)
  const fuse = newPart(design, 'fuse', { x: 200, y: 0 })
  design.parts.push(fuse)
  design.conductors.push(newConductor(design, { partId: battery.id, terminal: 'pos' }, { partId: fuse.id, terminal: 'line' }))
  return design
}

type Store = ReturnType<typeof useDesignEditorStore>
const yParams = (store: Store, partId: string) =>
  ((store.handle!.doc.getMap('parts').get(partId) as Y.Map<unknown>).get('params') as Y.Map<unknown>).toJSON()

async function type(wrapper: ReturnType<typeof mountEditor>['wrapper'], field: string, text: string) {
  const input = wrapper.find(`[data-field="${field}"] input`)
  expect(input.exists(), `field ${field}`).toBe(true)
  await input.setValue(text)
  await input.trigger('keydown', { key: 'Enter' })
  await flushPromises()
}

function mountPart(design: Design, index: number) {
  const mounted = mountEditor(PartInspector, (store) => ({ part: store.design!.parts[index] }), design)
  unmount = () => mounted.wrapper.unmount()
  return mounted
}

describe('part inspector', () => {
  it('builds its fields, with units, from the battery parameter schema', async () => {
    const { wrapper } = mountPart(designWithBatteryAndFuse(), 0)
    await flushPromises()
    for (const key of ['chemistry', 'nominalVoltageV', 'capacityAh', 'internalResistanceOhm', 'seriesCount', 'parallelCount']) {
      expect(wrapper.find(`[data-field="${key}"]`).exists(), key).toBe(true)
    }
    expect(wrapper.find('[data-field="capacityAh"]').text()).toContain('Ah')
    expect(wrapper.find('[data-field="internalResistanceOhm"]').text()).toContain('Ω')
  })

  it('shows a field error and leaves the Y.Doc unchanged on invalid input', async () => {
    const design = designWithBatteryAndFuse()
    const { wrapper, store } = mountPart(design, 0)
    const id = design.parts[0].id
    const before = yParams(store, id)

    await type(wrapper, 'capacityAh', 'lots')
    expect(wrapper.find('[data-field="capacityAh"]').text()).toContain('Enter a number')
    expect(yParams(store, id)).toEqual(before)

    // Below the schema's minimum: the message is the schema's own.
    await type(wrapper, 'capacityAh', '0')
    expect(wrapper.find('[data-field="capacityAh"]').text()).toContain('Capacity per battery must be at least 1 Ah')
    expect(yParams(store, id)).toEqual(before)

    // A whole-number field refuses a fraction.
    await type(wrapper, 'seriesCount', '1.5')
    expect(wrapper.find('[data-field="seriesCount"]').text()).toContain('must be a whole number')
    expect(yParams(store, id)).toEqual(before)
    expect(store.handle!.canUndo.value).toBe(false)
  })

  it('writes a valid entry into the Y.Doc as one undoable step', async () => {
    const design = designWithBatteryAndFuse()
    const { wrapper, store } = mountPart(design, 1)
    const id = design.parts[1].id
    expect(yParams(store, id).ratingA).toBe(15)

    await type(wrapper, 'ratingA', '30')
    expect(yParams(store, id).ratingA).toBe(30)
    expect(store.design!.parts[1].params).toMatchObject({ ratingA: 30 })
    expect(wrapper.find('[data-field="ratingA"]').text()).not.toContain('must')

    store.handle!.undo()
    await flushPromises()
    expect(yParams(store, id).ratingA).toBe(15)
    expect((wrapper.find('[data-field="ratingA"] input').element as HTMLInputElement).value).toBe('15')
  })
})

describe('conductor inspector', () => {
  it('shows lengths in feet for an imperial design and stores metres', async () => {
    const design = designWithBatteryAndFuse('imperial')
    const mounted = mountEditor(ConductorInspector, (store) => ({ conductor: store.design!.conductors[0] }), design)
    const store = mounted.store
    unmount = () => mounted.wrapper.unmount()
    const wrapper = mounted.wrapper
    expect(wrapper.find('[data-field="lengthM"]').text()).toContain('ft')
    // 1 m shown as 3.281 ft (1 ft = 0.3048 m exactly, NIST SP 811 B.8).
    expect((wrapper.find('[data-field="lengthM"] input').element as HTMLInputElement).value).toBe('3.281')

    await type(wrapper, 'lengthM', '10')
    const stored = (store.handle!.doc.getMap('conductors').get(design.conductors[0].id) as Y.Map<unknown>).get('lengthM') as number
    expect(stored).toBeCloseTo(3.048, 9)

    await type(wrapper, 'lengthM', '-2')
    expect(wrapper.find('[data-field="lengthM"]').text()).toContain('Length must be more than 0 m')
    expect((store.handle!.doc.getMap('conductors').get(design.conductors[0].id) as Y.Map<unknown>).get('lengthM')).toBeCloseTo(3.048, 9)
  })
})
