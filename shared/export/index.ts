// Client deliverables built from the design and the shared analysis: pure, no DOM or Node APIs.
export { renderDiagramSvg, diagramModelToSvg, escapeXml } from './renderDiagramSvg'
export { buildDiagramModel, conductorLabel, type DiagramOptions } from './diagramModel'
export type { DiagramModel, Primitive, Point } from './diagramPrimitives'
export { buildBillOfMaterials, DEFAULT_WASTE_ALLOWANCE_PCT, type BillOfMaterials } from './billOfMaterials'
export { buildSpares, sparesFromEdit, sparesEditSchema, spareEditSchema, OFTEN_USED_COUNT, type SpareLine, type SparesEdit } from './spares'
export { buildReportModel, loadPowerW, type ReportModel, type ReportTable } from './reportModel'
export { designCautions, GENERAL_CAUTION, LITHIUM_CAUTION, PV_CAUTION_ABOVE_V, stringVocAtRecordLowV } from './cautions'
export type { TitleBlockInfo } from './titleBlock'
