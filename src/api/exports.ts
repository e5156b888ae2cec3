import type { BillOfMaterials, SpareLine, SparesEdit } from '@shared/export'
import { ApiError } from './http'
import { http } from './http'

export type ExportFile = 'diagram.svg' | 'diagram.pdf' | 'report.pdf' | 'bom.csv' | 'design.json' | 'netlist.cir'

export const exportUrl = (projectId: string, file: ExportFile, query: Record<string, string> = {}) => {
  const qs = new URLSearchParams(query).toString()
  return `/api/projects/${projectId}/exports/${file}${qs ? `?${qs}` : ''}`
}

export const getBom = (projectId: string) => http.get<{ bom: BillOfMaterials; spares: SpareLine[] }>(`/projects/${projectId}/exports/bom.json`)

/** The BOM CSV with the spares as edited on screen (a POST, so it comes back as a Blob to save). */
export async function editedBomCsv(projectId: string, edit: SparesEdit): Promise<Blob> {
  const res = await fetch(exportUrl(projectId, 'bom.csv'), {
    method: 'POST', credentials: 'same-origin', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(edit),
  })
  if (!res.ok) {
    const body = (await res.json().catch(() => null)) as { error?: { code?: string; message?: string; fields?: [] } } | null
    throw new ApiError(res.status, (body?.error?.code ?? 'internal') as ApiError['code'], body?.error?.message ?? `The server answered ${res.status}`, body?.error?.fields ?? [])
  }
  return res.blob()
}

export const importDesign = (projectId: string, design: unknown) =>
  http.post<{ revision: number; updatedAt: string }>(`/projects/${projectId}/design/import`, design)
export const importLoads = (projectId: string, csv: string) =>
  http.post<{ revision: number; added: { id: string; label: string }[] }>(`/projects/${projectId}/design/import-loads`, { csv })
