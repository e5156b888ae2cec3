// Conductor area conversions.
// A circular mil is the area of a circle one mil (0.001 in = 0.0254 mm) in diameter:
// 1 cmil = π/4 × (0.0254 mm)² = 5.067075e-4 mm² (ASTM B258 definition of the unit).

export const MM2_PER_CMIL = (Math.PI / 4) * 0.0254 * 0.0254

export function cmilToMm2(areaCmil: number): number {
  return areaCmil * MM2_PER_CMIL
}

export function mm2ToCmil(areaMm2: number): number {
  return areaMm2 / MM2_PER_CMIL
}

/** 1 kcmil = 1000 cmil (the NEC's name for sizes above 4/0). */
export function cmilToKcmil(areaCmil: number): number {
  return areaCmil / 1000
}
