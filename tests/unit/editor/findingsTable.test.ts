// @vitest-environment happy-dom
// The findings table: errors first by default, sortable by other columns, a row click asks to
// select the finding's parts, and "Apply" hands back the suggestion's patch unchanged.
import { flushPromises, mount } from '@vue/test-utils'
import { defineComponent, h } from 'vue'
import { VApp } from 'vuetify/components'
import { afterEach, describe, expect, it } from 'vitest'
import FindingsTable from '@/components/editor/FindingsTable.vue'
import type { Finding } from '@/components/editor/model/analysisTypes'
import { createAmpwrightVuetify } from '@/plugins/vuetify'

// Hand-written findings of an invented 24 V system (values chosen for the ordering, not computed).
const findings: Finding[] = [
  {
    id: 'drop:w3', ruleId: 'voltage-drop', severity: 'warning', title: 'Voltage drop above 3 %', message: 'Fridge feed drops 4.2 %.',
    partIds: ['load-fridge'], conductorIds: ['w3'], measured: { value: 4.2, unit: '%' }, limit: { value: 3, unit: '%' },
    source: 'ABYC E-11 Table X (critical 3 %)', suggestion: { text: 'Use 10 mm²', patch: { kind: 'conductor', id: 'w3', field: 'sizeId', value: 'mm2-10' } },
  },
  {
    id: 'rating:fuse-1', ruleId: 'device-below-load', severity: 'error', title: 'Device will open under normal load', message: 'Fuse 1 (15 A) carries 20 A.',
    partIds: ['fuse-1'], conductorIds: [], measured: { value: 20, unit: 'A' }, limit: { value: 15, unit: 'A' },
    source: 'Common practice: 125 % of the continuous current', suggestion: { text: 'Use a 25 A device', patch: { kind: 'part', id: 'fuse-1', field: 'params.ratingA', value: 25 } },
  },
  {
    id: 'unconnected:shunt-1', ruleId: 'part-not-connected', severity: 'info', title: 'Terminal not connected', message: 'Shunt 1 system terminal is free.',
    partIds: ['shunt-1'], conductorIds: [], source: 'Circuit model; common practice',
  },
]
const names: Record<string, string> = { 'load-fridge': 'Fridge', w3: 'conductor W3', 'fuse-1': 'Fuse 1', 'shunt-1': 'Shunt 1' }

let unmount: (() => void) | undefined
afterEach(() => {
  unmount?.()
  document.body.innerHTML = ''
})

function mountTable(canApply = true, selectedIds: string[] = []) {
  const Host = defineComponent({
    setup: () => () =>
      h(VApp, null, { default: () => h(FindingsTable, { findings, nameOf: (id: string) => names[id] ?? id, canApply, selectedIds }) }),
  })
  const wrapper = mount(Host, { attachTo: document.body, global: { plugins: [createAmpwrightVuetify()] } })
  unmount = () => wrapper.unmount()
  return { wrapper, table: wrapper.findComponent(FindingsTable) }
}

const titles = (wrapper: ReturnType<typeof mountTable>['wrapper']) =>
  wrapper.findAll('tbody tr[data-row-id]').map((row) => row.find('.findings-table__title').text())

describe('findings table', () => {
  it('lists errors first, then warnings, then notes, with measured against limit', async () => {
    const { wrapper } = mountTable()
    await flushPromises()
    expect(titles(wrapper)).toEqual(['Device will open under normal load', 'Voltage drop above 3 %', 'Terminal not connected'])
    const firstRow = wrapper.findAll('tbody tr[data-row-id]')[0].text()
    expect(firstRow).toContain('Fuse 1')
    expect(firstRow).toContain('20.0\u00a0A / 15.0\u00a0A')
    // A finding without figures shows dashes, never "undefined" or "NaN".
    const lastRow = wrapper.findAll('tbody tr[data-row-id]')[2].text()
    expect(lastRow).toContain('— / —')
    expect(wrapper.text()).not.toMatch(/undefined|NaN/)
  })

  it('sorts by another column when its header is clicked', async () => {
    const { wrapper } = mountTable()
    await flushPromises()
    const header = wrapper.findAll('thead th').find((th) => th.text().includes('Finding'))!
    await header.trigger('click')
    await flushPromises()
    expect(titles(wrapper)).toEqual(['Device will open under normal load', 'Terminal not connected', 'Voltage drop above 3 %'])
    await header.trigger('click')
    await flushPromises()
    expect(titles(wrapper)).toEqual(['Voltage drop above 3 %', 'Terminal not connected', 'Device will open under normal load'])
  })

  it('marks the findings it is told are selected, and only those', async () => {
    const { wrapper } = mountTable(true, ['drop:w3'])
    await flushPromises()
    const marked = wrapper.findAll('tbody tr.schedule-table__row--selected').map((row) => row.attributes('data-row-id'))
    expect(marked).toEqual(['drop:w3'])
  })

  it('asks to select the parts of a clicked finding', async () => {
    const { wrapper, table } = mountTable()
    await flushPromises()
    await wrapper.findAll('tbody tr[data-row-id]')[1].trigger('click')
    expect(table.emitted('select')).toEqual([[findings[0]]])
  })

  it('hands back the patch of an applied suggestion, and offers no Apply without a patch or a right to edit', async () => {
    const { wrapper, table } = mountTable()
    await flushPromises()
    const applyButtons = wrapper.findAll('.findings-table__apply')
    expect(applyButtons).toHaveLength(2)
    await applyButtons[0].trigger('click')
    expect(table.emitted('apply')?.[0]).toEqual([{ kind: 'part', id: 'fuse-1', field: 'params.ratingA', value: 25 }, findings[1]])
    // The button's click does not also select the row.
    expect(table.emitted('select')).toBeUndefined()
    unmount?.()

    const readOnly = mountTable(false)
    await flushPromises()
    expect(readOnly.wrapper.findAll('.findings-table__apply')).toHaveLength(0)
  })

  it('says the design is being analysed, not that it has no findings, while an empty list waits for a result', async () => {
    for (const [analysing, text] of [[true, 'Analysing the design…'], [false, 'No findings for this design.']] as const) {
      const Host = defineComponent({
        setup: () => () => h(VApp, null, { default: () => h(FindingsTable, { findings: [], nameOf: (id: string) => id, canApply: true, analysing }) }),
      })
      const wrapper = mount(Host, { attachTo: document.body, global: { plugins: [createAmpwrightVuetify()] } })
      await flushPromises()
      expect(wrapper.find('tbody').text()).toContain(text)
      wrapper.unmount()
    }
  })
})
