import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { layoutRevisions, memberships, organisations, projects, seats, users } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { DEMO_ACCOUNTS, DEMO_ORGANISATION } from "@/lib/demo/accounts";
import { demoLayout } from "@/lib/demo/layout";

/**
 * Seeds the demo organisation once: its members (one per role), and the demo project with its
 * first layout revision. Idempotent: does nothing when the demo admin exists.
 */
export async function seedDemo(): Promise<"created" | "exists"> {
  const db = getDb();
  const admin = DEMO_ACCOUNTS[0]!;
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, admin.email)).limit(1);
  if (existing) return "exists";

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
      name: "Quayside House — level 3",
      description: "Open office on the glazed south façade with a meeting room and a focus room; ceiling radiant panels, the window rows louvered.",
      headRevision: 1,
      createdBy: userIds[1]!,
    });
    await tx.insert(layoutRevisions).values({ projectId, number: 1, authorId: userIds[1]!, message: "First layout of level 3", layout });
    const occupantId = userIds[DEMO_ACCOUNTS.findIndex((a) => a.role === "occupant")]!;
    await tx.insert(seats).values(
      layout.seats.map((s, i) => ({ projectId, seatId: s.id, label: s.label, firstRevision: 1, lastRevision: 1, occupantUserId: i === 3 ? occupantId : null })),
    );
  });
  return "created";
}
