import { computed, inject, type ComputedRef, type InjectionKey } from 'vue'

// How much detail the drawing shows, by zoom. Conductors read this one shared value instead of the
// viewport itself: panning changes the viewport on every frame, the band only when the zoom
// crosses a threshold, so a pan re-evaluates nothing per conductor.

/** overview: a very large system on screen, parts too small for symbols or text (below a fifth of
 * full size an 11 px figure is 2 px high); far: a whole large system on screen; mid: labels
 * readable; near: full labels. */
export type ZoomBand = 'overview' | 'far' | 'mid' | 'near'

export const NEAR_ZOOM = 1.1
export const MID_ZOOM = 0.45
export const FAR_ZOOM = 0.2

export function zoomBandOf(zoom: number): ZoomBand {
  return zoom >= NEAR_ZOOM ? 'near' : zoom >= MID_ZOOM ? 'mid' : zoom >= FAR_ZOOM ? 'far' : 'overview'
}

/** Zoomed out at least as far as 'far' (terminal names and most conductor labels left out). */
export function isFarOut(band: ZoomBand): boolean {
  return band === 'far' || band === 'overview'
}

export const ZOOM_BAND: InjectionKey<ComputedRef<ZoomBand>> = Symbol('zoomBand')

/** The canvas's zoom band ('mid' outside a canvas, e.g. in a component test). */
export function useZoomBand(): ComputedRef<ZoomBand> {
  return inject(ZOOM_BAND, () => computed<ZoomBand>(() => 'mid'), true)
}
