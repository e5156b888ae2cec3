// What every export needs: the project, its validated design, the shared analysis (never a second
// implementation) and the facts for the title block.
import { analyzeDesign } from '../../../shared/analysis'
import type { AnalysisResult } from '../../../shared/analysis/types'
import type { Project } from '../../../shared/api/projects.schemas'
import { parseDesign, type Design } from '../../../shared/design/schema'
import type { TitleBlockInfo } from '../../../shared/export'
import type { DbOrTx } from '../../db/client'
import type { Actor } from '../../http/actor'
import { conflict, notFound } from '../../http/errors'
import { readStoredDesign } from '../designs/design-state'
import { getProject } from '../projects/projects.service'

export interface ExportContext {
  project: Pick<Project, 'id' | 'name' | 'clientName'> & { createdByName: string | null }
  design: Design
  revision: number
  updatedAt: Date
  analysis: AnalysisResult
  info: TitleBlockInfo
}

export async function exportContextForProject(
  db: DbOrTx,
  project: ExportContext['project'],
): Promise<ExportContext> {
  // The stored Yjs state: what live editors see, never an older JSON copy.
  const stored = await readStoredDesign(db, project.id)
  if (!stored) throw notFound('Design')
  const parsed = parseDesign(stored.design)
  if (!parsed.ok) {
    throw conflict(`The saved design has errors (${parsed.errors[0]?.path || 'document'}: ${parsed.errors[0]?.message}); fix it in the editor before exporting.`)
  }
  const design = parsed.design
  return {
    project,
    design,
    revision: stored.revision,
    updatedAt: stored.updatedAt,
    analysis: analyzeDesign(design),
    info: {
      project: project.name,
      client: project.clientName,
      revision: `Saved revision ${stored.revision}`,
      date: stored.updatedAt.toISOString().slice(0, 10),
      designer: project.createdByName ?? '',
    },
  }
}

/** The context for a signed-in reader: the project must be visible to them (else 404). */
export async function exportContextFor(db: DbOrTx, actor: Actor, projectId: string): Promise<ExportContext> {
  const project = await getProject(db, actor, projectId)
  return exportContextForProject(db, { id: project.id, name: project.name, clientName: project.clientName, createdByName: project.createdBy?.name ?? null })
}

/** "Expedition truck (v2)" → "expedition-truck-v2", for file names. */
export function fileSlug(name: string): string {
  return name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'design'
}
