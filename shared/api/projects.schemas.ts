import { z } from 'zod'

export const INSTALLATION_KINDS = ['vehicle', 'vessel', 'building', 'other'] as const
export const installationKindSchema = z.enum(INSTALLATION_KINDS)
export type InstallationKind = z.infer<typeof installationKindSchema>
export const INSTALLATION_KIND_LABELS: Record<InstallationKind, string> = {
  vehicle: 'Vehicle',
  vessel: 'Vessel',
  building: 'Building',
  other: 'Other',
}

export const NOMINAL_VOLTAGES_V = [12, 24, 48] as const
export const nominalVoltageSchema = z.union([z.literal(12), z.literal(24), z.literal(48)], {
  error: 'Choose 12, 24 or 48 V',
})

export const PROJECT_NAME_MAX = 120
export const PROJECT_NOTES_MAX = 5000

export const projectInputSchema = z.object({
  name: z.string().trim().min(1, 'Enter a project name').max(PROJECT_NAME_MAX),
  clientName: z.string().trim().max(PROJECT_NAME_MAX).default(''),
  installationKind: installationKindSchema,
  nominalVoltageV: nominalVoltageSchema,
  notes: z.string().max(PROJECT_NOTES_MAX).default(''),
})
export type ProjectInput = z.input<typeof projectInputSchema>

export const projectUpdateSchema = projectInputSchema.partial().extend({ archived: z.boolean().optional() })
export type ProjectUpdate = z.input<typeof projectUpdateSchema>

export const PROJECT_SORT_KEYS = ['name', 'clientName', 'installationKind', 'nominalVoltageV', 'updatedAt', 'createdAt'] as const

export const projectListQuerySchema = z.object({
  q: z.string().trim().max(200).optional(),
  sort: z.enum(PROJECT_SORT_KEYS).default('updatedAt'),
  order: z.enum(['asc', 'desc']).default('desc'),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
  archived: z.enum(['exclude', 'include', 'only']).default('exclude'),
})
export type ProjectListQuery = z.input<typeof projectListQuerySchema>

export interface Project {
  id: string
  name: string
  clientName: string
  installationKind: InstallationKind
  nominalVoltageV: 12 | 24 | 48
  notes: string
  archived: boolean
  createdAt: string
  updatedAt: string
  createdBy: { id: string; name: string } | null
}

export interface Page<T> {
  items: T[]
  total: number
  page: number
  pageSize: number
}

export const projectShareSchema = z.object({ userId: z.string().uuid('Choose a client member') })
