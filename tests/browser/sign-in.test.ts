import { describe, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { BASE_URL, demoAccount, browserForFile, screenshot, signInThroughPage } from "@/tests/support/browser";
import { expectVisible } from "@/tests/browser/helpers";
import { DEMO_ORGANISATION } from "@/lib/demo/accounts";
import { ROLE_LABELS, type Role } from "@/lib/auth/roles";

const DEMO_PROJECT = "Quayside House — level 3";
/** The seed assigns this seat to the demo occupant. */
const OCCUPANT_SEAT = "Desk A4";

const browser = browserForFile();

async function withPage(fn: (page: Page) => Promise<void>): Promise<void> {
  const context = await browser.newContext();
  try {
    await fn(await context.newPage());
  } finally {
    await context.close();
  }
}

const STAFF: readonly Role[] = ["admin", "designer", "facility_manager"];

describe("signing in through /sign-in lands each role on its own home", () => {
  for (const role of STAFF) {
    test(`${role} lands on /projects with the demo project listed`, async () => {
      await withPage(async (page) => {
        const account = demoAccount(role);
        await signInThroughPage(page, account.email, account.password);
        expect(new URL(page.url()).pathname).toBe("/projects");
        await expectVisible(page.getByRole("heading", { level: 1, name: "Projects" }));
        await expectVisible(page.getByRole("link", { name: DEMO_PROJECT }));
        await expect(page.getByTestId("organisation-name").textContent()).resolves.toBe(DEMO_ORGANISATION);
        const nav = page.getByRole("navigation", { name: "Main" });
        await expectVisible(nav.getByText(account.name));
        await expectVisible(nav.getByText(ROLE_LABELS[role]));
        // The shell offers Members only to the role the permission table allows.
        await expect(nav.getByRole("link", { name: "Members" }).count()).resolves.toBe(role === "admin" ? 1 : 0);
        // Only planners get the create form.
        await expect(page.getByRole("button", { name: "Create project" }).count()).resolves.toBe(role === "facility_manager" ? 0 : 1);
        await expectVisible(page.getByText("they do not replace licensed engineering judgement or local codes"));
        await screenshot(page, `home-${role}`);
      });
    });
  }

  test("occupant lands on /my-seats with the assigned seat", async () => {
    await withPage(async (page) => {
      const account = demoAccount("occupant");
      await signInThroughPage(page, account.email, account.password);
      expect(new URL(page.url()).pathname).toBe("/my-seats");
      await expectVisible(page.getByRole("heading", { level: 1, name: "My seats" }));
      await expectVisible(page.getByText(OCCUPANT_SEAT, { exact: true }));
      await expectVisible(page.getByText(DEMO_PROJECT));
      const nav = page.getByRole("navigation", { name: "Main" });
      await expect(nav.getByRole("link", { name: "Projects" }).count()).resolves.toBe(0);
      await expect(nav.getByRole("link", { name: "Members" }).count()).resolves.toBe(0);
      await screenshot(page, "home-occupant");
    });
  });
});

describe("refusals", () => {
  test("a wrong password shows the API's message inline and stays on /sign-in", async () => {
    await withPage(async (page) => {
      const account = demoAccount("designer");
      await page.goto(`${BASE_URL}/sign-in`);
      await page.getByLabel("E-mail").fill(account.email);
      await page.getByLabel("Password").fill(`${account.password}-wrong`);
      await page.getByRole("button", { name: "Sign in" }).click();
      const alert = page.getByRole("status").filter({ hasText: "E-mail or password is not right." });
      await alert.waitFor();
      expect(new URL(page.url()).pathname).toBe("/sign-in");
      await expect(page.getByLabel("Password").inputValue()).resolves.toBe(`${account.password}-wrong`);
    });
  });

  test("an empty form is refused in the browser with inline field errors", async () => {
    await withPage(async (page) => {
      await page.goto(`${BASE_URL}/sign-in`);
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.getByText("enter a valid e-mail address").waitFor();
      await expectVisible(page.getByText("enter your password"));
      await expect(page.getByLabel("E-mail").getAttribute("aria-invalid")).resolves.toBe("true");
      expect(new URL(page.url()).pathname).toBe("/sign-in");
    });
  });

  test("an occupant opening /members is refused with a 404 inside the shell", async () => {
    await withPage(async (page) => {
      const account = demoAccount("occupant");
      await signInThroughPage(page, account.email, account.password);
      const response = await page.goto(`${BASE_URL}/members`);
      expect(response?.status()).toBe(404);
      await expectVisible(page.getByRole("heading", { level: 1, name: "Not available" }));
      await expectVisible(page.getByText("your role does not give access to it"));
      await expect(page.getByText(demoAccount("admin").email).count()).resolves.toBe(0);
      await screenshot(page, "occupant-members-refused");
    });
  });

  test("a signed-out visitor opening /members goes to /sign-in", async () => {
    await withPage(async (page) => {
      await page.goto(`${BASE_URL}/members`);
      expect(new URL(page.url()).pathname).toBe("/sign-in");
    });
  });
});

describe("signing out", () => {
  test("sign out returns to /sign-in, and /projects then redirects to /sign-in", async () => {
    await withPage(async (page) => {
      const account = demoAccount("designer");
      await signInThroughPage(page, account.email, account.password);
      expect(new URL(page.url()).pathname).toBe("/projects");
      await page.getByRole("button", { name: "Sign out" }).click();
      await page.waitForURL((url) => url.pathname === "/sign-in");
      await page.getByRole("button", { name: "Sign in" }).waitFor();
      await page.goto(`${BASE_URL}/projects`);
      expect(new URL(page.url()).pathname).toBe("/sign-in");
      // The old session is gone on the server, not only from this browser's cookie jar.
      const session = await page.request.get(`${BASE_URL}/api/auth/session`);
      expect(session.status()).toBe(401);
    });
  });
});

describe("project overview", () => {
  test("staff open the demo project: counts of the head layout, revisions and the Open plan link", async () => {
    await withPage(async (page) => {
      const account = demoAccount("facility_manager");
      await signInThroughPage(page, account.email, account.password);
      await page.getByRole("link", { name: DEMO_PROJECT }).click();
      await page.waitForURL((url) => /^\/projects\/[0-9a-f-]{36}$/.test(url.pathname));
      await expectVisible(page.getByRole("heading", { level: 1, name: DEMO_PROJECT }));
      const counts = page.locator("dl").filter({ hasText: "Rooms" });
      await expect(counts.locator("div").filter({ hasText: "Seats" }).locator("dd").textContent()).resolves.toBe("48");
      await expect(counts.locator("div").filter({ hasText: "Rooms" }).locator("dd").textContent()).resolves.toBe("3");
      await page.getByRole("cell", { name: "First layout of level 3" }).waitFor();
      await expectVisible(page.getByRole("cell", { name: demoAccount("designer").name }));
      const plan = page.getByRole("link", { name: "Open plan" });
      expect(await plan.getAttribute("href")).toBe(`${new URL(page.url()).pathname}/plan`);
      await screenshot(page, "project-overview");
    });
  });

  test("an unknown project id is a 404", async () => {
    await withPage(async (page) => {
      const account = demoAccount("designer");
      await signInThroughPage(page, account.email, account.password);
      const response = await page.goto(`${BASE_URL}/projects/${crypto.randomUUID()}`);
      expect(response?.status()).toBe(404);
      await expectVisible(page.getByRole("heading", { level: 1, name: "Not available" }));
    });
  });
});
