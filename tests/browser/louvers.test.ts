/**
 * Automatic louver settings end to end: the demo designer narrows the "Window desks" zone's
 * target in the plan editor to a PMV band the all-open louvers miss, runs automatic settings on
 * the louvers page and sees the zone's seats inside the band, then saves the settings as a new
 * revision (after a conflicting save elsewhere and a reload). Works on a copy of the demo plan in a project of its own, so the demo project's
 * revisions stay as other tests expect them.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { BASE_URL, demoAccount, browserForFile, screenshot, signInThroughPage } from "@/tests/support/browser";
import { expectVisible } from "@/tests/browser/helpers";
import type { Layout } from "@/lib/layout/schema";

const DEMO_PROJECT = "Quayside House — level 3";

const browser = browserForFile();
let context: BrowserContext;
let page: Page;
let projectId = "";
let scenarioId = "";
/** The band set on the zone, chosen from the all-open PMVs (see the first test). */
let band = { min: 0, max: 0 };

interface SeatResult {
  id: string;
  pmv: number;
  zoneIds: string[];
}

beforeAll(async () => {
  context = await browser.newContext({ viewport: { width: 1500, height: 1000 } });
  page = await context.newPage();
  const designer = demoAccount("designer");
  await signInThroughPage(page, designer.email, designer.password);

  // A copy of the demo plan and its winter scenario in a project of this test's own.
  const projects = (await (await page.request.get(`${BASE_URL}/api/projects`)).json()) as { projects: { id: string; name: string }[] };
  const demoId = projects.projects.find((p) => p.name === DEMO_PROJECT)?.id ?? "";
  expect(demoId).not.toBe("");
  const demo = (await (await page.request.get(`${BASE_URL}/api/projects/${demoId}/layout?revision=1`)).json()) as { layout: Layout };
  const scenarios = (await (await page.request.get(`${BASE_URL}/api/projects/${demoId}/scenarios`)).json()) as { scenarios: { name: string; conditions: unknown }[] };
  const winter = scenarios.scenarios.find((s) => s.name === "Winter design");
  expect(winter).toBeDefined();
  const created = await page.request.post(`${BASE_URL}/api/projects`, { data: { name: `Louver test ${Date.now()}`, description: "Browser test" } });
  expect(created.status()).toBe(201);
  projectId = ((await created.json()) as { id: string }).id;
  const saved = await page.request.put(`${BASE_URL}/api/projects/${projectId}/layout`, { data: { baseRevision: 1, message: "Demo plan copy", layout: demo.layout } });
  expect(saved.status()).toBe(201);
  const scenario = await page.request.post(`${BASE_URL}/api/projects/${projectId}/scenarios`, { data: { name: "Winter design", conditions: winter!.conditions } });
  expect(scenario.status()).toBe(201);
  scenarioId = ((await scenario.json()) as { id: string }).id;
});

let productId = "";

afterAll(async () => {
  // The catalogue belongs to the demo organisation: leave it as the seed made it.
  if (productId) await page?.request.delete(`${BASE_URL}/api/catalogue/products/${productId}`).catch(() => undefined);
});

describe("automatic louver settings", () => {
  test("the designer sets the Window desks zone to a PMV band the all-open louvers miss, in the plan editor", async () => {
    // Computing first: with every louver fully open (the demo's setting) the warmest window
    // desks sit above a band whose top is 0.02 below the warmest PMV; closing the louvers cools
    // them by several hundredths, so the band is reachable. Its bottom is far below.
    const computed = await page.request.post(`${BASE_URL}/api/projects/${projectId}/compute`, { data: { scenarioId, revision: 2 } });
    expect(computed.status()).toBe(200);
    const seats = ((await computed.json()) as { seats: SeatResult[] }).seats.filter((s) => s.zoneIds.includes("zone-window"));
    expect(seats.length).toBeGreaterThan(4);
    const pmv = seats.map((s) => s.pmv);
    band = { min: Math.round((Math.min(...pmv) - 0.3) * 100) / 100, max: Math.round((Math.max(...pmv) - 0.02) * 100) / 100 };
    expect(pmv.some((v) => v > band.max)).toBe(true);

    await page.goto(`${BASE_URL}/projects/${projectId}/plan`);
    await page.getByTestId("plan-canvas").locator("canvas").first().waitFor();
    await page.getByRole("navigation", { name: "Objects" }).getByRole("button", { name: "Window desks" }).click();
    const zoneForm = page.getByRole("form", { name: "Zone properties" });
    await zoneForm.getByLabel("Comfort target").selectOption("pmvBand");
    await zoneForm.getByLabel("Lowest PMV").fill(String(band.min));
    await zoneForm.getByLabel("Highest PMV").fill(String(band.max));
    await zoneForm.getByRole("button", { name: "Apply" }).click();

    // The zone's occupancy schedule: an end before the start is refused inline, then fixed.
    const scheduleForm = page.getByRole("form", { name: "Occupancy schedule" });
    await scheduleForm.getByLabel("Period 1 end (h)").fill("7");
    await scheduleForm.getByRole("button", { name: "Apply schedule" }).click();
    await expectVisible(scheduleForm.getByText(/hours must satisfy 0 ≤ start < end ≤ 24/));
    await expect(scheduleForm.getByLabel("Period 1 end (h)").getAttribute("aria-invalid")).resolves.toBe("true");
    await screenshot(page, "louvers-0-schedule-error");
    await scheduleForm.getByLabel("Period 1 end (h)").fill("17");
    await scheduleForm.getByRole("button", { name: "Apply schedule" }).click();
    await expect.poll(() => scheduleForm.locator(".text-danger p").count()).toBe(0);

    await page.getByRole("button", { name: "Save", exact: true }).click();
    const dialog = page.getByRole("dialog", { name: "Save a new revision" });
    await dialog.getByLabel("Revision message").fill("Tighter band for the window desks");
    await dialog.getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Saved as revision 3.").waitFor();
    await screenshot(page, "louvers-1-zone-target");

    const head = (await (await page.request.get(`${BASE_URL}/api/projects/${projectId}/layout`)).json()) as { revision: number; layout: Layout };
    expect(head.revision).toBe(3);
    const zone = head.layout.zones.find((z) => z.id === "zone-window");
    expect(zone?.target).toEqual({ kind: "pmvBand", minPmv: band.min, maxPmv: band.max });
    expect(zone?.schedule?.periods.map((p) => [p.startHour, p.endHour, p.louver.mode])).toEqual([[8, 17, "automatic"]]);
  });

  test("automatic settings bring the window desks inside the band; applying them after a conflict and a reload saves revision 5", async () => {
    await page.goto(`${BASE_URL}/projects/${projectId}`);
    await page.getByRole("link", { name: "Louvers", exact: true }).click();
    await page.waitForURL(/\/louvers$/);
    await expectVisible(page.getByRole("heading", { level: 1, name: "Louvers and panel performance" }));
    await page.getByLabel("Scenario", { exact: true }).selectOption({ label: "Winter design" });
    await expectVisible(page.getByText("Head layout: revision 3"));
    await page.getByRole("button", { name: "Find louver settings" }).click();
    await expectVisible(page.getByRole("progressbar", { name: "Louver settings progress" }));

    const table = page.getByRole("table", { name: "Seats before and after" });
    await table.waitFor({ timeout: 30_000 });
    const rows = table.locator('tbody tr[data-zone="zone-window"]');
    const count = await rows.count();
    expect(count).toBeGreaterThan(4);
    let movedIn = 0;
    for (let i = 0; i < count; i += 1) {
      const row = rows.nth(i);
      const before = Number(await row.locator("td[data-col=before]").innerText());
      const after = Number(await row.locator("td[data-col=after]").innerText());
      expect(after).toBeGreaterThanOrEqual(band.min - 0.005);
      expect(after).toBeLessThanOrEqual(band.max + 0.005);
      await expect(row.locator("td[data-col=target]").innerText()).resolves.toContain("in target");
      if (before > band.max) movedIn += 1;
    }
    // Some desks were above the band before and are inside it now.
    expect(movedIn).toBeGreaterThan(0);
    await expect(page.getByRole("region", { name: "Seats that cannot be brought inside" }).count()).resolves.toBe(0);
    // The chosen angles are inside each louver's range and lower the total output.
    const angles = (await page.getByRole("table", { name: "Chosen louver settings" }).locator("td[data-col=angle]").allInnerTexts()).map(Number);
    expect(angles.length).toBeGreaterThan(0);
    for (const a of angles) {
      expect(a).toBeGreaterThanOrEqual(30);
      expect(a).toBeLessThanOrEqual(180);
    }
    expect(angles.some((a) => a < 180)).toBe(true);
    await screenshot(page, "louvers-2-automatic-settings");

    // Someone saves the plan meanwhile: applying is refused with an explanation and a reload.
    const current = (await (await page.request.get(`${BASE_URL}/api/projects/${projectId}/layout`)).json()) as { revision: number; layout: Layout };
    const elsewhere = await page.request.put(`${BASE_URL}/api/projects/${projectId}/layout`, { data: { baseRevision: current.revision, message: "Saved elsewhere", layout: current.layout } });
    expect(elsewhere.status()).toBe(201);
    const apply = page.getByRole("form", { name: "Apply louver settings" });
    await apply.getByRole("button", { name: "Apply as new revision" }).click();
    await expectVisible(apply.getByText(/Someone saved the plan after revision 3/));
    await screenshot(page, "louvers-3-conflict");
    await apply.getByRole("button", { name: "Reload the plan and run again" }).click();
    await expectVisible(page.getByText("Head layout: revision 4"));
    await page.getByRole("button", { name: "Find louver settings" }).click();
    await table.waitFor({ timeout: 30_000 });
    await apply.getByLabel("Revision message").fill("Automatic louver settings for the window band");
    await apply.getByRole("button", { name: "Apply as new revision" }).click();
    await page.getByText("Saved as revision 5").waitFor();
    await screenshot(page, "louvers-4-applied");

    const head = (await (await page.request.get(`${BASE_URL}/api/projects/${projectId}/layout`)).json()) as { revision: number; message: string; layout: Layout };
    expect(head.revision).toBe(5);
    expect(head.message).toBe("Automatic louver settings for the window band");
    const saved = head.layout.panels.filter((p) => p.louver && p.mode === "heating").map((p) => p.louver!.openingAngleDeg);
    expect(saved.sort((a, b) => a - b)).toEqual([...angles].sort((a, b) => a - b));
  });

  test("the performance, loads and energy tabs show the panel curves, coverage and the saving, with the cautions", async () => {
    await page.getByRole("tab", { name: "Panel performance" }).click();
    await page.getByRole("table", { name: "Panel output and turndown" }).waitFor({ timeout: 30_000 });
    await expectVisible(page.getByText(/Output of OO-01 against opening angle/));
    await expectVisible(page.getByText(/Directional emission of the louvered face/));
    await page.getByRole("button", { name: "Sweep PMV against angle" }).click();
    await expectVisible(page.getByText(/40 seats at 31 settings from 30° to 180°/), 30_000);
    await screenshot(page, "louvers-5-performance");

    await page.getByRole("tab", { name: "Loads and water side" }).click();
    await page.getByRole("table", { name: "Room loads" }).waitFor({ timeout: 30_000 });
    await expectVisible(page.getByRole("table", { name: "Water side" }));
    await expectVisible(page.getByText(/Condensation on chilled panels/));
    await screenshot(page, "louvers-6-loads");

    await page.getByRole("tab", { name: "Schedules and energy" }).click();
    const energy = page.getByRole("table", { name: "Zone energy" });
    await energy.waitFor({ timeout: 30_000 });
    await expectVisible(energy.getByRole("rowheader", { name: "Window desks" }));
    await expectVisible(page.getByText(/Hot reachable surfaces/));
    await screenshot(page, "louvers-7-energy");
  });

  test("a catalogue product picked for a panel in the plan editor sets its size and louver range (one undo entry)", async () => {
    const name = `Louver test product ${Date.now()}`;
    const csv = `name,width_m,length_m,k,n,emissivity,louver_min_deg,louver_max_deg,finish,wall_emissivity\n${name},1,2,5.5,1.1,0.9,40,170,diffuse,0.9\n`;
    const imported = await page.request.post(`${BASE_URL}/api/catalogue/import`, { headers: { "content-type": "text/csv" }, data: csv });
    expect(imported.status()).toBe(201);
    productId = ((await imported.json()) as { products: { id: string }[] }).products[0]!.id;

    await page.goto(`${BASE_URL}/projects/${projectId}/plan`);
    await page.getByTestId("plan-canvas").locator("canvas").first().waitFor();
    await page.getByRole("navigation", { name: "Objects" }).getByRole("button", { name: "OO-02", exact: true }).click();
    await page.getByLabel("Catalogue product").selectOption({ label: name });
    await expect.poll(() => page.getByLabel("Length (m)").inputValue()).toBe("2");
    await expect.poll(() => page.getByLabel("Least angle (°)").inputValue()).toBe("40");
    await expect.poll(() => page.getByLabel("Greatest angle (°)").inputValue()).toBe("170");
    await screenshot(page, "louvers-8-catalogue-product");
    // Taking the product is one change: one undo returns the panel as it was.
    await page.getByRole("button", { name: "Undo" }).click();
    await expect.poll(() => page.getByLabel("Length (m)").inputValue()).toBe("2.4");
    await page.getByRole("button", { name: "Redo" }).click();
    await expect.poll(() => page.getByLabel("Length (m)").inputValue()).toBe("2");

    await page.getByRole("button", { name: "Save", exact: true }).click();
    const dialog = page.getByRole("dialog", { name: "Save a new revision" });
    await dialog.getByLabel("Revision message").fill("OO-02 from the catalogue");
    await dialog.getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Saved as revision 6.").waitFor();
    const head = (await (await page.request.get(`${BASE_URL}/api/projects/${projectId}/layout`)).json()) as { revision: number; layout: Layout };
    const panel = head.layout.panels.find((p) => p.label === "OO-02")!;
    expect(panel).toMatchObject({ productId, widthM: 1, lengthM: 2, emissivity: 0.9 });
    // The optimiser had closed it to 30°: clamped into the product's 40–170° range.
    expect(panel.louver).toMatchObject({ minOpeningAngleDeg: 40, maxOpeningAngleDeg: 170, openingAngleDeg: 40, finish: "diffuse", wallEmissivity: 0.9 });
  });
});

describe("the louvers page for other roles", () => {
  test("a facility manager runs automatic settings but gets no apply form; an occupant gets the not-found page", async () => {
    const fmContext = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
    try {
      const fm = await fmContext.newPage();
      const account = demoAccount("facility_manager");
      await signInThroughPage(fm, account.email, account.password);
      await fm.goto(`${BASE_URL}/projects/${projectId}/louvers`);
      await fm.getByRole("button", { name: "Find louver settings" }).click();
      await fm.getByRole("table", { name: "Seats before and after" }).waitFor({ timeout: 30_000 });
      await expectVisible(fm.getByText("Designers and admins can save these settings as a new revision."));
      await expect(fm.getByRole("form", { name: "Apply louver settings" }).count()).resolves.toBe(0);
    } finally {
      await fmContext.close();
    }
    const occupantContext = await browser.newContext();
    try {
      const occupant = await occupantContext.newPage();
      const account = demoAccount("occupant");
      await signInThroughPage(occupant, account.email, account.password);
      const response = await occupant.goto(`${BASE_URL}/projects/${projectId}/louvers`);
      expect(response?.status()).toBe(404);
      await expect(occupant.getByRole("heading", { level: 1, name: "Louvers and panel performance" }).count()).resolves.toBe(0);
    } finally {
      await occupantContext.close();
    }
  });
});
