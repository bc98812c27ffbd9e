/**
 * The Seatwise data model. TypeScript keys camelCase, columns snake_case, plural table names.
 * Every time is stored in UTC (the pool runs with timezone "Z"). Ids are random UUIDs so an
 * id from one organisation reveals nothing about another's.
 */
import { sql } from "drizzle-orm";
import {
  boolean,
  datetime,
  double,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  text,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { ROLES } from "@/lib/auth/roles";
import type { ComputeResult } from "@/lib/compute/types";
import type { Layout } from "@/lib/layout/schema";
import type { ScenarioConditions } from "@/lib/scenarios/schema";

const id = () => varchar("id", { length: 36 }).primaryKey().$defaultFn(() => crypto.randomUUID());
const createdAt = () => datetime("created_at", { mode: "date", fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`);
const updatedAt = () =>
  datetime("updated_at", { mode: "date", fsp: 3 })
    .notNull()
    .default(sql`CURRENT_TIMESTAMP(3)`)
    .$onUpdate(() => new Date());

export const organisations = mysqlTable("organisations", {
  id: id(),
  name: varchar("name", { length: 120 }).notNull(),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const users = mysqlTable("users", {
  id: id(),
  email: varchar("email", { length: 254 }).notNull().unique(),
  name: varchar("name", { length: 120 }).notNull(),
  passwordHash: varchar("password_hash", { length: 255 }).notNull(),
  /** Display units; everything is stored in SI. */
  unitSystem: mysqlEnum("unit_system", ["si", "ip"]).notNull().default("si"),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const memberships = mysqlTable(
  "memberships",
  {
    id: id(),
    userId: varchar("user_id", { length: 36 }).notNull().references(() => users.id, { onDelete: "cascade" }),
    organisationId: varchar("organisation_id", { length: 36 })
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    role: mysqlEnum("role", ROLES).notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("memberships_user_org_unique").on(t.userId, t.organisationId),
    index("memberships_org_idx").on(t.organisationId),
  ],
);

/** Session ids are the SHA-256 of the token in the cookie: a leaked table grants nothing. */
export const sessions = mysqlTable(
  "sessions",
  {
    id: varchar("id", { length: 64 }).primaryKey(),
    userId: varchar("user_id", { length: 36 }).notNull().references(() => users.id, { onDelete: "cascade" }),
    organisationId: varchar("organisation_id", { length: 36 })
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    expiresAt: datetime("expires_at", { mode: "date" }).notNull(),
  },
  (t) => [index("sessions_user_idx").on(t.userId)],
);

export const invitations = mysqlTable(
  "invitations",
  {
    id: id(),
    organisationId: varchar("organisation_id", { length: 36 })
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    email: varchar("email", { length: 254 }).notNull(),
    role: mysqlEnum("role", ROLES).notNull(),
    tokenHash: varchar("token_hash", { length: 64 }).notNull().unique(),
    invitedBy: varchar("invited_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    expiresAt: datetime("expires_at", { mode: "date" }).notNull(),
    acceptedAt: datetime("accepted_at", { mode: "date" }),
    createdAt: createdAt(),
  },
  (t) => [index("invitations_org_idx").on(t.organisationId)],
);

export const passwordResets = mysqlTable(
  "password_resets",
  {
    id: id(),
    userId: varchar("user_id", { length: 36 }).notNull().references(() => users.id, { onDelete: "cascade" }),
    tokenHash: varchar("token_hash", { length: 64 }).notNull().unique(),
    expiresAt: datetime("expires_at", { mode: "date" }).notNull(),
    usedAt: datetime("used_at", { mode: "date" }),
    createdAt: createdAt(),
  },
  (t) => [index("password_resets_user_idx").on(t.userId)],
);

export const projects = mysqlTable(
  "projects",
  {
    id: id(),
    organisationId: varchar("organisation_id", { length: 36 })
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 120 }).notNull(),
    description: text("description").notNull(),
    /** Number of the newest layout revision (0 before the first save); the optimistic-lock field. */
    headRevision: int("head_revision").notNull().default(0),
    createdBy: varchar("created_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("projects_org_idx").on(t.organisationId, t.updatedAt)],
);

/** Each save is a new row; rows are never updated. */
export const layoutRevisions = mysqlTable(
  "layout_revisions",
  {
    id: id(),
    projectId: varchar("project_id", { length: 36 })
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    number: int("number").notNull(),
    authorId: varchar("author_id", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    message: varchar("message", { length: 200 }).notNull(),
    layout: json("layout").$type<Layout>().notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("layout_revisions_project_number_unique").on(t.projectId, t.number)],
);

/**
 * Seats keep the id they have in the layout for as long as the project lives, so feedback and
 * occupant assignments can refer to them across revisions. A seat removed from the layout keeps
 * its row with `removedInRevision` set.
 */
export const seats = mysqlTable(
  "seats",
  {
    projectId: varchar("project_id", { length: 36 })
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    seatId: varchar("seat_id", { length: 64 }).notNull(),
    label: varchar("label", { length: 80 }).notNull(),
    occupantUserId: varchar("occupant_user_id", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    firstRevision: int("first_revision").notNull(),
    lastRevision: int("last_revision").notNull(),
    removedInRevision: int("removed_in_revision"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("seats_project_seat_unique").on(t.projectId, t.seatId),
    index("seats_occupant_idx").on(t.occupantUserId),
  ],
);

export const auditLog = mysqlTable(
  "audit_log",
  {
    id: id(),
    organisationId: varchar("organisation_id", { length: 36 }).references(() => organisations.id, {
      onDelete: "cascade",
    }),
    actorId: varchar("actor_id", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    action: varchar("action", { length: 48 }).notNull(),
    targetType: varchar("target_type", { length: 32 }),
    targetId: varchar("target_id", { length: 64 }),
    details: json("details").$type<Record<string, unknown>>(),
    success: boolean("success").notNull().default(true),
    createdAt: createdAt(),
  },
  (t) => [index("audit_log_org_time_idx").on(t.organisationId, t.createdAt)],
);

/**
 * Design conditions of a project (e.g. "Winter design"). `conditions` is validated by
 * lib/scenarios/schema.ts on every write; `version` grows by one on every update so cached
 * results of an older version are never served.
 */
export const scenarios = mysqlTable(
  "scenarios",
  {
    id: id(),
    projectId: varchar("project_id", { length: 36 })
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 80 }).notNull(),
    conditions: json("conditions").$type<ScenarioConditions>().notNull(),
    version: int("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("scenarios_project_name_unique").on(t.projectId, t.name)],
);

/** One cached comfort result per (project, revision, scenario, scenario version). */
export const computeResults = mysqlTable(
  "compute_results",
  {
    id: id(),
    projectId: varchar("project_id", { length: 36 })
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    revision: int("revision").notNull(),
    scenarioId: varchar("scenario_id", { length: 36 })
      .notNull()
      .references(() => scenarios.id, { onDelete: "cascade" }),
    scenarioVersion: int("scenario_version").notNull(),
    result: json("result").$type<ComputeResult>().notNull(),
    computeMs: int("compute_ms").notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("compute_results_key_unique").on(t.projectId, t.revision, t.scenarioId, t.scenarioVersion)],
);

/** Uploaded images (floor-plan underlays); the bytes live in lib/storage's directory. */
export const uploads = mysqlTable(
  "uploads",
  {
    id: id(),
    organisationId: varchar("organisation_id", { length: 36 })
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    projectId: varchar("project_id", { length: 36 })
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    contentType: mysqlEnum("content_type", ["image/png", "image/jpeg"]).notNull(),
    byteSize: int("byte_size").notNull(),
    widthPx: int("width_px").notNull(),
    heightPx: int("height_px").notNull(),
    createdBy: varchar("created_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("uploads_project_idx").on(t.projectId)],
);

/**
 * Panel products of an organisation's catalogue, imported from CSV (lib/catalogue). Sizes in m.
 * The characteristic is the product's rated specific output q = K·ΔTⁿ per m² of panel face:
 * `kWm2PerKn` is K in W/(m²·Kⁿ) and ΔT the mean water temperature minus the room air
 * temperature in K (its magnitude when cooling); a panel of width × length m gives
 * Q = K·width·length·ΔTⁿ W. The same convention as the layout's `characteristic`.
 * The louver columns are all null for a plain panel, all set for a louvered one.
 */
export const panelProducts = mysqlTable(
  "panel_products",
  {
    id: id(),
    organisationId: varchar("organisation_id", { length: 36 })
      .notNull()
      .references(() => organisations.id, { onDelete: "cascade" }),
    name: varchar("name", { length: 120 }).notNull(),
    widthM: double("width_m").notNull(),
    lengthM: double("length_m").notNull(),
    kWm2PerKn: double("k_w_m2_per_kn").notNull(),
    n: double("n").notNull(),
    emissivity: double("emissivity").notNull(),
    louverMinDeg: double("louver_min_deg"),
    louverMaxDeg: double("louver_max_deg"),
    finish: mysqlEnum("finish", ["diffuse", "specular"]),
    wallEmissivity: double("wall_emissivity"),
    createdBy: varchar("created_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex("panel_products_org_name_unique").on(t.organisationId, t.name)],
);
