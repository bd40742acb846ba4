// A technician creates a PC station through the whole profile wizard, uploads a demo AUTOEXEC.BAT, reloads
// halfway and finds the draft, and sees the plan preview with the loader above the final program. Once on a
// 390 px phone, once at 1280 px.
import { statSync } from 'node:fs';
import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { DESK, PHONE, signInAs, watchErrors } from './support';

const FIXTURE = path.join(__dirname, '..', 'fixtures', 'e2e', 'AUTOEXEC.BAT');
const FIXTURE_BYTES = statSync(FIXTURE).size;

async function next(page: Page, step: string) {
  await page.getByTestId('wizard-next').click();
  await expect(page.getByTestId(`wizard-step-${step}`)).toBeVisible();
}

async function runWizard(page: Page, name: string, wide: boolean) {
  const errors = watchErrors(page);
  await signInAs(page, 'tech@bootwright.test', 'technician');
  await page.goto('/sites/1');
  await expect(page.getByTestId(wide ? 'station-table' : 'station-cards')).toBeVisible();
  await page.getByTestId('add-pc').click();

  // 1 Identity: the next free PC number is offered.
  await expect(page.getByTestId('new-station-screen')).toBeVisible();
  const number = await page.getByTestId('station-number').inputValue();
  expect(Number(number)).toBeGreaterThanOrEqual(11);
  await page.getByTestId('station-name').fill('prn');
  await page.getByTestId('wizard-next').click();
  await expect(page.getByTestId('station-name-error')).toContainText('device name');
  await page.getByTestId('station-name').fill(name);
  await page.getByTestId('station-location').fill('Plan room, jack J-14');
  await next(page, 'dos');
  await expect(page).toHaveURL(/\/stations\/\d+\/wizard/);

  // 2 DOS, with the VER hint and the caution below the kit's minimum (3.30).
  await expect(page.getByTestId('ver-hint')).toContainText('VER');
  await page.getByTestId('profile-dos').fill('3.10');
  await expect(page.getByTestId('dos-below-min')).toContainText('needs DOS 3.30 or later');
  await page.getByTestId('profile-dos').fill('6.22');
  await expect(page.getByTestId('dos-below-min')).toHaveCount(0);
  await next(page, 'ports');

  // 3 Ports, with the engine's checks live: the adapter on COM1 clears "no adapter recorded".
  await expect(page.getByTestId('check-port-no-adapter')).toBeVisible();
  await page.getByTestId('port-COM1-state-adapter').click();
  await expect(page.getByTestId('check-port-no-adapter')).toHaveCount(0);
  await page.getByTestId('port-COM2-state-mouse').click();
  await next(page, 'network');
  await expect(page.getByTestId('loader-line')).toHaveText(`C:\\THREAD\\TLRES.COM /S:${number} /Q`);

  // Halfway: a reload finds the draft at the step it was saved with, and the earlier answers kept.
  await page.reload();
  await expect(page.getByTestId('wizard-step-network')).toBeVisible();
  await expect(page.getByTestId('net-port-COM1')).toHaveAttribute('aria-checked', 'true');
  await page.getByTestId('wizard-back').click();
  await expect(page.getByTestId('wizard-step-ports')).toBeVisible();
  await expect(page.getByTestId('port-COM1-state-adapter')).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByTestId('port-COM2-state-mouse')).toHaveAttribute('aria-checked', 'true');
  await next(page, 'network');
  await next(page, 'files');

  // 5 Files: upload the demo AUTOEXEC.BAT through the file picker; this PC has no CONFIG.SYS.
  const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('file-autoexec-upload').click()]);
  await chooser.setFiles(FIXTURE);
  await expect(page.getByTestId('file-autoexec-state')).toContainText(`${FIXTURE_BYTES} bytes, uploaded`);
  await page.getByTestId('file-config-none').click();
  await expect(page.getByTestId('file-config-state')).toContainText('This machine has none');
  await next(page, 'final');

  // 6 Final program: the detected line is highlighted; the technician confirms it.
  await expect(page.getByTestId('final-detected')).toContainText('line 6');
  await expect(page.getByTestId('final-file-line-6')).toContainText('Detected final program');
  await page.getByTestId('wizard-next').click();
  await expect(page.getByTestId('wizard-step-final')).toContainText('Confirm the detected line');
  await page.getByTestId('final-confirm').click();
  await expect(page.getByTestId('final-choice')).toContainText('line 6 (the detected one, confirmed)');
  await next(page, 'preview');

  // 7 Preview: the loader runs before the final program, and the diff marks the added lines with +.
  await expect(page.getByTestId('plan-ok')).toBeVisible();
  const boot = await page.locator('[data-testid="boot-after"] [data-testid^="boot-after-"]').allTextContents();
  const loader = boot.findIndex((t) => t.includes('C:\\THREAD\\TLRES.COM'));
  const final = boot.findIndex((t) => t.includes('C:\\PLANS\\PLANVIEW.EXE'));
  expect(loader).toBeGreaterThanOrEqual(0);
  expect(loader).toBeLessThan(final);
  const loaderRow = page.getByTestId(/^diff-autoexec-line-\d+$/).filter({ hasText: `TLRES.COM /S:${number} /Q` });
  await expect(loaderRow).toHaveCount(1);
  await expect(loaderRow).toContainText('+');

  await page.getByTestId('wizard-done').click();
  await expect(page.getByTestId('site-screen')).toBeVisible();
  await expect(page.getByTestId(wide ? `station-row-${name}` : `station-card-${name}`)).toContainText('Profile complete');
  expect(errors).toEqual([]);
}

test('a technician enters a PC through the wizard on a 390 px phone', async ({ page }) => {
  await page.setViewportSize(PHONE);
  await runWizard(page, 'PLANRM1', false);
});

test('the same wizard at 1280 px shows the steps side by side', async ({ page }) => {
  await page.setViewportSize(DESK);
  await runWizard(page, 'PLANRM2', true);
  await expect(page.getByTestId('side-nav')).toBeVisible();
});
