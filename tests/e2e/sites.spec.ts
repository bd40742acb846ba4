// The site screen: the directory sorts and filters (table at 1280 px, cards at 390 px), a CSV inventory shows
// each row's errors before anything is written, and the directory downloads as CSV. A lead only reads.
import { expect, test } from '@playwright/test';
import { DESK, PHONE, signInAs, watchErrors } from './support';

test('the directory sorts by DOS and filters by kind at 1280 px; a CSV import shows row errors first', async ({ page }) => {
  const errors = watchErrors(page);
  await page.setViewportSize(DESK);
  await signInAs(page, 'tech@bootwright.test', 'technician');
  await page.getByTestId('nav-sites').click();
  await page.getByTestId('site-card-1').click();
  await expect(page.getByTestId('next-pc')).toContainText('PC: 11');

  const names = () => page.locator('[data-testid^="station-row-"]').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-testid')!.slice('station-row-'.length)));
  await page.getByTestId('sort-dos').click();
  await expect(page.getByTestId('sort-dos')).toHaveAttribute('aria-sort', 'ascending');
  await expect.poll(async () => (await names()).slice(0, 2).sort()).toEqual(['ARCHIVE', 'LIBRARY']);
  await page.getByTestId('sort-dos').click();
  await expect(page.getByTestId('sort-dos')).toHaveAttribute('aria-sort', 'descending');
  await expect.poll(async () => (await names())[0]).toMatch(/RECEPT|DRAFT2|STUDIO/);
  await page.getByTestId('station-kind-filter-printer').click();
  await expect.poll(names).toEqual(['HALLPRN', 'PLOTPRN']);
  await page.getByTestId('station-kind-filter-all').click();

  await page.getByTestId('open-import').click();
  await page.getByTestId('csv-text').fill('name,number,kind,location,dos\nCOPYRM,,pc,Copy room,6.22\nCON,,pc,Front,5.0\nRECEPT,,pc,Again,6.22\n');
  await page.getByTestId('csv-check').click();
  await expect(page.getByTestId('csv-summary')).toContainText('1 row ready, 2 with errors');
  await expect(page.getByTestId('csv-row-3')).toContainText('device name');
  await expect(page.getByTestId('csv-row-4')).toContainText('RECEPT is already used at this site');
  await expect(page.getByTestId('csv-commit')).toHaveCount(0);
  await expect(page.getByTestId('station-row-COPYRM')).toHaveCount(0);

  await page.getByTestId('csv-text').fill('name,number,kind,location,dos\nCOPYRM,,pc,Copy room,6.22\nFAXMODEM,,modem,Copy room,\n');
  await page.getByTestId('csv-check').click();
  await expect(page.getByTestId('csv-summary')).toContainText('2 rows ready, 0 with errors');
  await page.getByTestId('csv-commit').click();
  await expect(page.getByTestId('csv-done')).toContainText('2 stations imported');
  await expect(page.getByTestId('station-row-COPYRM')).toContainText('11');
  await expect(page.getByTestId('station-row-FAXMODEM')).toContainText('151');
  await expect(page.getByTestId('next-pc')).toContainText('PC: 12');

  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-csv').click()]);
  expect(download.suggestedFilename()).toBe('HALVORSE.CSV');
  const csv = await (await download.createReadStream()).toArray();
  const text = Buffer.concat(csv as Buffer[]).toString('utf8');
  expect(text.split('\r\n')[0]).toBe('name,number,kind,location,notes,dos,network_port,plan_status,autoexec,config');
  expect(text).toContain('COPYRM,11,pc,Copy room,,6.22,,profile-draft,missing,missing');
  expect(errors).toEqual([]);
});

test('a phone shows the directory as cards, and a lead reads without edit buttons', async ({ page }) => {
  const errors = watchErrors(page);
  await page.setViewportSize(PHONE);
  await signInAs(page, 'lead@bootwright.test', 'lead');
  await page.goto('/sites/1');
  await expect(page.getByTestId('station-cards')).toBeVisible();
  await expect(page.getByTestId('station-table')).toHaveCount(0);
  await expect(page.getByTestId('station-card-RECEPT')).toContainText('DOS 6.22 · network COM1');
  await expect(page.getByTestId('add-pc')).toHaveCount(0);
  await expect(page.getByTestId('open-import')).toHaveCount(0);
  await page.getByTestId('station-filter').fill('draft');
  await expect(page.locator('[data-testid^="station-card-"]')).toHaveCount(3);
  await page.getByTestId('station-card-DRAFT1').click();
  await expect(page.getByTestId('wizard-screen')).toBeVisible();
  await expect(page.getByTestId('wizard-read-only')).toBeVisible();
  // DRAFT1's profile is complete, so the wizard opens on its plan preview (Windows at the end, DOS 5.0).
  await expect(page.getByTestId('plan-preview')).toBeVisible();
  await expect(page.getByTestId('boot-after-loader')).toContainText('C:\\THREAD\\TLRES.COM /S:2 /Q');
  await page.getByTestId('wizard-back').click();
  await expect(page.getByTestId('wizard-next')).toHaveText('Next →');
  await expect(page.getByTestId('final-pick-5')).toHaveCount(0);
  expect(errors).toEqual([]);
});
