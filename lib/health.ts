import "server-only";
import { sql } from "drizzle-orm";
import { getDb } from "@/db/client";

/** True when the database answers a trivial query. */
export async function databaseReachable(): Promise<boolean> {
  try {
    await getDb().execute(sql`select 1`);
    return true;
  } catch {
    return false;
  }
}
