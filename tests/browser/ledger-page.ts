/**
 * Helpers for driving the ledger's screens in the browser tests: find a grid cell by the
 * row's machine name and the column's header, type into it, read the matrix.
 */
import type { Locator, Page } from 'playwright-core';

export const MACHINE_GRID = 'Candidate machines by duty';

export function grid(page: Page, name = MACHINE_GRID): Locator {
  return page.getByRole('grid', { name });
}

/** The aria-colindex of the column whose header reads `header` (exactly). */
export async function columnIndex(gridLocator: Locator, header: string): Promise<number> {
  const index = await gridLocator
    .locator('[role="columnheader"]')
    .evaluateAll(
      (cells, wanted) =>
        cells.find((c) => c.querySelector('.name')?.textContent?.trim() === wanted)?.getAttribute('aria-colindex') ??
        null,
      header,
    );
  if (index === null) throw new Error(`No column headed "${header}"`);
  return Number(index);
}

/** The row whose first cell contains `rowText`. */
export function rowOf(gridLocator: Locator, rowText: string): Locator {
  return gridLocator
    .locator('[role="row"]')
    .filter({ has: gridLocator.page().locator('[role="gridcell"][aria-colindex="1"]', { hasText: rowText }) })
    .first();
}

/** The cell at the row whose first cell contains `rowText` and the column headed `header`. */
export async function cell(gridLocator: Locator, rowText: string, header: string): Promise<Locator> {
  const col = await columnIndex(gridLocator, header);
  return rowOf(gridLocator, rowText).locator(`[role="gridcell"][aria-colindex="${col}"]`);
}

/** Clicks a cell, types text (typing replaces) and presses Enter to commit. */
export async function typeInto(target: Locator, text: string): Promise<void> {
  await target.click();
  await target.page().keyboard.type(text);
  await target.page().keyboard.press('Enter');
}

/** The matrix beside the machine grid, as its visible text. */
export async function matrixText(page: Page): Promise<string> {
  return (await page.getByTestId('matrix').innerText()).trim();
}

/** Opens a tab of the project by its label and waits until its pane is loaded (some load on first use). */
export async function openTab(page: Page, label: string): Promise<void> {
  await page.getByRole('tab', { name: label, exact: true }).click();
  await page.locator('[role="tabpanel"] > .loading').waitFor({ state: 'detached' });
}

/** Waits until the header reports every edit saved. */
export async function waitSaved(page: Page): Promise<void> {
  await page.getByTestId('save-state').filter({ hasText: 'All edits saved' }).waitFor();
}

/** The number of rows the machine grid reports as shown ("42 shown"). */
export async function shownRows(page: Page): Promise<number> {
  const text = await page
    .getByText(/\d+ shown/)
    .first()
    .innerText();
  return Number(/(\d+) shown/.exec(text)?.[1] ?? NaN);
}

/** Puts text on the clipboard and presses Ctrl+V, as a user pasting from a spreadsheet would. */
export async function pasteText(page: Page, text: string): Promise<void> {
  await page.evaluate((t) => navigator.clipboard.writeText(t), text);
  await page.keyboard.press('Control+V');
}

/** Scrolls the grid's viewport to its last rows (rows are rendered only near the view). */
export async function scrollGridToBottom(gridLocator: Locator): Promise<void> {
  await gridLocator.evaluate((el) => (el.scrollTop = el.scrollHeight));
  await gridLocator.page().waitForTimeout(150);
}
