import "server-only";
import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import * as schema from "./schema";

export type Database = MySql2Database<typeof schema>;

function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set: start the app with `npm start`, or set it to your MariaDB.");
  return url;
}

function createPool(): mysql.Pool {
  return mysql.createPool({
    uri: databaseUrl(),
    timezone: "Z",
    connectionLimit: Number(process.env.DATABASE_POOL_SIZE ?? 10),
    dateStrings: false,
  });
}

const globalForDb = globalThis as unknown as { seatwisePool?: mysql.Pool; seatwiseDb?: Database };

/** The one pool, cached on globalThis so hot reload in development does not leak pools. */
export function pool(): mysql.Pool {
  globalForDb.seatwisePool ??= createPool();
  return globalForDb.seatwisePool;
}

/** The one Drizzle client. Created lazily so `next build` needs no database. */
export function getDb(): Database {
  globalForDb.seatwiseDb ??= drizzle(pool(), { schema, mode: "default" });
  return globalForDb.seatwiseDb;
}

export type Transaction = Parameters<Parameters<Database["transaction"]>[0]>[0];
export { schema };
