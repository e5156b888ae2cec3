// Tables of the application database. Migrations in drizzle/ are generated from this file
// (`npx drizzle-kit generate`); never edit a generated migration by hand.
import { sql } from 'drizzle-orm'
import {
  bigint,
  bigserial,
  boolean,
  customType,
  doublePrecision,
  check,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core'
import { ROLES } from '../../shared/api/roles'
import { INSTALLATION_KINDS } from '../../shared/api/projects.schemas'

const createdAt = () => timestamp('created_at', { withTimezone: true }).notNull().defaultNow()
const updatedAt = () => timestamp('updated_at', { withTimezone: true }).notNull().defaultNow()

export const roleEnum = pgEnum('member_role', ROLES)
export const installationKindEnum = pgEnum('installation_kind', INSTALLATION_KINDS)

export const organizations = pgTable('organizations', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  createdAt: createdAt(),
})

export const users = pgTable('users', {
  id: uuid('id').primaryKey().defaultRandom(),
  /** Always stored trimmed and lower-case (the shared schemas normalise it). */
  email: text('email').notNull().unique(),
  name: text('name').notNull(),
  /** bcrypt hash (cost from config, 12). */
  passwordHash: text('password_hash').notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
})

/**
 * One row per signed-in session; the JWT's `jti` names it. Deleting the row ends the session at once
 * (sign-out, password reset, removal of the member), although the JWT itself would still be valid.
 */
export const sessions = pgTable(
  'sessions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('sessions_user_idx').on(t.userId)],
)

/** A user belongs to one organisation (unique user_id); the role is read on every request. */
export const memberships = pgTable(
  'memberships',
  {
    organizationId: uuid('organization_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: roleEnum('role').notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.organizationId, t.userId] }), uniqueIndex('memberships_user_idx').on(t.userId)],
)

export const projects = pgTable(
  'projects',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organizationId: uuid('organization_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    clientName: text('client_name').notNull().default(''),
    installationKind: installationKindEnum('installation_kind').notNull(),
    nominalVoltageV: integer('nominal_voltage_v').notNull(),
    notes: text('notes').notNull().default(''),
    archived: boolean('archived').notNull().default(false),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('projects_org_updated_idx').on(t.organizationId, t.updatedAt),
    check('projects_voltage_check', sql`${t.nominalVoltageV} in (12, 24, 48)`),
  ],
)

/** Which client members may see a project (other roles see every project of their organisation). */
export const projectShares = pgTable(
  'project_shares',
  {
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.projectId, t.userId] }), index('project_shares_user_idx').on(t.userId)],
)

/** One design document per project; `revision` guards against lost updates (optimistic locking). */
export const designs = pgTable('designs', {
  projectId: uuid('project_id')
    .primaryKey()
    .references(() => projects.id, { onDelete: 'cascade' }),
  document: jsonb('document').notNull(),
  revision: integer('revision').notNull().default(1),
  updatedAt: updatedAt(),
  updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
})

export const invitations = pgTable(
  'invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organizationId: uuid('organization_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: roleEnum('role').notNull(),
    /** SHA-256 (hex) of the token sent by e-mail; the token itself is never stored. */
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: uuid('invited_by').references(() => users.id, { onDelete: 'set null' }),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index('invitations_org_idx').on(t.organizationId)],
)

export const passwordResets = pgTable(
  'password_resets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    tokenHash: text('token_hash').notNull().unique(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index('password_resets_user_idx').on(t.userId)],
)

/** What the local fake SMTP server received (development and tests only). */
export const outboxMessages = pgTable(
  'outbox_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    from: text('from').notNull(),
    to: text('to').notNull(),
    /** Lower-case recipient addresses, so an owner sees only mail sent to their organisation. */
    recipients: text('recipients').array().notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    html: text('html'),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('outbox_received_idx').on(t.receivedAt)],
)

// ---- Live co-editing (server/collab): the Yjs state of each design ----

/** PostgreSQL bytea as a Uint8Array (drizzle-orm 0.45 has no built-in bytea column). */
const bytea = customType<{ data: Uint8Array; driverData: Buffer }>({
  dataType: () => 'bytea',
  toDriver: (value) => Buffer.from(value.buffer, value.byteOffset, value.byteLength),
  fromDriver: (value) => new Uint8Array(value.buffer, value.byteOffset, value.byteLength),
})

/**
 * The compacted Yjs state of a design: `state` holds every update up to design_updates.id
 * `compactedThrough`; the design loads from it plus the later rows of design_updates. A design with no
 * row here is still only the JSON in designs.document and is converted on first load.
 */
export const designStates = pgTable('design_states', {
  projectId: uuid('project_id')
    .primaryKey()
    .references(() => projects.id, { onDelete: 'cascade' }),
  state: bytea('state').notNull(),
  compactedThrough: bigint('compacted_through', { mode: 'number' }).notNull().default(0),
  updatedAt: updatedAt(),
})

/** The durable log: each Yjs update is committed here before the server applies or broadcasts it. */
export const designUpdates = pgTable(
  'design_updates',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    update: bytea('update').notNull(),
    userId: uuid('user_id').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('design_updates_project_idx').on(t.projectId, t.id)],
)

/** Named revisions: a Yjs snapshot of the whole state plus the design JSON read from it. */
export const designRevisions = pgTable(
  'design_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    snapshot: bytea('snapshot').notNull(),
    design: jsonb('design').notNull(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    restoredFrom: uuid('restored_from'),
  },
  (t) => [index('design_revisions_project_idx').on(t.projectId, t.createdAt)],
)

// ---- Client deliverables (server/modules/{shares,uploads}) ----

/** Read-only share links: the token (32 random bytes, base64url) is shown once; only its SHA-256 is kept. */
export const shareLinks = pgTable(
  'share_links',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    label: text('label').notNull().default(''),
    /** SHA-256 (hex) of the token. */
    tokenHash: text('token_hash').notNull().unique(),
    /** The token again, AES-256-GCM encrypted with a key derived from the server secret, so the link can be
     *  e-mailed later (server/modules/shares/shareTokenCipher.ts). Null for links made before this column. */
    tokenCiphertext: text('token_ciphertext'),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index('share_links_project_idx').on(t.projectId)],
)

/** A client's sign-off of a design revision, given through a share link. */
export const approvals = pgTable(
  'approvals',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    shareLinkId: uuid('share_link_id').references(() => shareLinks.id, { onDelete: 'set null' }),
    name: text('name').notNull(),
    /** A named revision (design_revisions.id) when one was chosen. */
    revisionId: uuid('revision_id'),
    /** The revision as the client saw it: a named revision's name, or "Saved revision N". */
    revisionName: text('revision_name').notNull(),
    /** The design's saved revision number at the time of approval. */
    designRevision: integer('design_revision').notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('approvals_project_idx').on(t.projectId, t.createdAt)],
)

/** Files of a project (datasheets, photos) kept in object storage; this row is their metadata. */
export const attachments = pgTable(
  'attachments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    projectId: uuid('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    /** A part id inside the design document, when the file belongs to one part. */
    partId: text('part_id'),
    filename: text('filename').notNull(),
    contentType: text('content_type').notNull(),
    size: integer('size').notNull(),
    sha256: text('sha256').notNull(),
    storageKey: text('storage_key').notNull().unique(),
    uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [index('attachments_project_idx').on(t.projectId, t.createdAt)],
)

/**
 * An organisation's own protective devices, built from their datasheet time-current points
 * (shared/api/devices.schemas.ts validates them; shared/protection/timeCurrent/datasheetBand builds the band).
 */
export const customDevices = pgTable(
  'custom_devices',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organizationId: uuid('organization_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    /** 'fuse' | 'breaker' (checked by the shared schema). */
    kind: text('kind').notNull(),
    ratingA: doublePrecision('rating_a').notNull(),
    dcVoltageRatingV: doublePrecision('dc_voltage_rating_v'),
    interruptingRatingA: doublePrecision('interrupting_rating_a'),
    ignitionProtected: boolean('ignition_protected').notNull().default(false),
    timeDelay: boolean('time_delay').notNull().default(false),
    /** [{ currentA | multiple, minMeltS?, maxClearS? }] as entered. */
    points: jsonb('points').notNull(),
    source: text('source').notNull(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index('custom_devices_org_idx').on(t.organizationId, t.name)],
)
