import { describe, expect, it } from 'vitest'
import { DEVICE_FAMILY_IDS, standardRatingsA, type DeviceFamilyId } from '@shared/protection/ratings'
import { TIME_CURRENT_FAMILIES } from '@shared/protection/timeCurrent'
import type { CurvePoint } from '@shared/protection/timeCurrent'

// Every anchor point of every time-current band, at every catalogued rating, against the figures the
// team verified (standards.md §5, written out here by hand, not read from the module):
// a point that is one of those figures carries the standing and names the source it was verified in;
// every other point says plainly that it is recalled and unverified, common practice, or computed.

interface Verified {
  families: string[]
  curve: 'minMelt' | 'maxClear'
  multiple: number
  /** Time in s at this rating. */
  timeS: (ratingA: number) => number
  status: 'verified' | 'two-sources'
  source: RegExp
}

const UL_248_14 = /UL 248-14 .*as published in a fuse maker's guide to the standard/
const SHEET_5 = /IEC 60127-2 standard sheet 5 .*two makers' datasheets/
const SIX_32 = ['cartridge-6x32-fast', 'cartridge-6x32-delay']
const SHEET_5_FAMILY = ['cartridge-5x20-delay']
const small = (ratingA: number) => ratingA <= 3.15

const VERIFIED: Verified[] = [
  // UL 248-14 [V]: opens at 135 % within 1 h; at 200 % within 2 min (0–30 A) or 4 min (35–60 A).
  { families: SIX_32, curve: 'maxClear', multiple: 1.35, timeS: () => 3600, status: 'verified', source: UL_248_14 },
  { families: SIX_32, curve: 'maxClear', multiple: 2, timeS: (r) => (r <= 30 ? 120 : 240), status: 'verified', source: UL_248_14 },
  // IEC 60127-2 sheet 5 [V2], datasheets A and B; where they differ the looser bound is the point.
  { families: SHEET_5_FAMILY, curve: 'minMelt', multiple: 1.5, timeS: (r) => (r <= 6.3 ? 3600 : r <= 10 ? 1800 : 900), status: 'two-sources', source: SHEET_5 },
  { families: SHEET_5_FAMILY, curve: 'maxClear', multiple: 2.1, timeS: () => 1800, status: 'two-sources', source: SHEET_5 },
  { families: SHEET_5_FAMILY, curve: 'minMelt', multiple: 2.75, timeS: () => 0.75, status: 'two-sources', source: SHEET_5 },
  { families: SHEET_5_FAMILY, curve: 'maxClear', multiple: 2.75, timeS: () => 80, status: 'two-sources', source: SHEET_5 },
  { families: SHEET_5_FAMILY, curve: 'minMelt', multiple: 4, timeS: (r) => (small(r) ? 0.095 : 0.15), status: 'two-sources', source: SHEET_5 },
  { families: SHEET_5_FAMILY, curve: 'maxClear', multiple: 4, timeS: () => 5, status: 'two-sources', source: SHEET_5 },
  { families: SHEET_5_FAMILY, curve: 'minMelt', multiple: 10, timeS: (r) => (small(r) ? 0.01 : 0.02), status: 'two-sources', source: SHEET_5 },
  { families: SHEET_5_FAMILY, curve: 'maxClear', multiple: 10, timeS: () => 0.15, status: 'two-sources', source: SHEET_5 },
]

function ratingsOf(familyId: string): readonly number[] {
  return (DEVICE_FAMILY_IDS as readonly string[]).includes(familyId) ? standardRatingsA(familyId as DeviceFamilyId) : [10]
}

function standingProblem(point: { source: string; status: string }): string | null {
  switch (point.status) {
    case 'recalled':
      return point.source.includes('recalled, unverified') ? null : 'a recalled figure must say "recalled, unverified"'
    case 'common-practice':
      return /^Common practice: /.test(point.source) ? null : 'a rule of thumb must start "Common practice: "'
    case 'computed':
      return /computed/.test(point.source) ? null : 'a computed figure must say so'
    default:
      return `"${point.status}" without a verified figure behind it`
  }
}

describe('time-current band points: verified figures name their source, the rest are marked', () => {
  for (const family of TIME_CURRENT_FAMILIES) {
    it(family.familyId, () => {
      const problems: string[] = []
      for (const ratingA of ratingsOf(family.familyId)) {
        const band = family.bandAt(ratingA)
        for (const curve of ['minMelt', 'maxClear'] as const) {
          for (const p of band[curve] as CurvePoint[]) {
            const where = `${ratingA} A ${curve} ${p.multiple} In ${p.timeS} s`
            const figure = VERIFIED.find((v) => v.families.includes(family.familyId) && v.curve === curve && v.multiple === p.multiple && v.timeS(ratingA) === p.timeS)
            if (figure) {
              if (p.status !== figure.status) problems.push(`${where}: status ${p.status}, the figure is ${figure.status}`)
              if (!figure.source.test(p.source)) problems.push(`${where}: source "${p.source}" does not name ${figure.source}`)
            } else {
              const problem = standingProblem(p)
              if (problem) problems.push(`${where}: ${problem} ("${p.source}")`)
            }
          }
        }
        for (const extra of [band.floor, band.instantaneous]) {
          const problem = extra ? standingProblem(extra) : null
          if (problem) problems.push(`${ratingA} A ${extra === band.floor ? 'floor' : 'magnetic trip'}: ${problem}`)
        }
      }
      expect(problems).toEqual([])
    })
  }

  it('every verified figure of a family is used at every rating it applies to', () => {
    const missing: string[] = []
    for (const v of VERIFIED) {
      for (const familyId of v.families) {
        const family = TIME_CURRENT_FAMILIES.find((f) => f.familyId === familyId)!
        for (const ratingA of ratingsOf(familyId)) {
          const points = family.bandAt(ratingA)[v.curve]
          if (!points.some((p) => p.multiple === v.multiple && p.timeS === v.timeS(ratingA))) missing.push(`${familyId} ${ratingA} A ${v.curve} ${v.multiple} In`)
        }
      }
    }
    expect(missing).toEqual([])
  })
})
