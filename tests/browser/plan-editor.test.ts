/**
 * The designer's path through the plan editor in Chromium: draw a room, place a ceiling panel and
 * a seat, save, compute, then raise the panel's surface temperature in the properties form, save,
 * compute again and see the seat's PMV rise. Screenshots are kept as artifacts.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { WINTER_DESIGN } from "@/lib/scenarios/schema";
import { BASE_URL, demoAccount, browserForFile, screenshot, signInThroughPage } from "../support/browser";

const browser = browserForFile();
let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  context = await browser.newContext({ viewport: { width: 1600, height: 1000 } });
  page = await context.newPage();
  const designer = demoAccount("designer");
  await signInThroughPage(page, designer.email, designer.password);
});

afterAll(async () => {
});

/** Screen position of a plan point, from the view transform the canvas publishes. */
async function screenOf(p: Page, x: number, y: number): Promise<{ x: number; y: number }> {
  const canvas = p.getByTestId("plan-canvas");
  const box = await canvas.boundingBox();
  if (!box) throw new Error("the plan canvas is not visible");
  const scale = Number(await canvas.getAttribute("data-scale"));
  const ox = Number(await canvas.getAttribute("data-offset-x"));
  const oy = Number(await canvas.getAttribute("data-offset-y"));
  return { x: box.x + ox + x * scale, y: box.y + oy + y * scale };
}

async function clickPlan(p: Page, x: number, y: number): Promise<void> {
  const s = await screenOf(p, x, y);
  await p.mouse.click(s.x, s.y);
}

async function saveRevision(p: Page, message: string, expected: number): Promise<void> {
  await p.getByRole("button", { name: "Save", exact: true }).click();
  const dialog = p.getByRole("dialog", { name: "Save a new revision" });
  await dialog.getByLabel("Revision message").fill(message);
  await dialog.getByRole("button", { name: "Save revision" }).click();
  await p.getByText(`Saved as revision ${expected}.`).waitFor();
  expect(await p.getByTestId("plan-editor").getAttribute("data-revision")).toBe(String(expected));
  expect(await p.getByTestId("plan-editor").getAttribute("data-dirty")).toBe("false");
}

async function computeAndReadSeatPmv(p: Page, revision: number): Promise<number> {
  await p.getByRole("button", { name: "Compute" }).click();
  await p.getByTestId("result-summary").filter({ hasText: `Revision ${revision}` }).waitFor();
  await p.getByRole("navigation", { name: "Objects" }).getByRole("button", { name: "Seat 1" }).click();
  const pmv = p.getByTestId("seat-pmv");
  await pmv.waitFor();
  const value = Number(await pmv.getAttribute("data-pmv"));
  expect(Number.isFinite(value)).toBe(true);
  // The shown value is the same PMV rounded to 0.1.
  expect(Number((await pmv.innerText()).replace("−", "-"))).toBeCloseTo(value, 1);
  return value;
}

describe("plan editor", () => {
  it("draws a room, places a panel and a seat, saves, computes, and shows PMV rising with a hotter panel", async () => {
    const created = await page.request.post(`${BASE_URL}/api/projects`, { data: { name: `Plan editor test ${Date.now()}`, description: "Browser test" } });
    expect(created.status()).toBe(201);
    const project = (await created.json()) as { id: string };
    const scenario = await page.request.post(`${BASE_URL}/api/projects/${project.id}/scenarios`, { data: WINTER_DESIGN });
    expect(scenario.status()).toBe(201);

    await page.goto(`${BASE_URL}/projects/${project.id}/plan`);
    await page.getByTestId("plan-canvas").locator("canvas").first().waitFor();

    // A 5 m × 4 m room: four corners, then a click on the first corner closes it.
    await page.getByRole("button", { name: "Draw room" }).click();
    for (const [x, y] of [[0, 0], [5, 0], [5, 4], [0, 4], [0, 0]] as const) {
      await clickPlan(page, x, y);
      await page.waitForTimeout(120);
    }
    const objects = page.getByRole("navigation", { name: "Objects" });
    await objects.getByRole("button", { name: "Room 1" }).waitFor();
    await expect(page.getByLabel("Room name").inputValue()).resolves.toBe("Room 1");

    await page.getByRole("button", { name: "Ceiling panel" }).click();
    await clickPlan(page, 2.5, 1.75);
    await objects.getByRole("button", { name: "Panel 1" }).waitFor();
    await page.getByRole("button", { name: "Seat", exact: true }).click();
    // Under the panel, so the panel fills a good part of what the seat sees overhead.
    await clickPlan(page, 2.5, 2.25);
    await objects.getByRole("button", { name: "Seat 1" }).waitFor();
    await page.getByRole("button", { name: "Select", exact: true }).click();
    expect(await page.getByTestId("plan-editor").getAttribute("data-dirty")).toBe("true");
    await screenshot(page, "plan-editor-1-drawn");

    await saveRevision(page, "Room with one panel and a seat", 2);
    const saved = (await (await page.request.get(`${BASE_URL}/api/projects/${project.id}/layout`)).json()) as {
      revision: number;
      layout: { rooms: { outline: { x: number; y: number }[] }[]; panels: { center: { x: number; y: number } }[]; seats: unknown[] };
    };
    expect(saved.revision).toBe(2);
    expect(saved.layout.rooms[0]!.outline).toEqual([{ x: 0, y: 0 }, { x: 5, y: 0 }, { x: 5, y: 4 }, { x: 0, y: 4 }]);
    expect(saved.layout.panels[0]!.center).toEqual({ x: 2.5, y: 1.75 });
    expect(saved.layout.seats).toHaveLength(1);

    const before = await computeAndReadSeatPmv(page, 2);
    await screenshot(page, "plan-editor-2-computed");

    // Raise the panel's surface temperature through the properties form.
    await objects.getByRole("button", { name: "Panel 1" }).click();
    const surface = page.getByLabel("Surface temperature (°C)");
    await expect(surface.inputValue()).resolves.toBe("32");
    await surface.fill("60");
    await page.getByRole("form", { name: "Panel properties" }).getByRole("button", { name: "Apply" }).click();
    await page.getByText("unsaved changes").waitFor();

    await saveRevision(page, "Hotter panel", 3);
    const after = await computeAndReadSeatPmv(page, 3);
    await screenshot(page, "plan-editor-3-hotter");
    // 32 °C → 60 °C overhead warms the seat by far more than rounding: at least 0.1 PMV.
    expect(after - before).toBeGreaterThan(0.1);
  });

  it("refuses bad form input inline, makes a drag one undo entry, and offers to save on top of a newer revision", async () => {
    const created = await page.request.post(`${BASE_URL}/api/projects`, { data: { name: `Plan edit test ${Date.now()}` } });
    const project = (await created.json()) as { id: string };
    await page.goto(`${BASE_URL}/projects/${project.id}/plan`);
    await page.getByTestId("plan-canvas").locator("canvas").first().waitFor();
    const objects = page.getByRole("navigation", { name: "Objects" });

    // Four corners and Enter close a room.
    await page.getByRole("button", { name: "Draw room" }).click();
    for (const [x, y] of [[0, 0], [4, 0], [4, 3], [0, 3]] as const) {
      await clickPlan(page, x, y);
      await page.waitForTimeout(120);
    }
    await page.keyboard.press("Enter");
    await objects.getByRole("button", { name: "Room 1" }).waitFor();

    // A ceiling below the schema's 2 m minimum: an inline error, and no undo entry.
    const roomForm = page.getByRole("form", { name: "Room properties" });
    await page.getByLabel("Ceiling height (m)").fill("1");
    await roomForm.getByRole("button", { name: "Apply" }).click();
    await expect(roomForm.locator("[aria-live=polite]").filter({ hasText: /2/ }).first().innerText()).resolves.toMatch(/2/);
    await expect(page.getByLabel("Ceiling height (m)").getAttribute("aria-invalid")).resolves.toBe("true");
    await screenshot(page, "plan-editor-4-form-error");
    await page.getByRole("button", { name: "Undo" }).click();
    await expect(objects.getByRole("button", { name: "Room 1" }).count()).resolves.toBe(0);
    await page.getByRole("button", { name: "Redo" }).click();
    await objects.getByRole("button", { name: "Room 1" }).waitFor();

    // Place a seat, drag it 1 m × 1 m: the whole drag is one undo entry.
    await page.getByRole("button", { name: "Seat", exact: true }).click();
    await clickPlan(page, 1, 1);
    await page.getByRole("button", { name: "Select", exact: true }).click();
    const from = await screenOf(page, 1, 1);
    const to = await screenOf(page, 2, 2);
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    await page.mouse.move(to.x, to.y, { steps: 12 });
    await page.mouse.up();
    await expect.poll(() => page.getByLabel("Position x (m)").inputValue()).toBe("2");
    await expect.poll(() => page.getByLabel("Position y (m)").inputValue()).toBe("2");
    await page.keyboard.press("Control+z");
    await expect.poll(() => page.getByLabel("Position x (m)").inputValue()).toBe("1");
    await page.keyboard.press("Control+Shift+z");
    await expect.poll(() => page.getByLabel("Position x (m)").inputValue()).toBe("2");

    // Someone else saves meanwhile: the save shows the conflict and can go on top.
    const other = await page.request.put(`${BASE_URL}/api/projects/${project.id}/layout`, {
      data: { baseRevision: 1, message: "Saved elsewhere", layout: { schemaVersion: 1, rooms: [], openings: [], panels: [], seats: [], zones: [], underlay: null } },
    });
    expect(other.status()).toBe(201);
    await page.getByRole("button", { name: "Save", exact: true }).click();
    const dialog = page.getByRole("dialog", { name: "Save a new revision" });
    await dialog.getByLabel("Revision message").fill("My room and seat");
    await dialog.getByRole("button", { name: "Save revision" }).click();
    await dialog.getByText("Revision 2 was saved meanwhile.").waitFor();
    await screenshot(page, "plan-editor-5-conflict");
    await dialog.getByRole("button", { name: "Save as a new revision on top" }).click();
    await page.getByText("Saved as revision 3.").waitFor();
    const head = (await (await page.request.get(`${BASE_URL}/api/projects/${project.id}/layout`)).json()) as { revision: number; message: string; layout: { seats: { position: unknown }[] } };
    expect(head.revision).toBe(3);
    expect(head.message).toBe("My room and seat");
    expect(head.layout.seats.map((s) => s.position)).toEqual([{ x: 2, y: 2 }]);

    // Restoring revision 2 (the empty layout saved elsewhere) makes it revision 4 and reloads the editor.
    await page.locator("summary", { hasText: "Revisions" }).click();
    await page.getByRole("button", { name: "Restore revision 2" }).click();
    await page.getByText("Restored as revision 4.").waitFor();
    await expect(objects.getByRole("button", { name: "Room 1" }).count()).resolves.toBe(0);
    const restored = (await (await page.request.get(`${BASE_URL}/api/projects/${project.id}/layout`)).json()) as { revision: number; layout: { rooms: unknown[] } };
    expect(restored.revision).toBe(4);
    expect(restored.layout.rooms).toEqual([]);
  });

  it("uploads an underlay, shows the server's refusal of a non-image, and sets the scale from two points", async () => {
    const created = await page.request.post(`${BASE_URL}/api/projects`, { data: { name: `Plan underlay test ${Date.now()}` } });
    const project = (await created.json()) as { id: string };
    await page.goto(`${BASE_URL}/projects/${project.id}/plan`);
    await page.getByTestId("plan-canvas").locator("canvas").first().waitFor();
    await page.locator("summary", { hasText: "Underlay" }).click();
    const input = page.getByLabel("Floor-plan image (PNG or JPEG)");

    await input.setInputFiles({ name: "plan.png", mimeType: "image/png", buffer: Buffer.from("not really an image") });
    await page.getByText(/PNG or JPEG/).filter({ hasNotText: "Floor-plan image" }).first().waitFor();
    await expect(page.getByLabel("Show underlay").count()).resolves.toBe(0);

    // Any real PNG will do: a screenshot of the page itself.
    const png = await page.screenshot({ clip: { x: 0, y: 0, width: 400, height: 300 } });
    await input.setInputFiles({ name: "plan.png", mimeType: "image/png", buffer: png });
    await page.getByLabel("Show underlay").waitFor();
    await page.getByRole("button", { name: "Set scale from two points" }).click();
    await clickPlan(page, 0, 0);
    await clickPlan(page, 4, 0);
    await page.getByLabel(/Real distance between the two points/).fill("8");
    await page.getByRole("button", { name: "Set scale", exact: true }).click();
    await page.getByText("Scale: 4.000 m per 100 px").waitFor();
    await screenshot(page, "plan-editor-7-underlay");
    await saveRevision(page, "Underlay", 2);
    const saved = (await (await page.request.get(`${BASE_URL}/api/projects/${project.id}/layout`)).json()) as { layout: { underlay: { metresPerPixel: number; visible: boolean } } };
    expect(saved.layout.underlay.metresPerPixel).toBeCloseTo(0.04, 9);
    expect(saved.layout.underlay.visible).toBe(true);
  });

  it("gives the facility manager the plan and results read-only", async () => {
    const fmContext = await browser.newContext({ viewport: { width: 1600, height: 1000 } });
    const fm = await fmContext.newPage();
    const account = demoAccount("facility_manager");
    await signInThroughPage(fm, account.email, account.password);
    const list = (await (await fm.request.get(`${BASE_URL}/api/projects`)).json()) as { projects: { id: string; name: string }[] };
    // The seeded demo project (lib/demo): an invented office floor with seats.
    const demo = list.projects.find((p) => p.name.startsWith("Quayside"))!;
    expect(demo).toBeDefined();
    await fm.goto(`${BASE_URL}/projects/${demo.id}/plan`);
    await fm.getByTestId("plan-canvas").locator("canvas").first().waitFor();
    await fm.getByText("read only").waitFor();
    await expect(fm.getByRole("button", { name: "Draw room" }).count()).resolves.toBe(0);
    await expect(fm.getByRole("button", { name: "Save", exact: true }).count()).resolves.toBe(0);
    await fm.getByRole("navigation", { name: "Objects" }).locator("section", { hasText: "Seats" }).getByRole("button").first().click();
    await expect(fm.getByLabel("Seat label").isDisabled()).resolves.toBe(true);
    await expect(fm.getByRole("button", { name: "Compute" }).isVisible()).resolves.toBe(true);
    await screenshot(fm, "plan-editor-6-read-only");
    await fmContext.close();
  });
});
