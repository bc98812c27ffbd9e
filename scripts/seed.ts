// Seeds the demo organisation into DATABASE_URL (idempotent). Run with --conditions=react-server.
import { pool } from "@/db/client";
import { seedDemo } from "@/lib/demo/seed";

const result = await seedDemo();
console.log(result === "created" ? "[seatwise] demo organisation seeded" : "[seatwise] demo organisation present already");
await pool().end();
