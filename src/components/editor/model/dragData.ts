/** Drag-and-drop payload type for a part dragged from the parts list (value: the part type). */
export const PART_DRAG_MIME = 'application/x-ampwright-part'

/** The Vue Flow instance id of the design canvas (useVueFlow(CANVAS_ID) reaches it anywhere). */
export const CANVAS_ID = 'design-canvas'
