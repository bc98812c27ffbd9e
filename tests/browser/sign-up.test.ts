import { describe, expect, test } from "vitest";

import { BASE_URL, browserForFile, screenshot, uniqueRunId } from "@/tests/support/browser";
import { expectVisible } from "@/tests/browser/helpers";

const browser = browserForFile();

const runId = uniqueRunId();

describe("sign-up", () => {
  test("creates an organisation, lands on /projects with its name, and its first project can be created", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    try {
      const organisation = `Harbour Lofts ${runId}`;
      await page.goto(`${BASE_URL}/sign-up`);
      // Bad input first: the same schema as the API refuses it in the browser, field by field.
      await page.getByLabel("Your name").fill("Rin Tester");
      await page.getByLabel("E-mail").fill("not-an-address");
      await page.getByLabel("Password").fill("short");
      await page.getByLabel("Organisation name").fill(organisation);
      await page.getByRole("button", { name: "Create organisation" }).click();
      await page.getByText("enter a valid e-mail address").waitFor();
      await expectVisible(page.getByText("use at least 10 characters"));
      expect(new URL(page.url()).pathname).toBe("/sign-up");

      await page.getByLabel("E-mail").fill(`rin.${runId}@harbour.example`);
      await page.getByLabel("Password").fill("harbour-lofts-2");
      await page.getByRole("button", { name: "Create organisation" }).click();
      await page.waitForURL((url) => url.pathname === "/projects");
      await expectVisible(page.getByRole("heading", { level: 1, name: "Projects" }));
      await expect(page.getByTestId("organisation-name").textContent()).resolves.toBe(organisation);
      await expectVisible(page.getByText("Your organisation has no projects yet."));
      // The founder is the admin: Members is in the nav.
      await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Members" }).count()).resolves.toBe(1);
      await screenshot(page, "sign-up-landing");

      // A one-letter name is refused inline; nothing is created.
      await page.getByLabel("Project name").fill("X");
      await page.getByRole("button", { name: "Create project" }).click();
      await page.getByText("use at least 2 characters").waitFor();
      await expectVisible(page.getByText("Your organisation has no projects yet."));

      await page.getByLabel("Project name").fill("Studio floor");
      await page.getByLabel("Description").fill("Two rows of desks under chilled ceiling panels.");
      await page.getByRole("button", { name: "Create project" }).click();
      const listed = page.getByRole("region", { name: "Project list" }).getByRole("link", { name: "Studio floor" });
      await listed.waitFor();
      await expect(page.getByText("Your organisation has no projects yet.").count()).resolves.toBe(0);
      await expect(page.getByLabel("Project name").inputValue()).resolves.toBe("");

      await listed.click();
      await page.getByRole("heading", { level: 1, name: "Studio floor" }).waitFor();
      await page.getByRole("cell", { name: "Project created" }).waitFor();
      await expectVisible(page.getByRole("cell", { name: "Rin Tester" }));
      await expectVisible(page.getByText("Head layout (revision 1)"));
    } finally {
      await context.close();
    }
  });

  test("an e-mail that has an account is refused with the API's message on the field", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    try {
      await page.goto(`${BASE_URL}/sign-up`);
      await page.getByLabel("Your name").fill("Someone Else");
      await page.getByLabel("E-mail").fill("designer@quayside.example");
      await page.getByLabel("Password").fill("someone-else-1");
      await page.getByLabel("Organisation name").fill(`Copycat ${runId}`);
      await page.getByRole("button", { name: "Create organisation" }).click();
      await page.getByText("An account with this e-mail address exists already. Sign in instead.").waitFor();
      await expectVisible(page.getByText("already registered"));
      expect(new URL(page.url()).pathname).toBe("/sign-up");
    } finally {
      await context.close();
    }
  });

  test("an invitation to an e-mail that has an account asks for its current password, then joins", async () => {
    const existing = `kai.${runId}@harbour.example`;
    const inviter = await browser.newContext();
    const invitee = await browser.newContext();
    try {
      // Two organisations, each with its founder; the second invites the first's founder.
      const a = await invitee.request.post(`${BASE_URL}/api/auth/sign-up`, {
        data: { name: "Kai Existing", email: existing, password: "kai-existing-1", organisationName: `First Org ${runId}` },
      });
      expect(a.status()).toBe(201);
      await invitee.clearCookies();
      const b = await inviter.request.post(`${BASE_URL}/api/auth/sign-up`, {
        data: { name: "Bo Inviter", email: `bo.${runId}@harbour.example`, password: "bo-inviter-1", organisationName: `Second Org ${runId}` },
      });
      expect(b.status()).toBe(201);
      const adminPage = await inviter.newPage();
      await adminPage.goto(`${BASE_URL}/members`);
      const form = adminPage.getByRole("region", { name: "Invite" });
      await form.getByLabel("E-mail").fill(existing);
      await form.getByLabel("Role").selectOption("designer");
      await form.getByRole("button", { name: "Create invite link" }).click();
      const shown = new URL(await adminPage.getByLabel("Invite link").inputValue());

      const page = await invitee.newPage();
      await page.goto(`${BASE_URL}${shown.pathname}`);
      await expectVisible(page.getByRole("heading", { name: `Join Second Org ${runId}` }));
      await expect(page.getByLabel("Your name").count()).resolves.toBe(0);
      await page.getByLabel("Current password").fill("not-kais-password");
      await page.getByRole("button", { name: "Join organisation" }).click();
      await expectVisible(page.getByText("This e-mail has an account: enter its current password to join."));

      await page.getByLabel("Current password").fill("kai-existing-1");
      await page.getByRole("button", { name: "Join organisation" }).click();
      await page.waitForURL((u) => u.pathname === "/projects");
      await expect(page.getByTestId("organisation-name").textContent()).resolves.toBe(`Second Org ${runId}`);
      await expectVisible(page.getByRole("navigation", { name: "Main" }).getByText("Designer"));
    } finally {
      await inviter.close();
      await invitee.close();
    }
  });
});
