// `npm start`: installs what is missing, starts the project's MariaDB, migrates, seeds the demo,
// builds and serves Seatwise. Running it again keeps the data.
import { spawn, spawnSync } from "node:child_process";
import path from "node:path";
import {
  DATA_DIR, ROOT, ensureMariaDbInstalled, ensureNodeModules, log, provisionDatabase, run, startDatabase,
} from "./lib/env.mjs";

const PORT = Number(process.env.PORT ?? 3000);
const SMTP_PORT = Number(process.env.SEATWISE_SMTP_PORT ?? 2525);

async function main() {
  ensureNodeModules();
  let databaseUrl = process.env.DATABASE_URL;
  if (databaseUrl) {
    log("using DATABASE_URL from the environment");
  } else {
    ensureMariaDbInstalled();
    await startDatabase();
    databaseUrl = provisionDatabase("seatwise");
  }
  const env = { ...process.env, DATABASE_URL: databaseUrl, NEXT_TELEMETRY_DISABLED: "1" };
  const tsx = path.join(ROOT, "node_modules/.bin/tsx");
  if (run(tsx, ["scripts/migrate.ts"], { env }) !== 0) throw new Error("migrations failed");
  const seed = spawnSync(tsx, ["--conditions=react-server", "scripts/seed.ts"], { cwd: ROOT, env, encoding: "utf8", stdio: ["ignore", "pipe", "inherit"] });
  if (seed.status !== 0) throw new Error("seeding failed");
  process.stdout.write(seed.stdout);

  let smtpUrl = process.env.SMTP_URL;
  if (!smtpUrl) {
    const { startSmtpFake } = await import("./lib/smtp-fake.mjs");
    const mailDir = path.join(DATA_DIR, "mailbox");
    const fake = await startSmtpFake({ port: SMTP_PORT, dir: mailDir });
    fake.onMessage((m) => log(`e-mail to ${m.to}: ${m.subject}\n${m.text}`));
    smtpUrl = `smtp://127.0.0.1:${fake.port}`;
    log(`local SMTP fake on ${smtpUrl}; messages are printed here and kept in .data/mailbox/`);
  }

  log("building the worker bundle and the app (next build)…");
  if (run(process.execPath, ["scripts/build-workers.mjs"], { env }) !== 0) throw new Error("worker bundle failed");
  if (run(path.join(ROOT, "node_modules/.bin/next"), ["build"], { env }) !== 0) throw new Error("next build failed");

  const server = spawn(path.join(ROOT, "node_modules/.bin/next"), ["start", "-p", String(PORT), "-H", "127.0.0.1"], {
    cwd: ROOT,
    env: { ...env, NODE_ENV: "production", SMTP_URL: smtpUrl, APP_URL: process.env.APP_URL ?? `http://127.0.0.1:${PORT}` },
    stdio: ["ignore", "inherit", "inherit"],
  });
  const stop = () => {
    server.kill("SIGTERM");
    process.exit(0);
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
  server.on("exit", (code) => process.exit(code ?? 0));

  for (let i = 0; i < 100; i += 1) {
    try {
      const res = await fetch(`http://127.0.0.1:${PORT}/api/health`);
      if (res.ok) break;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  const accounts = spawnSync(tsx, ["scripts/print-accounts.ts"], { cwd: ROOT, encoding: "utf8" });
  log(`Seatwise is running at http://127.0.0.1:${PORT}  (Ctrl+C stops the app; \`npm run db:stop\` stops the database)`);
  process.stdout.write(accounts.stdout);
}

main().catch((error) => {
  console.error(`\n[seatwise] ${error.message}`);
  process.exit(1);
});
