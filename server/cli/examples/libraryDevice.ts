import type { Design } from '../../../shared/design/schema'
import type { EmbeddedDevice } from '../../../shared/protection/timeCurrent'
import { branchDesign, PUMP_LOAD } from './timeCurrent'

// A design whose fuse is a device from an organisation's library (params.customDevice): the device and
// its points are our own invention, written as a library would hold them after a user typed in a
// datasheet. The file carries the whole copy, so `npm run analyze -- examples/library-device-pump.json`
// needs no database.

/** An invented 15 A time-delay fuse: minimum melting and maximum clearing points, A and s. */
export const WORKSHOP_DELAY_FUSE_15A: EmbeddedDevice = {
  libraryId: 'example-workshop-delay-15',
  name: 'Workshop time-delay fuse 15 A',
  kind: 'fuse',
  ratingA: 15,
  timeDelay: true,
  source: 'Invented example datasheet, figure 1 (not a real product)',
  minMeltPoints: [
    { currentA: 18, timeS: 3600 },
    { currentA: 30, timeS: 60 },
    { currentA: 48, timeS: 2.5 },
    { currentA: 150, timeS: 0.05 },
    { currentA: 300, timeS: 0.008 },
  ],
  maxClearPoints: [
    { currentA: 22, timeS: 3600 },
    { currentA: 30, timeS: 600 },
    { currentA: 48, timeS: 20 },
    { currentA: 150, timeS: 0.3 },
    { currentA: 300, timeS: 0.03 },
  ],
}

/**
 * The pump of motor-start-nuisance.json (8 A run, 6 × start for 0.5 s = 48 A) on the library fuse
 * above instead of a regular blade fuse: the library device may melt at 48 A only after 2.5 s (its own
 * point), so the start rides through, where the blade band (≈ 90 ms) opens. Faults still clear in time:
 * the far-end short of the 12 AWG run (≈ 320 A) is cleared within 0.03 · (300 / 320)² ≈ 26 ms, well
 * inside the conductor's ≈ 0.65 s (ICEA P-32-382, 105 → 150 °C: 0.001607 · (6 530 / 320)²).
 */
export function libraryDevicePump(): Design {
  return branchDesign({
    id: 'library-device-pump', name: 'Pump on a time-delay fuse from the library', profile: 'vehicle', bankOhm: 0.015, mainA: 100,
    device: {
      type: 'fuse',
      label: 'Pump fuse, library time-delay 15 A',
      params: { family: 'blade-regular', ratingA: 15, interruptingRatingA: 1000, customDevice: WORKSHOP_DELAY_FUSE_15A },
    },
    load: PUMP_LOAD,
    feed: { sizeId: 'awg-12', lengthM: 2 }, motorStart: true,
  })
}
