import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { BASE_URL, demoAccount, browserForFile, screenshot, signInThroughPage } from "@/tests/support/browser";
import { expectVisible } from "@/tests/browser/helpers";

const DEMO_PROJECT = "Quayside House — level 3";

const browser = browserForFile();
let projectId = "";

async function signedIn(role: "designer" | "facility_manager"): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: { width: 1300, height: 1000 } });
  const page = await context.newPage();
  const account = demoAccount(role);
  await signInThroughPage(page, account.email, account.password);
  if (!projectId) {
    const projects = (await (await page.request.get(`${BASE_URL}/api/projects`)).json()) as { projects: { id: string; name: string }[] };
    projectId = projects.projects.find((p) => p.name === DEMO_PROJECT)?.id ?? "";
  }
  return { context, page };
}

async function scenarioNames(page: Page): Promise<string[]> {
  const body = (await (await page.request.get(`${BASE_URL}/api/projects/${projectId}/scenarios`)).json()) as { scenarios: { name: string }[] };
  return body.scenarios.map((s) => s.name);
}

beforeAll(async () => {
});

afterAll(async () => {
});

describe("design scenarios editor", () => {
  test("a designer creates a scenario: errors inline, a duplicate name refused, U-value shows the inside surface temperature", async () => {
    const { context, page } = await signedIn("designer");
    try {
      await page.goto(`${BASE_URL}/projects/${projectId}/scenarios`);
      await expectVisible(page.getByRole("heading", { level: 1, name: "Design scenarios" }));
      // The first scenario opens for editing with its stored values.
      await expectVisible(page.getByLabel("Scenario name"));
      const before = await scenarioNames(page);

      await page.getByRole("button", { name: "New scenario" }).click();
      const form = page.getByRole("form", { name: "New scenario" });
      await form.getByLabel("Scenario name").fill("");
      await form.getByLabel("Air temperature (°C)").fill("99");
      await form.getByRole("button", { name: "Create scenario" }).click();
      await expectVisible(form.getByText("enter a name"));
      await expectVisible(form.getByText("outside the allowed range"));
      expect(await scenarioNames(page)).toEqual(before);

      // A name the project has already: the server's 409 lands on the name field.
      await form.getByLabel("Scenario name").fill("Winter design");
      await form.getByLabel("Air temperature (°C)").fill("21");
      await form.getByRole("button", { name: "Create scenario" }).click();
      await expectVisible(form.getByText("already used in this project"));
      expect(await scenarioNames(page)).toEqual(before);

      // Exterior walls by U-value: the inside surface temperature follows (ISO 6946, R_si 0.13).
      await form.getByLabel("Outdoor temperature (°C)").fill("-10");
      await form.getByLabel("Exterior walls: U-value (W/(m²·K))").fill("1");
      // 21 − 1 × 0.13 × (21 − (−10)) = 16.97 → "17 °C"
      await expectVisible(form.getByText("17 °C"));

      const name = `Cold snap ${Date.now()}`;
      await form.getByLabel("Scenario name").fill(name);
      await form.getByRole("button", { name: "Create scenario" }).click();
      await expectVisible(page.getByRole("form", { name: `Edit scenario ${name}` }), 15_000);
      expect(await scenarioNames(page)).toContain(name);
      const stored = (await (await page.request.get(`${BASE_URL}/api/projects/${projectId}/scenarios`)).json()) as {
        scenarios: { name: string; conditions: { airTemperatureC: number; outdoorTemperatureC: number; surfaces: { exteriorWalls: unknown } } }[];
      };
      const created = stored.scenarios.find((s) => s.name === name);
      expect(created?.conditions.airTemperatureC).toBe(21);
      expect(created?.conditions.outdoorTemperatureC).toBe(-10);
      expect(created?.conditions.surfaces.exteriorWalls).toEqual({ kind: "uValue", uValueWm2K: 1 });
      await screenshot(page, "scenarios-created");
    } finally {
      await context.close();
    }
  });

  test("values are typed in °F for a member using IP and stored in °C", async () => {
    const { context, page } = await signedIn("designer");
    try {
      await page.request.patch(`${BASE_URL}/api/me/settings`, { data: { unitSystem: "ip" } });
      await page.goto(`${BASE_URL}/projects/${projectId}/scenarios`);
      await page.getByRole("button", { name: "New scenario" }).click();
      const form = page.getByRole("form", { name: "New scenario" });
      const name = `Mild IP ${Date.now()}`;
      await form.getByLabel("Scenario name").fill(name);
      await form.getByLabel("Air temperature (°F)").fill("71.6");
      await form.getByRole("button", { name: "Create scenario" }).click();
      await expectVisible(page.getByRole("form", { name: `Edit scenario ${name}` }), 15_000);
      const stored = (await (await page.request.get(`${BASE_URL}/api/projects/${projectId}/scenarios`)).json()) as {
        scenarios: { name: string; conditions: { airTemperatureC: number } }[];
      };
      expect(stored.scenarios.find((s) => s.name === name)?.conditions.airTemperatureC).toBeCloseTo(22, 6);
    } finally {
      await page.request.patch(`${BASE_URL}/api/me/settings`, { data: { unitSystem: "si" } });
      await context.close();
    }
  });

  test("a facility manager sees the scenarios read-only", async () => {
    const { context, page } = await signedIn("facility_manager");
    try {
      await page.goto(`${BASE_URL}/projects/${projectId}/scenarios`);
      await expectVisible(page.getByLabel("Scenario name"));
      expect(await page.getByLabel("Scenario name").isDisabled()).toBe(true);
      expect(await page.getByRole("button", { name: "New scenario" }).count()).toBe(0);
      expect(await page.getByRole("button", { name: "Save scenario" }).count()).toBe(0);
      await expectVisible(page.getByText("Your role can read scenarios"));
    } finally {
      await context.close();
    }
  });
});
