// `npm test`: the same set-up as `npm start` on a fresh test database, then lint, type-check,
// unit, integration, build and browser tests. Ends with one line `N passed, N failed`.
import { spawn } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, rmSync } from "node:fs";
import path from "node:path";
import {
  DATA_DIR, ROOT, ensureChromiumInstalled, ensureMariaDbInstalled, ensureNodeModules, log, provisionDatabase, run, startDatabase,
} from "./lib/env.mjs";

const RESULTS = path.join(DATA_DIR, "test-results");
const APP_PORT = Number(process.env.SEATWISE_TEST_PORT ?? 3100);
const bin = (name) => path.join(ROOT, "node_modules/.bin", name);
const tally = { passed: 0, failed: 0, lines: [], failures: [] };

function record(name, passed, failed) {
  tally.passed += passed;
  tally.failed += failed;
  tally.lines.push(`${failed === 0 ? "ok  " : "FAIL"} ${name}: ${passed} passed, ${failed} failed`);
}

/** A check that is one test: passes when the command exits 0. */
function check(name, cmd, args, env) {
  log(`${name}…`);
  const status = run(cmd, args, { env });
  record(name, status === 0 ? 1 : 0, status === 0 ? 0 : 1);
  return status === 0;
}

/** A vitest run: counts every test from its JSON report; a file that fails to load counts as a failure. */
function vitest(name, config, env) {
  log(`${name}…`);
  const outputFile = path.join(RESULTS, `${name.replace(/\W+/g, "-")}.json`);
  rmSync(outputFile, { force: true });
  const status = run(bin("vitest"), ["run", "--config", config, "--reporter=default", "--reporter=json", `--outputFile=${outputFile}`], { env });
  if (!existsSync(outputFile)) {
    record(name, 0, 1);
    return;
  }
  const report = JSON.parse(readFileSync(outputFile, "utf8"));
  const loadFailures = (report.testResults ?? []).filter((f) => f.status === "failed" && (f.assertionResults ?? []).length === 0).length;
  const failed = report.numFailedTests + loadFailures + (status !== 0 && report.numFailedTests + loadFailures === 0 ? 1 : 0);
  if (report.numTotalTests === 0) {
    record(`${name} (no tests found)`, 0, 1);
    return;
  }
  record(name, report.numPassedTests, failed);
  // Name each failure again in the summary, so the end of a long CI log says what broke.
  for (const file of report.testResults ?? []) {
    const where = path.relative(ROOT, file.name);
    const failedTests = (file.assertionResults ?? []).filter((a) => a.status === "failed");
    if (file.status === "failed" && failedTests.length === 0) tally.failures.push(`${where}: ${firstLine(file.message) || "failed to load"}`);
    for (const a of failedTests) tally.failures.push(`${where} › ${a.fullName ?? a.title}: ${firstLine(a.failureMessages?.[0])}`);
  }
}

function firstLine(text) {
  return String(text ?? "").split("\n").find((line) => line.trim() !== "")?.trim().slice(0, 300) ?? "";
}

async function waitForHealth(url) {
  for (let i = 0; i < 150; i += 1) {
    try {
      const res = await fetch(url);
      if (res.ok) return true;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return false;
}

async function main() {
  mkdirSync(RESULTS, { recursive: true });
  ensureNodeModules();
  let databaseUrl = process.env.TEST_DATABASE_URL;
  if (!databaseUrl) {
    ensureMariaDbInstalled();
    await startDatabase();
    databaseUrl = provisionDatabase("seatwise_test", { fresh: true });
  }
  ensureChromiumInstalled();
  const env = { ...process.env, DATABASE_URL: databaseUrl, NEXT_TELEMETRY_DISABLED: "1" };

  if (!check("migrations", bin("tsx"), ["scripts/migrate.ts"], env)) return finish();
  // The worker threads' bundle (lib/workers), used by integration tests and the built app.
  check("worker bundle", process.execPath, ["scripts/build-workers.mjs"], env);
  check("lint", bin("eslint"), [".", "--max-warnings", "0"], env);
  check("type-check", bin("tsc"), ["--noEmit", "-p", "tsconfig.json"], env);
  vitest("unit and reference tests", "vitest.config.ts", env);
  vitest("integration tests", "vitest.integration.config.ts", env);
  const built = check("next build", bin("next"), ["build"], env);
  if (built) await browserTests(env);
  else record("browser tests (not run: the build failed)", 0, 1);
  finish();
}

async function browserTests(env) {
  if (!check("seed demo into the test database", bin("tsx"), ["--conditions=react-server", "scripts/seed.ts"], env)) return;
  const { startSmtpFake } = await import("./lib/smtp-fake.mjs");
  const smtp = await startSmtpFake({ port: 0 });
  const baseUrl = `http://127.0.0.1:${APP_PORT}`;
  const server = spawn(bin("next"), ["start", "-p", String(APP_PORT), "-H", "127.0.0.1"], {
    cwd: ROOT,
    env: { ...env, NODE_ENV: "production", SMTP_URL: `smtp://127.0.0.1:${smtp.port}`, APP_URL: baseUrl },
    stdio: ["ignore", "ignore", "inherit"],
    detached: true,
  });
  try {
    if (!(await waitForHealth(`${baseUrl}/api/health`))) {
      record("browser tests (the app did not start)", 0, 1);
      return;
    }
    vitest("browser tests", "vitest.browser.config.ts", { ...env, BASE_URL: baseUrl });
  } finally {
    try {
      process.kill(-server.pid, "SIGTERM");
    } catch {
      // already gone
    }
    await smtp.close();
  }
}

function finish() {
  if (tally.failures.length > 0) console.log("\nFailed tests:\n" + tally.failures.map((f) => `  ${f}`).join("\n"));
  console.log("\n" + tally.lines.join("\n"));
  console.log(`${tally.passed} passed, ${tally.failed} failed`);
  process.exit(tally.failed === 0 && tally.passed > 0 ? 0 : 1);
}

main().catch((error) => {
  console.error(`[seatwise] ${error.stack ?? error.message}`);
  record("set-up", 0, 1);
  finish();
});
