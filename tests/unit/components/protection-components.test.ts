// @vitest-environment happy-dom
// The chart component's empty state and the device form's checks in the DOM (happy-dom has no canvas
// drawing: the plot itself is checked in tests/browser/protection-chart.test.ts).
import { flushPromises } from '@vue/test-utils'
import { afterEach, describe, expect, it } from 'vitest'
import TimeCurrentChart from '@/components/protection/TimeCurrentChart.vue'
import DeviceForm from '@/components/protection/DeviceForm.vue'
import type { CustomDevice } from '@shared/api/devices.schemas'
import { mountWithVuetify } from './mountWithVuetify'

afterEach(() => {
  document.body.innerHTML = ''
})

const settle = async () => {
  await flushPromises()
  await new Promise((resolve) => setTimeout(resolve, 0))
  await flushPromises()
}

describe('TimeCurrentChart', () => {
  it('shows the reason and the caution, never a blank plot, when there is no band', async () => {
    const { wrapper } = mountWithVuetify(TimeCurrentChart, { props: { view: null, emptyText: 'No time-current band is on file for this family.' } })
    await settle()
    expect(wrapper.find('[data-test="chart-empty"]').text()).toBe('No time-current band is on file for this family.')
    expect(wrapper.find('canvas').exists()).toBe(false)
    expect(wrapper.text()).toContain('the authority having jurisdiction')
  })
})

describe('DeviceForm', () => {
  // An invented 20 A fuse whose second point's current does not rise (datasheetBand's check).
  const device: CustomDevice = {
    id: '00000000-0000-4000-8000-000000000001', name: 'Bench fuse 20 A', kind: 'fuse', ratingA: 20, dcVoltageRatingV: null,
    interruptingRatingA: null, ignitionProtected: false, timeDelay: false, source: 'invented',
    points: [{ currentA: 27, minMeltS: 120, maxClearS: 1800 }, { currentA: 40, minMeltS: 0.8, maxClearS: 5 }],
    createdBy: null, createdAt: '2026-01-01T00:00:00.000Z', updatedAt: '2026-01-01T00:00:00.000Z',
  }

  it('fills the points table from the device (multiples shown in amperes) and marks a bad cell on save', async () => {
    const { wrapper } = mountWithVuetify(DeviceForm, { props: { device: { ...device, points: [{ multiple: 1.35, minMeltS: 120, maxClearS: 1800 }, device.points[1]] } } })
    await settle()
    const inputs = wrapper.findAll('[data-test="points-table"] tbody input')
    expect(inputs.map((i) => (i.element as HTMLInputElement).value)).toEqual(['27', '120', '1800', '40', '0.8', '5'])
    await inputs[3].setValue('25')
    await wrapper.find('form').trigger('submit')
    await settle()
    expect(wrapper.text()).toContain('Currents must rise from one point to the next')
    expect(wrapper.text()).not.toMatch(/NaN|undefined/)
  })
})
