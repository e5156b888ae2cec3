// @vitest-environment happy-dom
// The bottom panel's schedules on a generated design of 500 parts: only the rows in view are drawn
// (virtual rows), headers still sort the whole list, a click selects the row's conductor or part and
// asks the drawing to centre on it, and in-place edits land in the Y.Doc (refused ones do not).
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import type * as Y from 'yjs'
import { afterEach, describe, expect, it } from 'vitest'
import ConductorSchedule from '@/components/editor/ConductorSchedule.vue'
import DeviceSchedule from '@/components/editor/DeviceSchedule.vue'
import { generatedDesign } from '../../helpers/generatedDesign'
import { mountEditor } from './mountEditor'

let unmount: (() => void) | undefined
afterEach(() => {
  unmount?.()
  document.body.innerHTML = ''
})

async function mountSchedule(component: typeof ConductorSchedule | typeof DeviceSchedule) {
  const design = generatedDesign(500)
  const mounted = mountEditor(component, () => ({}), design)
  unmount = () => mounted.wrapper.unmount()
  await flushPromises()
  return { ...mounted, design }
}

const dataRows = (wrapper: VueWrapper) => wrapper.findAll('tbody tr[data-row-id]')
const rowIds = (wrapper: VueWrapper) => dataRows(wrapper).map((row) => row.attributes('data-row-id'))

async function type(input: HTMLInputElement, text: string) {
  input.value = text
  input.dispatchEvent(new Event('input', { bubbles: true }))
  input.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }))
  await flushPromises()
}

// Mounting 500 parts' rows in happy-dom on a shared 2-core machine can take seconds: a roomy budget.
describe('conductor schedule on a 500-part design', { timeout: 30_000 }, () => {
  it('draws only the rows in view, and sorting by length reorders the whole list', async () => {
    const { wrapper, design } = await mountSchedule(ConductorSchedule)
    expect(design.parts.length).toBeGreaterThanOrEqual(480)
    const drawn = dataRows(wrapper).length
    expect(drawn).toBeGreaterThan(0)
    expect(drawn).toBeLessThan(design.conductors.length / 4)

    // Ascending by length: the first rows drawn are the shortest conductors of the whole design.
    const shortestM = Math.min(...design.conductors.map((c) => c.lengthM))
    await wrapper.findAll('thead th').find((th) => th.text().includes('Length'))!.trigger('click')
    await flushPromises()
    const firstId = rowIds(wrapper)[0]
    expect(design.conductors.find((c) => c.id === firstId)!.lengthM).toBe(shortestM)
    // Descending: the longest comes first.
    await wrapper.findAll('thead th').find((th) => th.text().includes('Length'))!.trigger('click')
    await flushPromises()
    const longestM = Math.max(...design.conductors.map((c) => c.lengthM))
    expect(design.conductors.find((c) => c.id === rowIds(wrapper)[0])!.lengthM).toBe(longestM)
  })

  it('selects a clicked conductor, asks the drawing to centre on it and marks the row', async () => {
    const { wrapper, store } = await mountSchedule(ConductorSchedule)
    const focusBefore = store.focusRequest
    const row = dataRows(wrapper)[2]
    const id = row.attributes('data-row-id')!
    await row.trigger('click')
    await flushPromises()
    expect(store.selection.conductorIds).toEqual([id])
    expect(store.focusRequest).toBe(focusBefore + 1)
    expect(wrapper.find(`tr[data-row-id="${id}"]`).classes()).toContain('schedule-table__row--selected')
  })

  it('edits a length in place; an out-of-range length shows its message and is not stored', async () => {
    const { wrapper, store } = await mountSchedule(ConductorSchedule)
    const id = rowIds(wrapper)[0]!
    const yLength = () => (store.handle!.doc.getMap('conductors').get(id) as Y.Map<unknown>).get('lengthM')
    const before = yLength()
    const input = () => wrapper.find(`tr[data-row-id="${id}"] [data-field="lengthM"] input`).element as HTMLInputElement
    await type(input(), '900')
    // conductorSchema: lengthM at most 500 m.
    expect(wrapper.find(`tr[data-row-id="${id}"]`).text()).toContain('Length must be at most 500 m')
    expect(yLength()).toBe(before)
    await type(input(), '3.5')
    expect(yLength()).toBe(3.5)
    // The edit's click does not select the row.
    expect(store.selection.conductorIds).toEqual([])
  })
})

describe('device schedule on a 500-part design', { timeout: 30_000 }, () => {
  it('draws only the rows in view, edits a rating in place and selects the clicked device', async () => {
    const { wrapper, store, design } = await mountSchedule(DeviceSchedule)
    const devices = design.parts.filter((p) => p.type === 'fuse').length
    expect(dataRows(wrapper).length).toBeLessThan(devices / 4)
    const id = rowIds(wrapper)[1]!
    const yRating = () => ((store.handle!.doc.getMap('parts').get(id) as Y.Map<unknown>).get('params') as Y.Map<unknown>).get('ratingA')
    await type(wrapper.find(`tr[data-row-id="${id}"] [data-field="ratingA"] input`).element as HTMLInputElement, '15')
    expect(yRating()).toBe(15)
    await wrapper.find(`tr[data-row-id="${id}"]`).trigger('click')
    expect(store.selection.partIds).toEqual([id])
  })
})
