/**
 * Browser-test support: Debian's Chromium through playwright-core (no browser download),
 * against the app at BASE_URL (scripts/test.mjs starts it on the test database).
 */
import { mkdirSync } from "node:fs";
import path from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
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
