import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { eq } from "drizzle-orm";
import type { BrowserContext } from "playwright-core";
import { getDb, pool } from "@/db/client";
import { passwordResets, users } from "@/db/schema";
import { generateToken, hashToken } from "@/lib/auth/tokens";
import { BASE_URL, browserForFile, signInThroughPage, uniqueRunId } from "@/tests/support/browser";
import { expectVisible } from "@/tests/browser/helpers";

/**
 * The reset pages, end to end against the app. The e-mail step is replaced by writing the reset
 * row straight into the app's database (DATABASE_URL), as the e-mail's link is the only thing
 * the page needs from it.
 */

const browser = browserForFile();
let context: BrowserContext;

const runId = uniqueRunId();
const email = `reset.${runId}@harbour.example`;
const oldPassword = "first-password-1";
const newPassword = "second-password-2";

/** Stores a reset for the test user and returns the token its link would carry. */
async function resetLink(opts: { expiresInMs?: number } = {}): Promise<string> {
  const [user] = await getDb().select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1);
  if (!user) throw new Error("the test user was not created");
  const token = generateToken();
  await getDb()
    .insert(passwordResets)
    .values({ userId: user.id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + (opts.expiresInMs ?? 3_600_000)) });
  return token;
}

beforeAll(async () => {
  const setup = await browser.newContext();
  const res = await setup.request.post(`${BASE_URL}/api/auth/sign-up`, {
    data: { name: "Reese Reset", email, password: oldPassword, organisationName: `Reset Works ${runId}` },
  });
  expect(res.status()).toBe(201);
  await setup.close();
});

afterAll(async () => {
  await pool().end();
});

describe("password reset pages", () => {
  test("forgot-password answers with the confirmation, whatever the address", async () => {
    context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${BASE_URL}/sign-in`);
    await page.getByRole("link", { name: "Forgot your password?" }).click();
    await page.waitForURL((u) => u.pathname === "/forgot-password");
    await expectVisible(page.getByRole("heading", { name: "Reset your password" }));
    await page.getByLabel("E-mail").fill("nobody-here@harbour.example");
    await page.getByRole("button", { name: "Send reset link" }).click();
    await expectVisible(page.getByText("If the address has an account, a reset link is on its way."));
    await context.close();
  });

  test("a valid link sets the new password once; the old password stops working; the link is then used", async () => {
    context = await browser.newContext();
    const page = await context.newPage();
    const token = await resetLink();
    await page.goto(`${BASE_URL}/reset-password/${token}`);
    await page.getByLabel("New password").fill("short");
    await page.getByRole("button", { name: "Set new password" }).click();
    await expectVisible(page.getByText("use at least 10 characters"));

    await page.getByLabel("New password").fill(newPassword);
    await page.getByRole("button", { name: "Set new password" }).click();
    await expectVisible(page.getByText("Password changed. Sign in with the new password."));
    await page.getByRole("link", { name: "Go to sign in" }).click();
    await page.waitForURL((u) => u.pathname === "/sign-in");
    await expectVisible(page.getByRole("heading", { name: "Sign in" }));

    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(oldPassword);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expectVisible(page.getByText("E-mail or password is not right."));

    await signInThroughPage(page, email, newPassword);
    expect(new URL(page.url()).pathname).toBe("/projects");

    const again = await browser.newContext();
    const second = await again.newPage();
    await second.goto(`${BASE_URL}/reset-password/${token}`);
    await second.getByLabel("New password").fill("third-password-3");
    await second.getByRole("button", { name: "Set new password" }).click();
    await expectVisible(second.getByText("This reset link has been used already."));
    await expectVisible(second.getByRole("link", { name: "Ask for a new reset link" }));
    await again.close();
    await context.close();
  });

  test("an expired link shows the API's 410 message", async () => {
    context = await browser.newContext();
    const page = await context.newPage();
    const token = await resetLink({ expiresInMs: -60_000 });
    await page.goto(`${BASE_URL}/reset-password/${token}`);
    await page.getByLabel("New password").fill("fourth-password-4");
    await page.getByRole("button", { name: "Set new password" }).click();
    await expectVisible(page.getByText("This reset link has expired. Ask for a new one."));
    await context.close();
  });

  test("an unknown link shows the 404 message; a malformed one shows no form", async () => {
    context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${BASE_URL}/reset-password/${generateToken()}`);
    await page.getByLabel("New password").fill("fifth-password-5");
    await page.getByRole("button", { name: "Set new password" }).click();
    await expectVisible(page.getByText("This reset link is not valid."));

    await page.goto(`${BASE_URL}/reset-password/short`);
    await expectVisible(page.getByText("This reset link is not valid."));
    await expect(page.getByLabel("New password").count()).resolves.toBe(0);
    await context.close();
  });
});
