import { relations, sql } from 'drizzle-orm';
import {
  type AnySQLiteColumn,
  index,
  integer,
  real,
  sqliteTable,
  text,
  uniqueIndex,
} from 'drizzle-orm/sqlite-core';
import {
  ROLES,
  MATCH_STATUSES,
  POUR_STATUSES,
  COLORANT_KINDS,
  DOSE_UNITS,
  PHOTO_KINDS,
  THICKNESS,
  SAMPLE_PURPOSES,
  STOCK_MOVEMENT_KINDS,
} from '../lib/enums';

// Every table of Pourproof. Times are unix milliseconds, except the session
// expiry columns, kept in seconds as lucia's drizzle adapter expects.

export * from '../lib/enums';

const now = sql`(cast(unixepoch('subsec') * 1000 as integer))`;

export const teams = sqliteTable('teams', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  defaultTolerance: real('default_tolerance').notNull().default(2.0),
  volumeUnit: text('volume_unit', { enum: ['cups', 'floz', 'gal', 'ml'] }).notNull().default('cups'),
  // Drops per millilitre depend on the dropper; about 20 is common practice.
  dropsPerMl: real('drops_per_ml').notNull().default(20),
  sprueAllowanceMl: real('sprue_allowance_ml').notNull().default(0),
  // The shop's currency for colorant and plastisol costs (ISO 4217 code).
  currency: text('currency').notNull().default('USD'),
  // Whether a test pour with a batch size draws its doses from stock too.
  stockDrawsPours: integer('stock_draws_pours', { mode: 'boolean' }).notNull().default(false),
  // The shop's IANA time zone: dates on pages and printed sheets read in it.
  timeZone: text('time_zone').notNull().default('UTC'),
  createdAt: integer('created_at').notNull().default(now),
});

export const users = sqliteTable('users', {
  id: text('id').primaryKey(),
  email: text('email').notNull().unique(),
  name: text('name').notNull(),
  passwordHash: text('password_hash').notNull(),
  createdAt: integer('created_at').notNull().default(now),
});

// One user belongs to one shop (team); the unique index on user_id says so.
export const memberships = sqliteTable(
  'memberships',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    userId: text('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    role: text('role', { enum: ROLES }).notNull(),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [uniqueIndex('memberships_user_unique').on(t.userId), index('memberships_team_idx').on(t.teamId)],
);

// The id is the SHA-256 hash (hex) of the cookie's token: a row copied from
// this table is not a usable cookie.
export const sessions = sqliteTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    userId: text('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: integer('expires_at').notNull(),
    absoluteExpiresAt: integer('absolute_expires_at').notNull(),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [index('sessions_user_idx').on(t.userId)],
);

export const signInFailures = sqliteTable(
  'sign_in_failures',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    key: text('key').notNull(),
    at: integer('at').notNull(),
  },
  (t) => [index('sign_in_failures_key_at').on(t.key, t.at)],
);

export const invitations = sqliteTable(
  'invitations',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: ROLES }).notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at').notNull().default(now),
    expiresAt: integer('expires_at').notNull(),
    acceptedAt: integer('accepted_at'),
    revokedAt: integer('revoked_at'),
  },
  (t) => [index('invitations_team_idx').on(t.teamId)],
);

export const colorants = sqliteTable(
  'colorants',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    kind: text('kind', { enum: COLORANT_KINDS }).notNull(),
    unit: text('unit', { enum: DOSE_UNITS }).notNull(),
    costPerUnit: real('cost_per_unit'),
    stock: real('stock'),
    // Below this much stock (in the colorant's unit) the library marks it low.
    lowStockAt: real('low_stock_at'),
    flakeSizeIn: real('flake_size_in'),
    flakeColor: text('flake_color'),
    swatchL: real('swatch_l'),
    swatchA: real('swatch_a'),
    swatchB: real('swatch_b'),
    notes: text('notes'),
    archivedAt: integer('archived_at'),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [uniqueIndex('colorants_team_name').on(t.teamId, t.name)],
);

export const molds = sqliteTable(
  'molds',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    bodyStyle: text('body_style').notNull(),
    lengthIn: real('length_in'),
    cavities: integer('cavities').notNull(),
    mlPerCavity: real('ml_per_cavity').notNull(),
    thickness: text('thickness', { enum: THICKNESS }).notNull().default('standard'),
    archivedAt: integer('archived_at'),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [uniqueIndex('molds_team_name').on(t.teamId, t.name)],
);

export const photos = sqliteTable(
  'photos',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: PHOTO_KINDS }).notNull(),
    fileKey: text('file_key').notNull().unique(),
    fileName: text('file_name').notNull(),
    mime: text('mime').notNull(),
    size: integer('size').notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    uploadedBy: text('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [index('photos_team_idx').on(t.teamId, t.createdAt)],
);

export const matches = sqliteTable(
  'matches',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    status: text('status', { enum: MATCH_STATUSES }).notNull().default('open'),
    tolerance: real('tolerance').notNull(),
    notes: text('notes'),
    standardPourId: text('standard_pour_id').references((): AnySQLiteColumn => pours.id, {
      onDelete: 'set null',
    }),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at').notNull().default(now),
    updatedAt: integer('updated_at').notNull().default(now),
    // A reference photo uploaded for the target but not yet measured: kept with
    // the match at once, so a reload or a walk away does not lose it.
    draftPhotoId: text('draft_photo_id').references(() => photos.id, { onDelete: 'set null' }),
  },
  (t) => [index('matches_team_idx').on(t.teamId, t.updatedAt), index('matches_draft_photo_idx').on(t.draftPhotoId)],
);

// A match's zones in order; the target colour is the mean of the zone's
// target samples (one per reference photo), kept here for quick reads.
export const zones = sqliteTable(
  'zones',
  {
    id: text('id').primaryKey(),
    matchId: text('match_id').notNull().references(() => matches.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    position: integer('position').notNull(),
    targetL: real('target_l'),
    targetA: real('target_a'),
    targetB: real('target_b'),
    targetSpread: real('target_spread'),
  },
  (t) => [uniqueIndex('zones_match_name').on(t.matchId, t.name)],
);

export const pours = sqliteTable(
  'pours',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    matchId: text('match_id').notNull().references(() => matches.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    status: text('status', { enum: POUR_STATUSES }).notNull().default('measured'),
    photoId: text('photo_id').references(() => photos.id, { onDelete: 'restrict' }),
    moldId: text('mold_id').references(() => molds.id, { onDelete: 'set null' }),
    batchCups: real('batch_cups'),
    tempF: real('temp_f'),
    notes: text('notes'),
    correctsPourId: text('corrects_pour_id').references((): AnySQLiteColumn => pours.id, {
      onDelete: 'set null',
    }),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at').notNull().default(now),
    submittedAt: integer('submitted_at'),
    submittedBy: text('submitted_by').references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    uniqueIndex('pours_match_number').on(t.matchId, t.number),
    index('pours_team_idx').on(t.teamId, t.createdAt),
    // The sign-off queue: only the pours waiting for a lead.
    index('pours_submitted_idx').on(t.teamId, t.submittedAt).where(sql`${t.status} = 'submitted'`),
  ],
);

// Doses are normalised per cup of plastisol.
export const recipeLines = sqliteTable(
  'recipe_lines',
  {
    id: text('id').primaryKey(),
    pourId: text('pour_id').notNull().references(() => pours.id, { onDelete: 'cascade' }),
    zone: text('zone').notNull(),
    colorantId: text('colorant_id').notNull().references(() => colorants.id, { onDelete: 'restrict' }),
    amount: real('amount').notNull(),
    unit: text('unit', { enum: DOSE_UNITS }).notNull(),
    position: integer('position').notNull().default(0),
  },
  (t) => [index('recipe_lines_pour_idx').on(t.pourId)],
);

export const batches = sqliteTable(
  'batches',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    matchId: text('match_id').notNull().references(() => matches.id, { onDelete: 'cascade' }),
    standardPourId: text('standard_pour_id').notNull().references(() => pours.id, { onDelete: 'restrict' }),
    photoId: text('photo_id').references(() => photos.id, { onDelete: 'restrict' }),
    moldId: text('mold_id').references(() => molds.id, { onDelete: 'set null' }),
    cups: real('cups').notNull(),
    baitsExpected: integer('baits_expected'),
    baitsActual: integer('baits_actual'),
    // Cups of each zone's colour ([{ zone, cups }]); null: the batch split evenly.
    zoneCups: text('zone_cups', { mode: 'json' }).$type<{ zone: string; cups: number }[]>(),
    // The run plan the batch was poured to ([{ moldId, shots }]), or null.
    plan: text('plan', { mode: 'json' }).$type<{ moldId: string; shots: number }[]>(),
    baseColorantId: text('base_colorant_id').references(() => colorants.id, { onDelete: 'set null' }),
    pass: integer('pass', { mode: 'boolean' }).notNull(),
    notes: text('notes'),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [index('batches_match_idx').on(t.matchId, t.teamId, t.createdAt), index('batches_team_idx').on(t.teamId, t.createdAt)],
);

// One measured region of a photo: a zone of a target, pour or batch, or a
// colorant swatch. ΔE figures are against the target (pours) or the standard
// (batches), computed on the server when the sample is taken.
export const samples = sqliteTable(
  'samples',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    photoId: text('photo_id').notNull().references(() => photos.id, { onDelete: 'restrict' }),
    purpose: text('purpose', { enum: SAMPLE_PURPOSES }).notNull(),
    matchId: text('match_id').references(() => matches.id, { onDelete: 'cascade' }),
    pourId: text('pour_id').references(() => pours.id, { onDelete: 'cascade' }),
    batchId: text('batch_id').references(() => batches.id, { onDelete: 'cascade' }),
    colorantId: text('colorant_id').references(() => colorants.id, { onDelete: 'cascade' }),
    zone: text('zone').notNull(),
    shape: text('shape', { mode: 'json' }).notNull(),
    neutral: text('neutral', { mode: 'json' }),
    l: real('l').notNull(),
    a: real('a').notNull(),
    b: real('b').notNull(),
    hex: text('hex').notNull(),
    pixels: integer('pixels').notNull(),
    kept: integer('kept').notNull(),
    spread: real('spread').notNull(),
    glare: real('glare').notNull(),
    flake: text('flake', { mode: 'json' }).notNull(),
    whiteBalance: text('white_balance', { mode: 'json' }),
    dE00: real('de00'),
    dL: real('dl'),
    dC: real('dc'),
    dH: real('dh'),
    // ΔE00 radius (about 95 %, k = 2) of the region's colour, and of dE00 from both measurements.
    uncertainty: real('uncertainty'),
    dE00Uncertainty: real('de00_uncertainty'),
    shading: real('shading'),
    other: text('other', { mode: 'json' }),
    // The physical reference in the same photo: its shape and the comparison with it.
    referenceShape: text('reference_shape', { mode: 'json' }),
    inFrame: text('in_frame', { mode: 'json' }),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [
    index('samples_match_idx').on(t.matchId, t.purpose),
    index('samples_pour_idx').on(t.pourId),
    index('samples_batch_idx').on(t.batchId),
    // The shop's colour history (pour and swatch samples of a team) and a photo's uses.
    index('samples_team_purpose_idx').on(t.teamId, t.purpose),
    index('samples_photo_idx').on(t.photoId),
  ],
);

// A calibration swatch: a known dose of one colorant per cup of the base plastisol (none, for a
// swatch of the base alone), poured outside any match and measured from its photo. It feeds the
// shop's colorant model (lib/color/fitColorantModel.ts) beside the pours.
export const swatches = sqliteTable(
  'swatches',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    colorantId: text('colorant_id').notNull().references(() => colorants.id, { onDelete: 'cascade' }),
    sampleId: text('sample_id').notNull().references(() => samples.id, { onDelete: 'cascade' }),
    amount: real('amount').notNull(),
    unit: text('unit', { enum: DOSE_UNITS }).notNull(),
    notes: text('notes'),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [index('swatches_team_idx').on(t.teamId), index('swatches_colorant_idx').on(t.colorantId)],
);

export const signOffs = sqliteTable(
  'sign_offs',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    matchId: text('match_id').notNull().references(() => matches.id, { onDelete: 'cascade' }),
    pourId: text('pour_id').notNull().references(() => pours.id, { onDelete: 'cascade' }),
    decision: text('decision', { enum: ['approved', 'rework'] }).notNull(),
    comment: text('comment'),
    decidedBy: text('decided_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [index('sign_offs_match_idx').on(t.matchId), index('sign_offs_pour_idx').on(t.pourId)],
);


// The ledger of stock: every draw (a batch, a test pour), delivery and manual
// adjustment, signed, in the colorant's unit. colorants.stock is the running
// balance, changed only together with a movement in one transaction.
export const stockMovements = sqliteTable(
  'stock_movements',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    colorantId: text('colorant_id').notNull().references(() => colorants.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: STOCK_MOVEMENT_KINDS }).notNull(),
    amount: real('amount').notNull(),
    balance: real('balance').notNull(),
    batchId: text('batch_id').references(() => batches.id, { onDelete: 'set null' }),
    pourId: text('pour_id').references(() => pours.id, { onDelete: 'set null' }),
    note: text('note'),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [index('stock_movements_colorant_idx').on(t.colorantId, t.createdAt), index('stock_movements_team_idx').on(t.teamId, t.batchId)],
);

export const auditEvents = sqliteTable(
  'audit_events',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').references(() => teams.id, { onDelete: 'cascade' }),
    actorId: text('actor_id').references(() => users.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    entity: text('entity').notNull(),
    entityId: text('entity_id'),
    data: text('data', { mode: 'json' }),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [index('audit_events_team_idx').on(t.teamId, t.createdAt), index('audit_events_entity_idx').on(t.teamId, t.entityId)],
);

export const outgoingMail = sqliteTable(
  'outgoing_mail',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id').references(() => teams.id, { onDelete: 'cascade' }),
    to: text('to_address').notNull(),
    subject: text('subject').notNull(),
    text: text('text_body').notNull(),
    html: text('html_body'),
    status: text('status', { enum: ['queued', 'sending', 'sent', 'failed'] }).notNull().default('queued'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    nextAttemptAt: integer('next_attempt_at').notNull().default(now),
    sentAt: integer('sent_at'),
    createdAt: integer('created_at').notNull().default(now),
  },
  (t) => [index('outgoing_mail_status_idx').on(t.status, t.nextAttemptAt)],
);

export const teamsRelations = relations(teams, ({ many }) => ({
  memberships: many(memberships),
  matches: many(matches),
  colorants: many(colorants),
  molds: many(molds),
}));
export const usersRelations = relations(users, ({ one, many }) => ({
  membership: one(memberships, { fields: [users.id], references: [memberships.userId] }),
  sessions: many(sessions),
}));
export const membershipsRelations = relations(memberships, ({ one }) => ({
  team: one(teams, { fields: [memberships.teamId], references: [teams.id] }),
  user: one(users, { fields: [memberships.userId], references: [users.id] }),
}));
export const sessionsRelations = relations(sessions, ({ one }) => ({
  user: one(users, { fields: [sessions.userId], references: [users.id] }),
}));
export const matchesRelations = relations(matches, ({ one, many }) => ({
  team: one(teams, { fields: [matches.teamId], references: [teams.id] }),
  zones: many(zones),
  pours: many(pours),
  batches: many(batches),
  signOffs: many(signOffs),
}));
export const zonesRelations = relations(zones, ({ one }) => ({
  match: one(matches, { fields: [zones.matchId], references: [matches.id] }),
}));
export const poursRelations = relations(pours, ({ one, many }) => ({
  match: one(matches, { fields: [pours.matchId], references: [matches.id] }),
  photo: one(photos, { fields: [pours.photoId], references: [photos.id] }),
  mold: one(molds, { fields: [pours.moldId], references: [molds.id] }),
  recipe: many(recipeLines),
  samples: many(samples),
  signOffs: many(signOffs),
}));
export const recipeLinesRelations = relations(recipeLines, ({ one }) => ({
  pour: one(pours, { fields: [recipeLines.pourId], references: [pours.id] }),
  colorant: one(colorants, { fields: [recipeLines.colorantId], references: [colorants.id] }),
}));
export const batchesRelations = relations(batches, ({ one, many }) => ({
  match: one(matches, { fields: [batches.matchId], references: [matches.id] }),
  standard: one(pours, { fields: [batches.standardPourId], references: [pours.id] }),
  samples: many(samples),
}));
export const samplesRelations = relations(samples, ({ one }) => ({
  photo: one(photos, { fields: [samples.photoId], references: [photos.id] }),
  pour: one(pours, { fields: [samples.pourId], references: [pours.id] }),
  batch: one(batches, { fields: [samples.batchId], references: [batches.id] }),
}));
export const signOffsRelations = relations(signOffs, ({ one }) => ({
  pour: one(pours, { fields: [signOffs.pourId], references: [pours.id] }),
}));

export type Team = typeof teams.$inferSelect;
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
export type Membership = typeof memberships.$inferSelect;
export type Session = typeof sessions.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;
export type Colorant = typeof colorants.$inferSelect;
export type NewColorant = typeof colorants.$inferInsert;
export type Mold = typeof molds.$inferSelect;
export type NewMold = typeof molds.$inferInsert;
export type Photo = typeof photos.$inferSelect;
export type NewPhoto = typeof photos.$inferInsert;
export type Match = typeof matches.$inferSelect;
export type NewMatch = typeof matches.$inferInsert;
export type Zone = typeof zones.$inferSelect;
export type Pour = typeof pours.$inferSelect;
export type RecipeLine = typeof recipeLines.$inferSelect;
export type Batch = typeof batches.$inferSelect;
export type Sample = typeof samples.$inferSelect;
export type SignOff = typeof signOffs.$inferSelect;
export type StockMovement = typeof stockMovements.$inferSelect;
export type AuditEvent = typeof auditEvents.$inferSelect;
export type OutgoingMail = typeof outgoingMail.$inferSelect;
