import { describe, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { BASE_URL, demoAccount, browserForFile, screenshot, signInThroughPage, uniqueRunId } from "@/tests/support/browser";
import { expectVisible } from "@/tests/browser/helpers";

const browser = browserForFile();

const runId = uniqueRunId();

async function signedInAdmin(): Promise<{ page: Page; close: () => Promise<void> }> {
  const context = await browser.newContext();
  const page = await context.newPage();
  const admin = demoAccount("admin");
  await signInThroughPage(page, admin.email, admin.password);
  await page.goto(`${BASE_URL}/members`);
  await page.getByRole("heading", { level: 1, name: "Members" }).waitFor();
  return { page, close: () => context.close() };
}

/**
 * Invites through the form and returns the shown link, re-based on BASE_URL: the API builds it
 * from the server's own origin, which under `next start -H 127.0.0.1` reads "localhost".
 */
async function invite(page: Page, email: string, roleLabel: string): Promise<string> {
  const form = page.getByRole("region", { name: "Invite" });
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Role").selectOption({ label: roleLabel });
  await form.getByRole("button", { name: "Create invite link" }).click();
  const link = page.getByLabel("Invite link");
  await link.waitFor();
  const shown = new URL(await link.inputValue());
  expect(shown.pathname).toMatch(/^\/invite\/[A-Za-z0-9_-]{10,}$/);
  return `${BASE_URL}${shown.pathname}`;
}

describe("members page (admin)", () => {
  test("lists the demo members with their roles", async () => {
    const { page, close } = await signedInAdmin();
    try {
      for (const role of ["admin", "designer", "facility_manager", "occupant"] as const) {
        const account = demoAccount(role);
        await expectVisible(page.getByRole("cell", { name: account.email }));
      }
      await expect(page.getByLabel(`Role of ${demoAccount("designer").name}`).inputValue()).resolves.toBe("designer");
    } finally {
      await close();
    }
  });

  test("invite: the link is shown, the invitation is pending, and the invitee joins through it", async () => {
    const { page, close } = await signedInAdmin();
    const email = `new.occupant.${runId}@quayside.example`;
    try {
      const url = await invite(page, email, "Occupant");
      await expectVisible(page.getByText(`Invitation for ${email} created.`));
      await page.getByRole("region", { name: "Pending invitations" }).getByText(email).waitFor();
      await screenshot(page, "members-invite-link");

      const invitee = await browser.newContext();
      try {
        const joinPage = await invitee.newPage();
        await joinPage.goto(url);
        await expectVisible(joinPage.getByText(email));
        await expectVisible(joinPage.getByText("Occupant", { exact: true }));
        await joinPage.getByLabel("Your name").fill("Nia Newcomer");
        await joinPage.getByLabel("Password").fill("nia-newcomer-1");
        await joinPage.getByRole("button", { name: "Join organisation" }).click();
        await joinPage.waitForURL((u) => u.pathname === "/my-seats");
        await expectVisible(joinPage.getByText("No seat is assigned to you yet."));

        // A used link says so.
        await joinPage.goto(url);
        await expectVisible(joinPage.getByText("This invitation has been used already."));
      } finally {
        await invitee.close();
      }

      // Back on the admin's page: the new member appears after a reload, the invitation is gone.
      await page.reload();
      await page.getByRole("cell", { name: email }).waitFor();
      await expect(page.getByRole("region", { name: "Pending invitations" }).getByText(email).count()).resolves.toBe(0);
    } finally {
      await close();
    }
  });

  test("revoke: a revoked invitation disappears and its link stops working", async () => {
    const { page, close } = await signedInAdmin();
    const email = `revoked.${runId}@quayside.example`;
    try {
      const url = await invite(page, email, "Designer");
      const pending = page.getByRole("region", { name: "Pending invitations" });
      await pending.getByText(email).waitFor();
      await pending.getByRole("button", { name: `Revoke invitation for ${email}` }).click();
      await page.getByText(`The invitation for ${email} was revoked`).waitFor();
      await expect(pending.getByText(email).count()).resolves.toBe(0);
      await page.goto(url);
      await expectVisible(page.getByText("This invitation link is not valid."));
    } finally {
      await close();
    }
  });

  test("inviting a current member shows the API's 409 on the e-mail field", async () => {
    const { page, close } = await signedInAdmin();
    try {
      const form = page.getByRole("region", { name: "Invite" });
      await form.getByLabel("E-mail").fill(demoAccount("designer").email);
      await form.getByRole("button", { name: "Create invite link" }).click();
      await form.getByText("This person is a member already.").waitFor();
      await expectVisible(form.getByText("already a member"));
      await expect(page.getByLabel("Invite link").count()).resolves.toBe(0);
    } finally {
      await close();
    }
  });

  test("demoting the only admin is refused with the 409 message and the role stays", async () => {
    const { page, close } = await signedInAdmin();
    try {
      const admin = demoAccount("admin");
      const select = page.getByLabel(`Role of ${admin.name}`);
      await select.selectOption("designer");
      await page.getByText("An organisation needs at least one admin.").waitFor();
      await expect(select.inputValue()).resolves.toBe("admin");
      await page.reload();
      await expect(page.getByLabel(`Role of ${admin.name}`).inputValue()).resolves.toBe("admin");
    } finally {
      await close();
    }
  });

  test("change a role, then remove the member after confirming", async () => {
    const { page, close } = await signedInAdmin();
    const email = `temp.${runId}@quayside.example`;
    try {
      // A throwaway member, so the demo accounts stay as they are.
      const url = await invite(page, email, "Occupant");
      const invitee = await browser.newContext();
      const joinPage = await invitee.newPage();
      await joinPage.goto(url);
      await joinPage.getByLabel("Your name").fill(`Temp ${runId}`);
      await joinPage.getByLabel("Password").fill("temporary-member-1");
      await joinPage.getByRole("button", { name: "Join organisation" }).click();
      await joinPage.waitForURL((u) => u.pathname === "/my-seats");

      await page.reload();
      const select = page.getByLabel(`Role of Temp ${runId}`);
      await select.selectOption("facility_manager");
      await page.getByText(`Temp ${runId} is now facility manager.`).waitFor();
      await page.reload();
      await expect(page.getByLabel(`Role of Temp ${runId}`).inputValue()).resolves.toBe("facility_manager");

      page.once("dialog", (dialog) => void dialog.accept());
      await page.getByRole("button", { name: `Remove Temp ${runId}` }).click();
      await page.getByText(`Temp ${runId} was removed from the organisation.`).waitFor();
      await expect(page.getByRole("cell", { name: email }).count()).resolves.toBe(0);

      // The removed member's session stops working at once.
      await joinPage.goto(`${BASE_URL}/my-seats`);
      expect(new URL(joinPage.url()).pathname).toBe("/sign-in");
      await invitee.close();
    } finally {
      await close();
    }
  });
});
