import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { protectionChecks } from '@shared/protection/checks'
import { TIME_CURRENT_FAMILY_IDS } from '@shared/protection/timeCurrent'

// Property test (fast-check): whatever plain inputs arrive — including garbage — the checks return
// findings with finite numbers and never throw (team rule: bad input → a finding, never a crash).

const anyNumber = fc.oneof(fc.double(), fc.constantFrom(0, -1, Number.NaN, Infinity, 1e9))
const current = fc.oneof(fc.double({ min: 0.1, max: 50_000, noNaN: true }), anyNumber)
const family = fc.oneof(fc.constantFrom(...TIME_CURRENT_FAMILY_IDS), fc.string().filter((s) => !s.includes('NaN')))
const sizeId = fc.constantFrom('awg-18', 'awg-14', 'awg-10', 'awg-4', 'awg-4/0', 'mm2-2.5', 'mm2-35', 'awg-7', '')
const device = (id: string, upstreamIds: string[]) =>
  fc.record(
    {
      id: fc.constant(id),
      familyId: family,
      ratingA: fc.oneof(fc.constantFrom(5, 10, 15, 20, 30, 60, 100, 200), anyNumber),
      conductor: fc.record({
        id: fc.constant(`W-${id}`),
        sizeId,
        material: fc.constantFrom('copper', 'tinned-copper', 'aluminium'),
        insulationRatingC: fc.constantFrom(60, 75, 90, 105, 125, 200, Number.NaN),
        maxDeviceRatingA: fc.constantFrom(10, 30, 100, 300),
      }),
      faultCurrentAtDeviceA: current,
      faultCurrentFarEndA: current,
      baseCurrentA: fc.double({ min: 0, max: 100, noNaN: true }),
      loadStarts: fc.array(
        fc.record({ loadId: fc.constant(`L-${id}`), runningCurrentA: current, inrushMultiple: anyNumber, startDurationS: anyNumber, isMotor: fc.boolean() }),
        { maxLength: 2 },
      ),
      upstreamId: fc.constantFrom(undefined, ...upstreamIds),
    },
    { requiredKeys: ['id', 'familyId', 'ratingA'] },
  )

describe('protectionChecks on arbitrary inputs', () => {
  it('never throws; every finding has finite numbers, a source and a known severity', () => {
    fc.assert(
      fc.property(
        fc.tuple(device('A', ['B', 'C']), device('B', ['C', 'A']), device('C', [])),
        fc.constantFrom('marine', 'vehicle', 'off-grid'),
        (devices, profile) => {
          const findings = protectionChecks({ devices: devices as never, profile })
          for (const f of findings) {
            expect(['error', 'warning', 'info']).toContain(f.severity)
            expect(f.source.length).toBeGreaterThan(5)
            expect(f.message).not.toMatch(/NaN/)
            for (const q of [f.measured, f.limit]) if (q) expect(Number.isFinite(q.value)).toBe(true)
          }
        },
      ),
      { numRuns: 300 },
    )
  }, 30_000)
})
