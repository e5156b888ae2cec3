import { describe, expect, it } from 'vitest'
import { datasheetBand } from '@shared/protection/timeCurrent'

// An invented 20 A datasheet (our own numbers): the band must pass through every point it was given,
// interpolate on log–log axes between them, and reject points that cannot describe a real device.
const input = {
  id: 'custom-20',
  ratingA: 20,
  minMelt: [
    { currentA: 30, timeS: 1000 },
    { currentA: 60, timeS: 10 },
    { currentA: 200, timeS: 0.01 },
  ],
  maxClear: [
    { currentA: 40, timeS: 1000 },
    { currentA: 100, timeS: 10 },
    { currentA: 400, timeS: 0.01 },
  ],
  source: 'invented test datasheet',
}

describe('datasheetBand', () => {
  it('passes through every given point and carries the source', () => {
    const result = datasheetBand(input)
    expect(result.ok).toBe(true)
    if (!result.ok) return
    for (const p of input.minMelt) expect(result.band.minMeltS(p.currentA)).toBe(p.timeS)
    for (const p of input.maxClear) expect(result.band.maxClearS(p.currentA)).toBe(p.timeS)
    // Log-midpoint of (30 A, 1000 s) and (60 A, 10 s): √(30·60) = 42.43 A → √(1000·10) = 100 s.
    expect(result.band.minMeltS(Math.sqrt(30 * 60))).toBeCloseTo(100, 9)
    expect(result.band.points.anchors.every((a) => a.status === 'datasheet')).toBe(true)
    expect(result.band.source).toMatch(/invented test datasheet/)
  })
  it('reports each bad field with its path, never throws', () => {
    const result = datasheetBand({
      ...input,
      ratingA: Number.NaN,
      source: ' ',
      minMelt: [{ currentA: 30, timeS: 10 }, { currentA: 20, timeS: 1 }],
      maxClear: [{ currentA: 40, timeS: -1 }],
    })
    expect(result.ok).toBe(false)
    if (result.ok) return
    expect(result.issues.map((i) => i.path).sort()).toEqual(['maxClear', 'minMelt.1.currentA', 'ratingA', 'source'])
  })
  it('rejects time rising with current, and minimum melting after maximum clearing', () => {
    const rising = datasheetBand({ ...input, maxClear: [{ currentA: 40, timeS: 1 }, { currentA: 80, timeS: 5 }] })
    expect(rising.ok).toBe(false)
    if (!rising.ok) expect(rising.issues[0].path).toBe('maxClear.1.timeS')
    const crossed = datasheetBand({ ...input, maxClear: [{ currentA: 40, timeS: 10 }, { currentA: 400, timeS: 0.001 }] })
    expect(crossed.ok).toBe(false)
    if (!crossed.ok) expect(crossed.issues[0].message).toMatch(/Minimum melting time is after maximum clearing/)
  })
})
