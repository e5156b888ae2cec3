// Length conversions. 1 ft = 0.3048 m exactly (international foot, 1959 agreement; NIST SP 811 B.8).

export const METRES_PER_FOOT = 0.3048

export function mToFt(lengthM: number): number {
  return lengthM / METRES_PER_FOOT
}

export function ftToM(lengthFt: number): number {
  return lengthFt * METRES_PER_FOOT
}
