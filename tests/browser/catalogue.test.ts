import { describe, expect, test } from "vitest";
import type { Page } from "playwright-core";
import { BASE_URL, demoAccount, browserForFile, screenshot, signInThroughPage, uniqueRunId } from "@/tests/support/browser";
import { expectVisible } from "@/tests/browser/helpers";
import type { Role } from "@/lib/auth/roles";
import { CATALOGUE_COLUMNS } from "@/lib/catalogue/schema";

const browser = browserForFile();

const runId = uniqueRunId();
const HEADER = CATALOGUE_COLUMNS.join(",");

async function withCatalogue(role: Role, fn: (page: Page) => Promise<void>): Promise<void> {
  const context = await browser.newContext();
  try {
    const page = await context.newPage();
    const account = demoAccount(role);
    await signInThroughPage(page, account.email, account.password);
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Catalogue" }).click();
    await page.getByRole("heading", { level: 1, name: "Panel catalogue" }).waitFor();
    await fn(page);
  } finally {
    await context.close();
  }
}

async function chooseFile(page: Page, text: string, name = "products.csv"): Promise<void> {
  await page.getByLabel("CSV file").setInputFiles({ name, mimeType: "text/csv", buffer: Buffer.from(text, "utf8") });
}

const productRows = (page: Page) => page.getByRole("table", { name: "Panel products" }).getByRole("row");

describe("the catalogue page (designer)", () => {
  test("a file with a bad row lists its line and column and imports nothing; the corrected file imports; a product is deleted", async () => {
    await withCatalogue("designer", async (page) => {
      const plain = `Plain ${runId}`;
      const louvered = `Louvered ${runId}`;
      const rowsBefore = await productRows(page).count();

      // Line 3 has an emissivity above 1: the whole file is refused.
      await chooseFile(page, `${HEADER}\r\n${plain},0.6,1.2,5.2,1.1,0.93,,,,\r\n${louvered},0.6,1.8,4.8,1.12,1.4,30,180,diffuse,0.9\r\n`);
      await page.getByRole("button", { name: "Import" }).click();
      const problems = page.getByRole("table", { name: "Problems in the file" });
      await expectVisible(problems);
      const cells = await problems.getByRole("row").nth(1).getByRole("cell").allTextContents();
      expect(cells).toEqual(["3", "emissivity", "must be at most 1"]);
      await expectVisible(page.getByText("nothing was imported"));
      await expect(page.getByRole("rowheader", { name: plain }).count()).resolves.toBe(0);
      expect(await productRows(page).count()).toBe(rowsBefore);
      await screenshot(page, "catalogue-row-errors");

      await chooseFile(page, `${HEADER}\n${plain},0.6,1.2,5.2,1.1,0.93,,,,\n${louvered},0.6,1.8,4.8,1.12,0.9,30,180,diffuse,0.9\n`);
      await page.getByRole("button", { name: "Import" }).click();
      await expectVisible(page.getByText("Imported 2 products."));
      await expect(page.getByRole("table", { name: "Problems in the file" }).count()).resolves.toBe(0);
      await expectVisible(page.getByRole("rowheader", { name: louvered }));
      const louveredRow = productRows(page).filter({ has: page.getByRole("rowheader", { name: louvered }) });
      await expectVisible(louveredRow.getByText("30–180° · diffuse · wall ε 0.9"));
      await expectVisible(louveredRow.getByText("0.6 × 1.8 m"));

      page.once("dialog", (dialog) => void dialog.accept());
      await page.getByRole("button", { name: `Delete ${plain}` }).click();
      await expectVisible(page.getByText(`${plain} was removed from the catalogue.`));
      await expect(page.getByRole("rowheader", { name: plain }).count()).resolves.toBe(0);
      await expectVisible(page.getByRole("rowheader", { name: louvered }));
      await screenshot(page, "catalogue-designer");
    });
  });

  test("a file with a misspelt column names it; an empty choice is an inline error", async () => {
    await withCatalogue("designer", async (page) => {
      await page.getByRole("button", { name: "Import" }).click();
      await expectVisible(page.getByText("choose a CSV file"));

      await chooseFile(page, `${HEADER.replace("wall_emissivity", "wall_emisivity")}\nX ${runId},0.6,1.2,5,1.1,0.9,,,,\n`);
      await page.getByRole("button", { name: "Import" }).click();
      const problems = page.getByRole("table", { name: "Problems in the file" });
      await expectVisible(problems);
      await expectVisible(problems.getByRole("cell", { name: "wall_emisivity", exact: true }));
      await expectVisible(problems.getByRole("cell", { name: "wall_emissivity", exact: true }));
    });
  });

  test("the sample file link downloads the documented sample", async () => {
    await withCatalogue("designer", async (page) => {
      const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download the sample file" }).click()]);
      expect(download.suggestedFilename()).toBe("panel-products.csv");
      const path = await download.path();
      const { readFileSync } = await import("node:fs");
      expect(readFileSync(path, "utf8").split(/\r?\n/)[0]).toBe(HEADER);
    });
  });
});

describe("the catalogue page for other roles", () => {
  test("a facility manager sees the products but no import form or delete buttons", async () => {
    await withCatalogue("facility_manager", async (page) => {
      await expectVisible(page.getByRole("heading", { name: "Products" }));
      await expect(page.getByLabel("CSV file").count()).resolves.toBe(0);
      await expect(page.getByRole("button", { name: /^Delete / }).count()).resolves.toBe(0);
    });
  });

  test("an occupant has no Catalogue link and gets the not-found page at /catalogue", async () => {
    const context = await browser.newContext();
    try {
      const page = await context.newPage();
      const account = demoAccount("occupant");
      await signInThroughPage(page, account.email, account.password);
      await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Catalogue" }).count()).resolves.toBe(0);
      const response = await page.goto(`${BASE_URL}/catalogue`);
      expect(response?.status()).toBe(404);
      await expect(page.getByRole("heading", { level: 1, name: "Panel catalogue" }).count()).resolves.toBe(0);
    } finally {
      await context.close();
    }
  });
});
