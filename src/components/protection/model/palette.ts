// Colours (from our theme, src/plugins/theme.ts) and dash patterns of the time-current chart. Each
// kind of line differs in dash pattern as well as colour, so a grey-scale print keeps them apart.

export interface LineStyle {
  colour: string
  fill?: string
  dash: number[]
  width: number
}

export const STYLE = {
  /** The selected device: solid lines, filled band. */
  band: { colour: '#1E5A7E', fill: 'rgba(30, 90, 126, 0.22)', dash: [], width: 2 } as LineStyle,
  /** Devices upstream, nearest first: dashed, lighter fill. */
  upstream: [
    { colour: '#A85A1C', fill: 'rgba(168, 90, 28, 0.10)', dash: [10, 5], width: 1.8 },
    { colour: '#5B4A8A', fill: 'rgba(91, 74, 138, 0.08)', dash: [3, 4], width: 1.8 },
  ] as LineStyle[],
  /** Conductor insulation damage: dash-dot, heavier. */
  damage: { colour: '#B3261E', dash: [12, 4, 3, 4], width: 2.5 } as LineStyle,
  /** Continuous current: dotted. */
  continuous: { colour: '#2D7A4B', dash: [2, 4], width: 2 } as LineStyle,
  /** Prospective fault currents (at the device, then at the far end): dash-dot-dot, then solid. */
  fault: [
    { colour: '#3C4650', dash: [14, 4, 2, 4, 2, 4], width: 2 },
    { colour: '#3C4650', dash: [], width: 1.6 },
  ] as LineStyle[],
  /** A start pulse: a filled triangle with a dark outline. */
  start: { colour: '#2B7A78', border: '#102826' },
} as const
