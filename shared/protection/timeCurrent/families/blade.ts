import type { BandDefinition, FamilyTimeCurrent } from '../types'
import { CARRY_TIME_S, point } from './_point'

// Blade fuse-links, ISO 8820-3 types F (mini), C (regular) and E (large); SAE J1284 is the US equivalent.
// The opening-time table of ISO 8820-3 was not found in a public copy: the points below are recalled
// (reference notes §5, tag [M]) and are loose bounds only. One point is common practice, see below.
const ISO_8820_3 = 'ISO 8820-3 opening-time table (recalled, unverified: loose bounds)'
const PRACTICE_15X = 'Common practice: a blade fuse withstands about 15 × its rating for about 10 ms'
const PRACTICE_125 =
  'Common practice: a blade fuse carries 125 % of its rating (the basis of sizing at 125 % of the continuous load)'

function bladeBand(): BandDefinition {
  return {
    kind: 'fuse',
    timeDelay: false,
    minMelt: [
      point(1.1, CARRY_TIME_S, `${ISO_8820_3}: 110 % ≥ 100 h`, 'recalled'),
      // The table has no point between 110 % and 135 %; a straight log–log line from 100 h to the 0.75 s
      // bound at 135 % would claim the fuse may open at 125 % within minutes, which the trade does not see.
      point(1.25, 3600, PRACTICE_125, 'common-practice'),
      point(1.35, 0.75, `${ISO_8820_3}: 135 % min 0.75 s`, 'recalled'),
      point(2, 0.15, `${ISO_8820_3}: 200 % min 0.15 s`, 'recalled'),
      point(3.5, 0.08, `${ISO_8820_3}: 350 % min 0.08 s`, 'recalled'),
      point(6, 0.04, `${ISO_8820_3}: 600 % min 0.04 s`, 'recalled'),
      // The table stops at 600 %; the adiabatic extension from there (6 ms at 15 ×) is shorter than
      // the inrush pulse blade fuses are known to ride through.
      point(15, 0.01, PRACTICE_15X, 'common-practice'),
    ],
    maxClear: [
      point(1.35, 600, `${ISO_8820_3}: 135 % max 600 s`, 'recalled'),
      point(2, 5, `${ISO_8820_3}: 200 % max 5 s`, 'recalled'),
      // The table gives 0.25–0.5 s; the slower end is kept so fault-clearing checks stay on the safe side.
      point(3.5, 0.5, `${ISO_8820_3}: 350 % max 0.25–0.5 s (slower end)`, 'recalled'),
      point(6, 0.1, `${ISO_8820_3}: 600 % max 0.1 s`, 'recalled'),
    ],
    source: `${ISO_8820_3} with two common-practice points (125 %, 15 ×); beyond the last point extended at constant I²t (adiabatic element, computed)`,
  }
}

export const BLADE_FAMILIES: FamilyTimeCurrent[] = [
  { familyId: 'blade-mini', label: 'Blade fuse, mini size (ISO 8820-3 type F)', bandAt: bladeBand },
  { familyId: 'blade-regular', label: 'Blade fuse, regular size (ISO 8820-3 type C)', bandAt: bladeBand },
  { familyId: 'blade-large', label: 'Blade fuse, large size (ISO 8820-3 type E)', bandAt: bladeBand },
]
