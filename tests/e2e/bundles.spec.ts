// The admin downloads the demo site's rollout bundle in the browser, at 390 px and at 1280 px: first a
// technician and a lead make two approved plans through the API; the screen lists them as going in and
// says why every other station stays out; the download shows stations done of total, the test saves it
// and Info-ZIP (Debian `unzip -t`) accepts it; the record appears in the history with its SHA-256, and
// "download again" gives the same bytes.
import { expect, test, type APIRequestContext, type Browser, type Page } from '@playwright/test';
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { DEMO_PASSWORD, DESK, PHONE, signInAs, watchErrors } from './support';

test.describe.configure({ mode: 'serial' });

async function apiAs(browser: Browser, email: string, baseURL: string): Promise<APIRequestContext> {
  const context = await browser.newContext({ baseURL });
  const res = await context.request.post('/api/auth/sign-in/email', { data: { email, password: DEMO_PASSWORD }, headers: { Origin: baseURL } });
  expect(res.ok()).toBe(true);
  return context.request;
}

/** A technician plans and sends each station (a reason for every warning), a lead approves it. */
async function approvePlans(browser: Browser, baseURL: string, names: string[]) {
  const tech = await apiAs(browser, 'tech@bootwright.test', baseURL);
  const lead = await apiAs(browser, 'lead@bootwright.test', baseURL);
  const board = (await (await tech.get('/api/plans/board')).json()) as { items: Array<{ station: { id: number; name: string } }> };
  for (const name of names) {
    const stationId = board.items.find((i) => i.station.name === name)!.station.id;
    const made = await tech.post('/api/plans', { data: { stationId } });
    expect(made.status()).toBe(201);
    const draft = (await made.json()) as { plan: { id: number; version: number }; missingReasons: string[] };
    const reasons = Object.fromEntries(draft.missingReasons.map((k) => [k, 'Checked with the office manager on site.']));
    const sent = await tech.post(`/api/plans/${draft.plan.id}/submit`, { data: { version: draft.plan.version, reasons } });
    expect(sent.status()).toBe(200);
    const inReview = (await sent.json()) as { plan: { version: number; planHash: string } };
    const ok = await lead.post(`/api/plans/${draft.plan.id}/approve`, { data: { version: inReview.plan.version, planHash: inReview.plan.planHash } });
    expect(ok.status()).toBe(200);
  }
}

/** Info-ZIP's verdict (Debian package `unzip`) and its list of entry names. */
function infoZip(file: string) {
  const test = spawnSync('unzip', ['-t', file], { encoding: 'utf8' });
  const list = spawnSync('unzip', ['-Z1', file], { encoding: 'utf8' });
  return { status: test.status, output: `${test.stdout}${test.stderr}`, names: list.stdout.split('\n').filter(Boolean) };
}

async function openBundles(page: Page, wide: boolean) {
  const nav = page.getByTestId(wide ? 'side-nav' : 'bottom-tabs');
  await nav.getByTestId('nav-bundles').click();
  await expect(page.getByTestId('bundles-screen')).toBeVisible();
}

const sha256 = (file: string) => createHash('sha256').update(readFileSync(file)).digest('hex');

for (const [size, stations] of [[PHONE, ['PRINCIPL', 'INTERN']], [DESK, ['ACCOUNTS', 'ARCHIVE']]] as const) {
  test(`the admin downloads the demo site's bundle at ${size.width} px`, async ({ browser, baseURL }, info) => {
    await approvePlans(browser, baseURL!, [...stations]);
    const context = await browser.newContext({ viewport: size, baseURL, acceptDownloads: true });
    const page = await context.newPage();
    const errors = watchErrors(page);
    const shot = (name: string) => page.screenshot({ path: `test-results/bundles-${size.width}-${name}.png`, fullPage: true });
    await signInAs(page, 'admin@bootwright.test', 'admin');
    await openBundles(page, size.width >= 900);

    // What goes in, and why the rest stays out.
    for (const name of stations) await expect(page.getByTestId(`bundle-in-${name}`)).toBeVisible();
    await expect(page.getByTestId('bundle-out-group-not_pc')).toContainText('HALLPRN');
    await expect(page.getByTestId('bundle-out-group-not_pc')).toContainText('no startup files');
    await expect(page.getByTestId('bundle-left-out')).toContainText('No plan');
    const count = await page.locator('[data-testid^="bundle-in-"]').count();
    await expect(page.getByTestId('bundle-download')).toHaveText(`Download bundle (${count} PCs)`);

    // Unticking a PC leaves it out of this download; ticking it again puts it back.
    await page.getByTestId(`bundle-tick-${stations[0]}`).click();
    await expect(page.getByTestId('bundle-download')).toHaveText(count === 2 ? 'Download bundle (1 PC)' : `Download bundle (${count - 1} PCs)`);
    await page.getByTestId(`bundle-tick-${stations[0]}`).click();
    await expect(page.getByTestId('bundle-download')).toHaveText(`Download bundle (${count} PCs)`);
    await shot('preview');

    // Hold the zip back at the browser for a moment: meanwhile the screen shows the server's count.
    let letGo!: () => void;
    const held = new Promise<void>((r) => (letGo = r));
    await page.route('**/api/bundles/*/zip', async (route) => {
      const response = await route.fetch();
      await held;
      await route.fulfill({ response });
    });
    const downloading = page.waitForEvent('download');
    await page.getByTestId('bundle-download').click();
    await expect(page.getByTestId('bundle-progress')).toBeVisible();
    await expect(page.getByTestId('bundle-progress-text')).toHaveText(new RegExp(`Building and sending: ${count} of ${count} stations`));
    await shot('progress');
    letGo();
    const download = await downloading;
    await page.unroute('**/api/bundles/*/zip');

    expect(download.suggestedFilename()).toMatch(/^HALV\d{4}\.ZIP$/);
    const file = info.outputPath(download.suggestedFilename());
    await download.saveAs(file);
    const zip = infoZip(file);
    expect(zip.output).toMatch(/No errors detected/);
    expect(zip.status).toBe(0);
    for (const name of stations) expect(zip.names).toContain(`${name}/INSTALL.BAT`);
    expect(zip.names).toContain('MANIFEST.CSV');

    // Recorded with its hash, shown in the history, with "download again".
    const hash = sha256(file);
    await expect(page.getByTestId('bundle-done')).toContainText('downloaded');
    await expect(page.getByTestId('bundle-done')).toContainText('released');
    expect((await page.getByTestId('bundle-done-sha').innerText()).replace(/\s/g, '')).toBe(`SHA-256${hash}`);
    const record = page.locator('[data-testid^="bundle-record-"][data-testid$="-sha"]').filter({ hasText: hash.slice(0, 32) });
    await expect(record).toBeVisible();
    const id = (await record.getAttribute('data-testid'))!.split('-')[2];
    await expect(page.getByTestId(`bundle-record-${id}-state`)).toHaveText('✓ Downloaded');
    for (const name of stations) await expect(page.getByTestId(`bundle-out-${name}`)).toBeVisible();
    await shot('done');

    const again = page.waitForEvent('download');
    await page.getByTestId(`bundle-again-${id}`).click();
    const second = await again;
    const file2 = info.outputPath(`again-${second.suggestedFilename()}`);
    await second.saveAs(file2);
    expect(second.suggestedFilename()).toBe(download.suggestedFilename());
    expect(sha256(file2)).toBe(hash);
    await expect(page.getByTestId('bundle-done')).toContainText(`Bundle #${id} fetched again`);
    expect(errors).toEqual([]);
    await context.close();
  });
}
