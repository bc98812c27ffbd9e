import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { layoutRevisions, memberships, organisations, projects, scenarios, seats, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { DEMO_ACCOUNTS, DEMO_ORGANISATION } from "@/lib/demo/accounts";
import { demoLayout } from "@/lib/demo/layout";
import { SUMMER_DESIGN, WINTER_DESIGN } from "@/lib/scenarios/schema";

const DEMO_PROJECT_NAME = "Quayside House — level 3";
const DEMO_SCENARIOS = [WINTER_DESIGN, SUMMER_DESIGN];

/**
 * Adds the demo project's design scenarios that are missing (by name; the unique key on
 * (project, name) makes a repeat a no-op), so databases seeded before scenarios existed get them.
 */
async function ensureDemoScenarios(adminUserId: string): Promise<void> {
  const db = getDb();
  const [project] = await db
    .select({ id: projects.id })
    .from(projects)
    .innerJoin(memberships, eq(memberships.organisationId, projects.organisationId))
    .where(and(eq(memberships.userId, adminUserId), eq(projects.name, DEMO_PROJECT_NAME)))
    .limit(1);
  if (!project) return;
  await db
    .insert(scenarios)
    .values(DEMO_SCENARIOS.map((s) => ({ projectId: project.id, name: s.name, conditions: s.conditions, version: 1 })))
    .onDuplicateKeyUpdate({ set: { name: sql`${scenarios.name}` } });
}

/**
 * Seeds the demo organisation once: its members (one per role), and the demo project with its
 * first layout revision and its two design scenarios. Idempotent: when the demo admin exists it
 * only adds scenarios that are missing.
 */
export async function seedDemo(): Promise<"created" | "exists"> {
  const db = getDb();
  const admin = DEMO_ACCOUNTS[0]!;
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, admin.email)).limit(1);
  if (existing) {
    await ensureDemoScenarios(existing.id);
    return "exists";
  }

  const hashes = await Promise.all(DEMO_ACCOUNTS.map((a) => hashPassword(a.password)));
  const organisationId = crypto.randomUUID();
  const userIds = DEMO_ACCOUNTS.map(() => crypto.randomUUID());
  const projectId = crypto.randomUUID();
  const layout = demoLayout();
  await db.transaction(async (tx) => {
    await tx.insert(organisations).values({ id: organisationId, name: DEMO_ORGANISATION });
    await tx.insert(users).values(DEMO_ACCOUNTS.map((a, i) => ({ id: userIds[i]!, email: a.email, name: a.name, passwordHash: hashes[i]! })));
    await tx.insert(memberships).values(DEMO_ACCOUNTS.map((a, i) => ({ userId: userIds[i]!, organisationId, role: a.role })));
    await tx.insert(projects).values({
      id: projectId,
      organisationId,
      name: DEMO_PROJECT_NAME,
      description: "Open office on the glazed south façade with a meeting room and a focus room; ceiling radiant panels, the window rows louvered.",
      headRevision: 1,
      createdBy: userIds[1]!,
    });
    await tx.insert(layoutRevisions).values({ projectId, number: 1, authorId: userIds[1]!, message: "First layout of level 3", layout });
    const occupantId = userIds[DEMO_ACCOUNTS.findIndex((a) => a.role === "occupant")]!;
    await tx.insert(seats).values(
      layout.seats.map((s, i) => ({ projectId, seatId: s.id, label: s.label, firstRevision: 1, lastRevision: 1, occupantUserId: i === 3 ? occupantId : null })),
    );
    await tx.insert(scenarios).values(DEMO_SCENARIOS.map((s) => ({ projectId, name: s.name, conditions: s.conditions, version: 1 })));
  });
  return "created";
}
