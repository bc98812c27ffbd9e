import { describe, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { expectVisible } from "@/tests/browser/helpers";
import { demoAccount, browserForFile, screenshot, signInThroughPage } from "@/tests/support/browser";

const DEMO_PROJECT = "Quayside House — level 3";
const SEAT = "Desk B2";

const browser = browserForFile();

async function asRole(role: "facility_manager" | "designer" | "occupant", fn: (page: Page) => Promise<void>): Promise<void> {
  const context = await browser.newContext();
  try {
    const page = await context.newPage();
    const account = demoAccount(role);
    await signInThroughPage(page, account.email, account.password);
    await fn(page);
  } finally {
    await context.close();
  }
}

async function openSeats(page: Page): Promise<void> {
  await page.getByRole("link", { name: DEMO_PROJECT }).click();
  await page.getByRole("link", { name: "Seats", exact: true }).click();
  await expectVisible(page.getByRole("heading", { level: 1, name: "Seats and occupants" }));
}

describe("seats and occupants", () => {
  test("the facility manager assigns a seat and the occupant sees it on their home", async () => {
    const occupant = demoAccount("occupant");
    await asRole("facility_manager", async (page) => {
      await openSeats(page);
      await page.getByLabel(`Occupant of ${SEAT}`).selectOption({ label: `${occupant.name} (${occupant.email})` });
      await expectVisible(page.getByText(`${SEAT} is now ${occupant.name}'s seat.`));
      await screenshot(page, "seats-assigned");
    });
    await asRole("occupant", async (page) => {
      await expectVisible(page.getByText(SEAT));
    });
    // Put the demo back as it was.
    await asRole("facility_manager", async (page) => {
      await openSeats(page);
      await page.getByLabel(`Occupant of ${SEAT}`).selectOption({ label: "Unassigned" });
      await expectVisible(page.getByText(`${SEAT} is unassigned.`));
    });
    await asRole("occupant", async (page) => {
      await expectVisible(page.getByRole("heading", { name: "My seats" }));
      await expect(page.getByText(SEAT).count()).resolves.toBe(0);
    });
  });

  test("a designer sees the seats read-only", async () => {
    await asRole("designer", async (page) => {
      await openSeats(page);
      await expectVisible(page.getByText("Read-only for your role."));
      await expect(page.getByLabel(`Occupant of ${SEAT}`).count()).resolves.toBe(0);
    });
  });
});
