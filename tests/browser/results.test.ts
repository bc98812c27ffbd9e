import { readFileSync } from "node:fs";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { BASE_URL, demoAccount, browserForFile, screenshot, signInThroughPage } from "@/tests/support/browser";
import { expectVisible } from "@/tests/browser/helpers";

const DEMO_PROJECT = "Quayside House — level 3";

const browser = browserForFile();
let context: BrowserContext;
let page: Page;
let projectId = "";

beforeAll(async () => {
  context = await browser.newContext({ acceptDownloads: true, viewport: { width: 1400, height: 1000 } });
  page = await context.newPage();
  const designer = demoAccount("designer");
  await signInThroughPage(page, designer.email, designer.password);
  const projects = (await (await page.request.get(`${BASE_URL}/api/projects`)).json()) as { projects: { id: string; name: string }[] };
  projectId = projects.projects.find((p) => p.name === DEMO_PROJECT)?.id ?? "";
  expect(projectId).not.toBe("");
});

afterAll(async () => {
  // The unit setting is stored on the demo designer: leave it as the seed made it.
  await page?.request.patch(`${BASE_URL}/api/me/settings`, { data: { unitSystem: "si" } }).catch(() => undefined);
});

const seatsTable = () => page.getByRole("table", { name: "Seats" });
const seatRows = () => seatsTable().locator("tbody tr");

async function pmvValues(): Promise<number[]> {
  return (await seatsTable().locator("tbody td[data-col=pmv]").allTextContents()).map((t) => Number(t));
}

describe("comfort results for the demo project", () => {
  test("a designer computes Winter design and sees a seats table with numeric PMV for every seat", async () => {
    await page.goto(`${BASE_URL}/projects/${projectId}`);
    await page.getByRole("link", { name: "Results", exact: true }).click();
    await page.waitForURL(/\/results$/);
    await expectVisible(page.getByRole("heading", { level: 1, name: "Comfort results" }));
    await page.getByLabel("Scenario", { exact: true }).selectOption({ label: "Winter design" });
    await page.getByRole("button", { name: "Compute" }).click();
    await seatRows().first().waitFor({ timeout: 30_000 });
    await expectVisible(page.getByRole("heading", { name: /Winter design · revision 1/ }));

    const count = await seatRows().count();
    expect(count).toBeGreaterThanOrEqual(40);
    const pmv = await pmvValues();
    expect(pmv).toHaveLength(count);
    for (const v of pmv) {
      expect(Number.isFinite(v)).toBe(true);
      expect(Math.abs(v)).toBeLessThan(3.5);
    }
    // The standing caution and the panels table are on the page with the seats.
    await expectVisible(page.getByText("do not replace licensed engineering judgement"));
    expect(await page.getByRole("table", { name: "Panels" }).locator("tbody tr").count()).toBeGreaterThanOrEqual(20);
    await screenshot(page, "results-winter-design");
  });

  test("sorting by PMV orders the rows ascending, then descending", async () => {
    const header = seatsTable().getByRole("button", { name: "PMV", exact: true });
    await header.click();
    const ascending = await pmvValues();
    expect(ascending).toEqual([...ascending].sort((a, b) => a - b));
    expect(ascending[0]).toBeLessThan(ascending[ascending.length - 1]!);
    await expect(seatsTable().getByRole("columnheader", { name: "PMV", exact: true }).getAttribute("aria-sort")).resolves.toBe("ascending");

    await header.click();
    const descending = await pmvValues();
    expect(descending).toEqual([...descending].sort((a, b) => b - a));
    expect(descending).toEqual([...ascending].reverse());
  });

  test("filtering by zone narrows the rows to that zone's seats", async () => {
    const all = await seatRows().count();
    const zoneSelect = page.getByLabel("Zone", { exact: true });
    const zoneName = "Window desks";
    await zoneSelect.selectOption({ label: zoneName });
    const narrowed = await seatRows().count();
    expect(narrowed).toBeGreaterThan(0);
    expect(narrowed).toBeLessThan(all);
    const zoneCells = await seatRows().locator("td:nth-of-type(1)").allTextContents();
    for (const cell of zoneCells) expect(cell).toContain(zoneName);
    await expectVisible(page.getByText(`Showing ${narrowed} of ${all} seats`));
    await zoneSelect.selectOption({ label: "All zones" });
    expect(await seatRows().count()).toBe(all);
  });

  test("the CSV download holds a header with units and one line per seat", async () => {
    const seats = await seatRows().count();
    await page.getByLabel("CSV units").selectOption("si");
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Download CSV" }).click()]);
    expect(download.suggestedFilename()).toMatch(/winter-design-r1-seats-si\.csv$/);
    const file = await download.path();
    const text = readFileSync(file, "utf8").replace(/^\uFEFF/, "");
    const parsed = Papa.parse<string[]>(text, { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...lines] = parsed.data;
    expect(header).toContain("PMV (-)");
    expect(header).toContain("MRT (°C)");
    expect(lines).toHaveLength(seats);
    const pmvColumn = header!.indexOf("PMV (-)");
    for (const line of lines) expect(Number.isFinite(Number(line[pmvColumn]))).toBe(true);
  });

  test("switching to IP shows temperatures in °F; the setting is kept on the account", async () => {
    const mrtSi = await seatsTable().locator("tbody tr").first().locator("td:nth-of-type(4)").textContent();
    await page.getByRole("button", { name: /^IP/ }).click();
    await expectVisible(seatsTable().getByRole("columnheader", { name: /MRT.*°F/ }), 15_000);
    await expect(page.getByRole("button", { name: /^IP/ }).getAttribute("aria-pressed")).resolves.toBe("true");
    const mrtIp = await seatsTable().locator("tbody tr").first().locator("td:nth-of-type(4)").textContent();
    expect(Number(mrtIp)).toBeCloseTo((Number(mrtSi) * 9) / 5 + 32, 0);
    await screenshot(page, "results-ip");

    await page.reload();
    await expect(page.getByRole("button", { name: /^IP/ }).getAttribute("aria-pressed")).resolves.toBe("true");
    await page.getByRole("button", { name: /^SI/ }).click();
    await expect
      .poll(async () => page.getByRole("button", { name: /^SI/ }).getAttribute("aria-pressed"), { timeout: 15_000 })
      .toBe("true");
  });

  test("humid air over chilled panels shows the condensation warning with the panel named", async () => {
    const list = (await (await page.request.get(`${BASE_URL}/api/projects/${projectId}/scenarios`)).json()) as {
      scenarios: { name: string; conditions: Record<string, unknown> }[];
    };
    const summer = list.scenarios.find((s) => s.name === "Summer design");
    expect(summer).toBeDefined();
    const name = `Humid summer ${Date.now()}`;
    const created = await page.request.post(`${BASE_URL}/api/projects/${projectId}/scenarios`, {
      data: { name, conditions: { ...summer!.conditions, relativeHumidityPercent: 80 } },
    });
    expect(created.status()).toBe(201);

    await page.goto(`${BASE_URL}/projects/${projectId}/results`);
    await page.getByLabel("Scenario", { exact: true }).selectOption({ label: name });
    await page.getByRole("button", { name: "Compute" }).click();
    await seatRows().first().waitFor({ timeout: 30_000 });
    const warnings = page.getByRole("region", { name: "Warnings" });
    await expectVisible(warnings.getByText(/Condensation risk/).first());
    await expectVisible(warnings.getByText(/Panel OO-\d+/).first());
    const marginCells = await page.getByRole("table", { name: "Panels" }).locator("tbody td").allTextContents();
    expect(marginCells.some((t) => t.includes("risk"))).toBe(true);
    await screenshot(page, "results-condensation-warning");
  });

  test("the printable report shows the methods and standards and the cautions", async () => {
    await page.getByLabel("Scenario", { exact: true }).selectOption({ label: "Winter design" });
    await page.getByRole("button", { name: "Compute" }).click();
    await page.getByRole("link", { name: "Printable report" }).click();
    await page.waitForURL(/\/report\?scenario=/);
    await expectVisible(page.getByRole("heading", { name: "5. Methods and standards" }), 20_000);
    await expectVisible(page.getByText(/ISO 7730:2005, Ergonomics of the thermal environment/));
    await expectVisible(page.getByText(/ISO 7726:1998/));
    await expectVisible(page.getByText(/ISO 6946:2017/));
    await expectVisible(page.getByText(/Magnus form/).first());
    await expectVisible(page.getByText(/Condensation on chilled panels: keep every cooling surface above the room's dew point with a margin/));
    await expectVisible(page.getByText(/does not replace|do not replace licensed engineering judgement/).first());
    expect(await page.getByRole("table", { name: "Seats" }).locator("tbody tr").count()).toBeGreaterThanOrEqual(40);
    await expectVisible(page.getByRole("button", { name: "Print / save as PDF" }));
    await screenshot(page, "report-winter-design");
    await page.emulateMedia({ media: "print" });
    expect(await page.getByRole("button", { name: "Print / save as PDF" }).isVisible()).toBe(false);
    expect(await page.getByRole("navigation", { name: "Main" }).isVisible()).toBe(false);
    await screenshot(page, "report-winter-design-print");
    await page.emulateMedia({ media: "screen" });
  });
});
