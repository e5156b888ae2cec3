import type { ConductorSizeId } from './sizes'

// IEC 60228 (conductors of insulated cables), Tables of maximum DC resistance at 20 °C, copper, Ω/km.
// Class 2 = stranded (Table 2), class 5 = flexible (Table 3). Typed from standards.md §3 [V2]:
// kabelmetal-indonesia.com (Tables A.1/A.2), a connector catalogue reprinting IEC 60228:2004,
// uecables.com IEC 60228 page. These are maximum values: real cable is at or below them, so using them
// for voltage drop is the conservative choice.

export interface Iec60228Row {
  class2PlainOhmPerKm: number
  class2MetalCoatedOhmPerKm: number
  class5PlainOhmPerKm: number
  class5TinnedOhmPerKm: number
}

export const IEC_60228_MAX_RESISTANCE_20C: Readonly<Partial<Record<ConductorSizeId, Iec60228Row>>> = {
  //          class 2 plain, coated, class 5 plain, tinned
  'mm2-0.75': row(24.5, 24.8, 26.0, 26.7),
  'mm2-1': row(18.1, 18.2, 19.5, 20.0),
  'mm2-1.5': row(12.1, 12.2, 13.3, 13.7),
  'mm2-2.5': row(7.41, 7.56, 7.98, 8.21),
  'mm2-4': row(4.61, 4.7, 4.95, 5.09),
  'mm2-6': row(3.08, 3.11, 3.3, 3.39),
  'mm2-10': row(1.83, 1.84, 1.91, 1.95),
  'mm2-16': row(1.15, 1.16, 1.21, 1.24),
  'mm2-25': row(0.727, 0.734, 0.78, 0.795),
  'mm2-35': row(0.524, 0.529, 0.554, 0.565),
  'mm2-50': row(0.387, 0.391, 0.386, 0.393),
  'mm2-70': row(0.268, 0.27, 0.272, 0.277),
  'mm2-95': row(0.193, 0.195, 0.206, 0.21),
  'mm2-120': row(0.153, 0.154, 0.161, 0.164),
}

function row(
  class2PlainOhmPerKm: number,
  class2MetalCoatedOhmPerKm: number,
  class5PlainOhmPerKm: number,
  class5TinnedOhmPerKm: number,
): Iec60228Row {
  return { class2PlainOhmPerKm, class2MetalCoatedOhmPerKm, class5PlainOhmPerKm, class5TinnedOhmPerKm }
}
