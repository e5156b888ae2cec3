import type { ChartConfiguration, ChartDataset, Plugin } from 'chart.js'
import type { ChartMarker, ChartSeries } from '@shared/protection/timeCurrent'
import { drawableMarkers, drawableSeries, type TimeCurrentView } from './chartView'
import { STYLE } from './palette'

// The chart.js configuration of a time-current view: log–log axes (current in A across, time in s up),
// each band filled between its minimum-melting and maximum-clearing curves, the damage curve, vertical
// lines at the continuous and fault currents and a point at each start. Every series has a colour of
// our palette and a dash pattern, and the markers are also labelled on the plot, so a grey-scale print
// still tells them apart. Pure: no canvas here.

/** A point on the chart: x = current in A, y = time in s. */
export interface XY {
  x: number
  y: number
}

export type TcDataset = ChartDataset<'line', XY[]> & {
  /** Datasets of one legend entry (a band's two curves) share a group. */
  group: string
  /** Text written beside a marker on the plot. */
  markerText?: string
}

const decade = (v: number) => Math.abs(Math.log10(v) - Math.round(Math.log10(v))) < 1e-9

/** Decade tick text without exponents: 0.001, 0.1, 10, 1 000. */
export function decadeLabel(value: number): string {
  if (!(value > 0) || !decade(value)) return ''
  return value >= 1 ? Math.round(value).toLocaleString('en-GB').replace(/,/g, '\u2009') : String(Number(value.toPrecision(1)))
}

function bandDatasets(series: ChartSeries[], selectedId: string | undefined): TcDataset[] {
  const deviceIds = [...new Set(series.filter((s) => s.kind !== 'damage').map((s) => s.deviceId ?? s.id))]
  const upstreamIds = deviceIds.filter((id) => id !== selectedId)
  const out: TcDataset[] = []
  for (const id of deviceIds) {
    const style = id === selectedId ? STYLE.band : (STYLE.upstream[upstreamIds.indexOf(id)] ?? STYLE.upstream[STYLE.upstream.length - 1])
    const min = series.find((s) => s.deviceId === id && s.kind === 'min-melt')
    const max = series.find((s) => s.deviceId === id && s.kind === 'max-clear')
    const curve = (s: ChartSeries, fill: boolean): TcDataset => ({
      label: s.label,
      group: `band:${id}`,
      data: s.points.map((p) => ({ x: p.currentA, y: p.timeS })),
      borderColor: style.colour,
      backgroundColor: style.fill,
      borderDash: style.dash,
      borderWidth: style.width,
      pointRadius: 0,
      pointHitRadius: 6,
      pointStyle: 'line',
      tension: 0,
      // The band: the area between minimum melting (or opening) and maximum clearing.
      fill: fill ? '+1' : false,
    })
    if (min && max) out.push(curve(min, true), curve(max, false))
    else for (const s of [min, max]) if (s) out.push(curve(s, false))
  }
  return out
}

function markerDatasets(markers: ChartMarker[], timeS: readonly [number, number]): TcDataset[] {
  let faultIndex = 0
  return markers.map((m, i): TcDataset => {
    if (m.kind === 'start' && m.timeS !== undefined) {
      return {
        label: m.label, group: `marker:${i}`, markerText: m.label.replace(/:.*$/, ''),
        data: [{ x: m.currentA, y: m.timeS }],
        borderColor: STYLE.start.border, backgroundColor: STYLE.start.colour, borderWidth: 1.5,
        pointStyle: 'triangle', pointRadius: 8, pointHoverRadius: 9, showLine: false,
      }
    }
    const style = m.kind === 'continuous' ? STYLE.continuous : STYLE.fault[Math.min(faultIndex++, STYLE.fault.length - 1)]
    return {
      label: m.label, group: `marker:${i}`, markerText: m.label,
      data: [{ x: m.currentA, y: timeS[0] }, { x: m.currentA, y: timeS[1] }],
      borderColor: style.colour, backgroundColor: style.colour, borderDash: style.dash, borderWidth: style.width,
      pointRadius: 0, pointHitRadius: 4, pointStyle: 'line', fill: false,
    }
  })
}

/** All datasets in drawing order: bands, damage curve, markers. */
export function timeCurrentDatasets(view: TimeCurrentView): TcDataset[] {
  const series = drawableSeries(view)
  const damage = series.filter((s) => s.kind === 'damage').map((s): TcDataset => ({
    label: s.label, group: `damage:${s.id}`,
    data: s.points.map((p) => ({ x: p.currentA, y: p.timeS })),
    borderColor: STYLE.damage.colour, backgroundColor: STYLE.damage.colour, borderDash: STYLE.damage.dash, borderWidth: STYLE.damage.width,
    pointRadius: 0, pointHitRadius: 6, pointStyle: 'line', fill: false, tension: 0,
  }))
  return [...bandDatasets(series, view.deviceId), ...damage, ...markerDatasets(drawableMarkers(view), view.axes.timeS)]
}

/** One legend entry per group (a band's two curves share one, named "… band"). */
export function legendText(datasets: TcDataset[], index: number): string | null {
  const d = datasets[index]
  if (datasets.findIndex((x) => x.group === d.group) !== index) return null
  if (!d.group.startsWith('band:')) return d.label ?? ''
  const pair = datasets.filter((x) => x.group === d.group)
  return pair.length === 2 ? `${(d.label ?? '').replace(/:[^:]*$/, '')}: band, ${pair.map((x) => (x.label ?? '').replace(/^.*: /, '')).join(' to ')}` : (d.label ?? '')
}

/** Writes each marker's text beside it on the plot (rotated along the vertical lines). */
export const markerLabelPlugin: Plugin<'line'> = {
  id: 'tcMarkerLabels',
  afterDatasetsDraw(chart) {
    const { ctx, chartArea, scales } = chart
    chart.data.datasets.forEach((raw, i) => {
      const d = raw as TcDataset
      if (!d.markerText || !chart.isDatasetVisible(i)) return
      const first = d.data[0]
      const x = scales.x.getPixelForValue(first.x)
      if (!(x >= chartArea.left && x <= chartArea.right)) return
      ctx.save()
      ctx.font = '500 11px Roboto, sans-serif'
      ctx.fillStyle = (d.borderColor as string) ?? '#222'
      // A white halo keeps the text readable over grid lines and bands.
      ctx.strokeStyle = 'rgba(255, 255, 255, 0.92)'
      ctx.lineWidth = 4
      ctx.lineJoin = 'round'
      const write = (text: string, tx: number, ty: number) => (ctx.strokeText(text, tx, ty), ctx.fillText(text, tx, ty))
      if (d.data.length === 1) {
        const y = scales.y.getPixelForValue(first.y)
        ctx.textAlign = x > chartArea.right - 160 ? 'right' : 'left'
        write(d.markerText, x + (ctx.textAlign === 'right' ? -12 : 12), y - 8)
      } else {
        ctx.translate(x + 5, chartArea.top + 6)
        ctx.rotate(Math.PI / 2)
        ctx.textBaseline = 'bottom'
        write(d.markerText, 0, 0)
      }
      ctx.restore()
    })
  },
}

/** A white page behind the plot, so the exported PNG is not transparent. */
export const whiteBackgroundPlugin: Plugin<'line'> = {
  id: 'tcWhiteBackground',
  beforeDraw(chart) {
    const { ctx, width, height } = chart
    ctx.save()
    ctx.fillStyle = '#ffffff'
    ctx.fillRect(0, 0, width, height)
    ctx.restore()
  },
}

export function timeCurrentConfig(view: TimeCurrentView, options: { footer?: string[] } = {}): ChartConfiguration<'line', XY[]> {
  const datasets = timeCurrentDatasets(view)
  const axisTitle = (text: string) => ({ display: true, text, font: { size: 13, weight: 500 as const }, color: '#222' })
  const grid = { color: (ctx: { tick?: { value: number } }) => (ctx.tick && decade(ctx.tick.value) ? 'rgba(0,0,0,0.28)' : 'rgba(0,0,0,0.07)') }
  return {
    type: 'line',
    data: { datasets },
    plugins: [whiteBackgroundPlugin, markerLabelPlugin],
    options: {
      animation: false,
      responsive: true,
      maintainAspectRatio: false,
      parsing: false,
      interaction: { mode: 'nearest', intersect: false },
      scales: {
        x: {
          type: 'logarithmic', min: view.axes.currentA[0], max: view.axes.currentA[1],
          title: axisTitle('Current (A)'), grid, ticks: { callback: (v) => decadeLabel(Number(v)), autoSkip: false, maxRotation: 0, color: '#333' },
        },
        y: {
          type: 'logarithmic', min: view.axes.timeS[0], max: view.axes.timeS[1],
          title: axisTitle('Time (s)'), grid, ticks: { callback: (v) => decadeLabel(Number(v)), autoSkip: false, color: '#333' },
        },
      },
      plugins: {
        title: { display: true, text: `Time-current: ${view.title}`, font: { size: 15, weight: 500 }, color: '#222' },
        // The sources and the caution, printed into the exported PNG only (the page shows them below).
        subtitle: { display: false, text: options.footer ?? [], position: 'bottom', align: 'start', font: { size: 10 }, color: '#444', padding: { top: 8 } },
        legend: {
          position: 'bottom',
          labels: {
            usePointStyle: true, pointStyleWidth: 40, color: '#222', font: { size: 12 },
            filter: (item, data) => legendText(data.datasets as TcDataset[], item.datasetIndex ?? 0) !== null,
            generateLabels(chart) {
              const all = chart.data.datasets as TcDataset[]
              return all.map((d, i) => ({
                text: legendText(all, i) ?? '', datasetIndex: i, hidden: !chart.isDatasetVisible(i),
                strokeStyle: d.borderColor as string, fillStyle: d.backgroundColor as string, lineWidth: Number(d.borderWidth ?? 1),
                lineDash: (d.borderDash as number[] | undefined) ?? [], pointStyle: (d.pointStyle as 'line' | 'triangle') ?? 'line', fontColor: '#222',
              }))
            },
          },
          // A band's two curves show and hide together.
          onClick(_event, item, legend) {
            const chart = legend.chart
            const all = chart.data.datasets as TcDataset[]
            const group = all[item.datasetIndex ?? 0]?.group
            const visible = chart.isDatasetVisible(item.datasetIndex ?? 0)
            all.forEach((d, i) => d.group === group && chart.setDatasetVisibility(i, !visible))
            chart.update()
          },
        },
        tooltip: {
          callbacks: {
            label: (ctx) => {
              const p = ctx.raw as XY
              const d = ctx.dataset as TcDataset
              if (d.markerText && d.data.length === 2) return `${d.label}`
              return `${d.label}: ${formatPlain(p.x)} A, ${formatPlain(p.y)} s`
            },
          },
        },
      },
    },
  }
}

/** Three significant figures, never NaN on screen. */
export function formatPlain(value: unknown): string {
  return typeof value === 'number' && Number.isFinite(value) ? String(Number(value.toPrecision(3))) : '—'
}
