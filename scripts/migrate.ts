// Applies the Drizzle migrations in drizzle/ to DATABASE_URL.
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import mysql from "mysql2/promise";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const connection = await mysql.createConnection({ uri: url, timezone: "Z", multipleStatements: true });
await migrate(drizzle(connection), { migrationsFolder: new URL("../drizzle", import.meta.url).pathname });
await connection.end();
console.log("[seatwise] migrations applied");
