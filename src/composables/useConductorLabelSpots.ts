import { ref, shallowReactive, watch, type InjectionKey } from 'vue'
import type { Rect } from '@shared/export/labelPlacement'
import { MAX_PLACED_LABELS, placeCanvasLabels, sameSpot, type CanvasLabelSpot, type LabelEntry } from '@/components/editor/model/conductorLabelSpots'
import { syncMap } from '@/components/editor/model/canvasMarks'
import { sameList } from '@/utils/sameList'

/** What the canvas shares with its conductors: each reports its route and label width, and reads
 * back where its label goes. */
export interface ConductorLabelSpots {
  /** Sets this conductor's route and label width, or clears them (label not placed: at its middle). */
  report(id: string, entry: LabelEntry | null): void
  /** Placed labels by conductor id; per-id entries, so a conductor re-renders only when its own moves. */
  spots: ReadonlyMap<string, CanvasLabelSpot>
}

export const CONDUCTOR_LABEL_SPOTS: InjectionKey<ConductorLabelSpots> = Symbol('conductorLabelSpots')

const sameEntry = (a: LabelEntry, b: LabelEntry) => a.widthPx === b.widthPx && sameList(a.points, b.points, (p, q) => p[0] === q[0] && p[1] === q[1])

/**
 * The canvas side. Conductors report while they render (hundreds at once when a drawing opens), so a
 * report only notes the entry and asks for one placement after the current update: placing inside it
 * would re-run placement once per conductor, and Vue stops an update that re-triggers itself a
 * hundred times. While labels are placed, placement runs again when a part moves or the conductors
 * change; while no conductor reports (far out) nothing is read or placed.
 */
export function useConductorLabelSpots(source: { order: () => readonly string[]; boxes: () => Rect[] }): ConductorLabelSpots {
  const entries = new Map<string, LabelEntry>()
  const spots = shallowReactive(new Map<string, CanvasLabelSpot>())
  /** Set only by `place`, outside any update: while false the parts and conductors are not watched,
   * so an edit far out (the usual case on a large drawing) builds no box list. */
  const placing = ref(false)
  let scheduled = false
  function place(): void {
    scheduled = false
    placing.value = entries.size > 0 && entries.size <= MAX_PLACED_LABELS
    syncMap(spots, placing.value ? placeCanvasLabels(entries, source.order(), source.boxes()) : new Map(), sameSpot)
  }
  function schedule(): void {
    if (scheduled) return
    scheduled = true
    queueMicrotask(place)
  }
  watch(() => (placing.value ? [source.order(), source.boxes()] : null), schedule)
  function report(id: string, entry: LabelEntry | null): void {
    const current = entries.get(id)
    if (entry === null) {
      if (!current) return
      entries.delete(id)
    } else if (current && sameEntry(current, entry)) return
    else entries.set(id, entry)
    schedule()
  }
  return { report, spots }
}
