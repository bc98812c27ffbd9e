/**
 * Browser-test support: Debian's Chromium through playwright-core (no browser download),
 * against the app at BASE_URL (scripts/test.mjs starts it on the test database).
 */
import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll } from "vitest";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { DEMO_ACCOUNTS } from "@/lib/demo/accounts";
import type { Role } from "@/lib/auth/roles";

export const BASE_URL = process.env.BASE_URL ?? "http://127.0.0.1:3100";
/** Screenshots are kept as test artifacts here. */
export const ARTIFACTS_DIR = path.resolve(".data/test-results/screenshots");

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
      "--disable-dev-shm-usage",
      // No --user-data-dir: playwright refuses it in launch() and gives every launch a fresh
      // temporary profile of its own.
    ],
  });
}

/**
 * One browser for a test file: launched before its tests, closed after them. Call at the top
 * level of the file; the tests open their own contexts (cookie jars) from it.
 */
export function browserForFile(): { newContext(options?: Parameters<Browser["newContext"]>[0]): Promise<BrowserContext> } {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return {
    newContext(options) {
      if (!browser) throw new Error("browserForFile: the browser starts in beforeAll; open contexts inside tests or hooks");
      return browser.newContext(options);
    },
  };
}

/** Unique per run (base-36 time and a random part), so a test passes again on the same database. */
export function uniqueRunId(): string {
  return `${Date.now().toString(36)}${Math.floor(Math.random() * 1e6).toString(36)}`;
}

export function demoAccount(role: Role) {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role);
  if (!account) throw new Error(`no demo account for ${role}`);
  return account;
}

/** Signs in through the sign-in page and waits for the landing page. */
export async function signInThroughPage(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS_DIR, { recursive: true });
  const file = path.join(ARTIFACTS_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
