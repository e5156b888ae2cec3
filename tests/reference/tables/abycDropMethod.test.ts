// Voltage-drop sizing against the ABYC method, an independent formula (standards.md §4 [V], a chandlery's
// technical note): CM = K × I × L / E, K = 10.75 Ω·cmil/ft (copper), L = round-trip length in ft, E = the
// allowed drop in volts; choose the smallest conductor whose area is at least CM.
import { describe, expect, it } from 'vitest'
import { smallestSizeForDrop } from '@shared/conductors/voltageDrop'
import { getConductorSize, sizesInOrder } from '@shared/conductors/sizes'

const K_ABYC = 10.75

function abycRequiredCmil(currentA: number, oneWayM: number, nominalV: number, percent: number): number {
  const roundTripFt = (2 * oneWayM) / 0.3048
  return (K_ABYC * currentA * roundTripFt) / ((nominalV * percent) / 100)
}

describe('ABYC CM = K·I·L/E method', () => {
  it('[C] K = 10.75 Ω·cmil/ft is annealed copper at about 29 °C: 10.371 × (1 + 0.00393 (T − 20))', () => {
    const rho20CmilFt = (1 / 58 / 5.067075e-4) * 0.3048 // Ω·mm²/m → Ω·cmil/ft
    const t = 20 + (K_ABYC / rho20CmilFt - 1) / 0.00393
    expect(t).toBeGreaterThan(28.5)
    expect(t).toBeLessThan(30)
  })

  const cases: [number, number, number, number][] = []
  for (const currentA of [5, 10, 20, 40, 80, 150])
    for (const oneWayM of [1, 3, 6, 10])
      for (const nominalV of [12, 24])
        for (const percent of [3, 10]) cases.push([currentA, oneWayM, nominalV, percent])

  it.each(cases)('%i A, %f m one-way, %i V, %i %%: never smaller than the ABYC choice, at most one size larger', (currentA, oneWayM, nominalV, percent) => {
    const cm = abycRequiredCmil(currentA, oneWayM, nominalV, percent)
    const abyc = sizesInOrder('awg').find((s) => s.areaCmil >= cm) ?? null
    // ours: copper at 30 °C (the marine default), stranded (lay factor 1.02)
    const ours = smallestSizeForDrop({ currentA, lengthM: oneWayM, temperatureC: 30, nominalV, allowedDropPercent: percent, material: 'copper', system: 'awg' })
    if (abyc === null) {
      expect(ours).toBeNull()
      return
    }
    expect(ours).not.toBeNull()
    const rank = getConductorSize(ours!.sizeId).rank
    expect(rank).toBeGreaterThanOrEqual(abyc.rank)
    expect(rank).toBeLessThanOrEqual(abyc.rank + 1)
  })
})
