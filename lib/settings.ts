import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import type { Member } from "@/lib/auth/session";

/** The member's own display settings; everything is stored in SI whatever the choice. */
export const settingsPatch = z.strictObject({
  unitSystem: z.enum(["si", "ip"], "choose \"si\" or \"ip\""),
});

export type SettingsPatch = z.infer<typeof settingsPatch>;

export interface UserSettings {
  unitSystem: "si" | "ip";
}

export async function updateSettings(member: Member, patch: SettingsPatch): Promise<UserSettings> {
  const db = getDb();
  return db.transaction(async (tx) => {
    await tx.update(users).set({ unitSystem: patch.unitSystem }).where(eq(users.id, member.userId));
    const [row] = await tx.select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, member.userId)).limit(1);
    return { unitSystem: row?.unitSystem ?? patch.unitSystem };
  });
}
