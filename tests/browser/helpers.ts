import { expect } from "vitest";
import type { Locator } from "playwright-core";

/**
 * Waits (up to `timeoutMs`) for the locator to be visible and asserts it: client-side
 * navigation changes the URL before the new page has rendered, so a bare `isVisible()` races.
 */
export async function expectVisible(locator: Locator, timeoutMs = 10_000): Promise<void> {
  await locator.first().waitFor({ state: "visible", timeout: timeoutMs }).catch(() => undefined);
  expect(await locator.first().isVisible(), `expected ${locator.toString()} to be visible`).toBe(true);
}
