import { computed, shallowReactive, toRaw, watch, type InjectionKey } from 'vue'
import type { Rect } from '@shared/export/labelPlacement'
import { MAX_PLACED_LABELS, placeCanvasLabels, sameSpot, type CanvasLabelSpot, type LabelEntry } from '@/components/editor/model/conductorLabelSpots'
import { syncMap } from '@/components/editor/model/canvasMarks'

/** What the canvas shares with its conductors: each reports its route and label width, and reads
 * back where its label goes. */
export interface ConductorLabelSpots {
  /** Sets this conductor's route and label width, or clears them (label not placed: at its middle). */
  report(id: string, entry: LabelEntry | null): void
  /** Placed labels by conductor id; per-id entries, so a conductor re-renders only when its own moves. */
  spots: ReadonlyMap<string, CanvasLabelSpot>
}

export const CONDUCTOR_LABEL_SPOTS: InjectionKey<ConductorLabelSpots> = Symbol('conductorLabelSpots')

const sameEntry = (a: LabelEntry, b: LabelEntry) =>
  a.widthPx === b.widthPx && a.points.length === b.points.length && a.points.every((p, i) => p[0] === b.points[i][0] && p[1] === b.points[i][1])

/**
 * The canvas side: placement is worked out again when a reported route or width changes, a part
 * moves, or the conductors change; nothing is read or placed while no conductor reports (far out).
 */
export function useConductorLabelSpots(source: { order: () => readonly string[]; boxes: () => Rect[] }): ConductorLabelSpots {
  const entries = shallowReactive(new Map<string, LabelEntry>())
  const spots = shallowReactive(new Map<string, CanvasLabelSpot>())
  const placed = computed(() =>
    entries.size === 0 || entries.size > MAX_PLACED_LABELS ? new Map<string, CanvasLabelSpot>() : placeCanvasLabels(entries, source.order(), source.boxes()),
  )
  watch(placed, (next) => syncMap(spots, next, sameSpot), { immediate: true })
  function report(id: string, entry: LabelEntry | null): void {
    // Read untracked: the reporting conductor must not re-run when another one reports.
    const current = toRaw(entries).get(id)
    if (entry === null) {
      if (current) entries.delete(id)
    } else if (!current || !sameEntry(current, entry)) entries.set(id, entry)
  }
  return { report, spots }
}
