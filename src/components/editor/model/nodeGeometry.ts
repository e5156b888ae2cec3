// The canvas uses the shared part geometry (the exported diagram draws the same boxes and terminals).
export { GRID_PX, nodeGeometry, type NodeGeometry, type PlacedTerminal } from '@shared/design/nodeGeometry'
