// The whole review loop in the browser on the demo data, at phone and desk width: the technician sends a
// plan; a lead opens it, comments on a line and returns it; the technician makes a new revision; a lead
// approves it; the technician replaces the AUTOEXEC.BAT and the approval shows as stale.
import { expect, test, type Browser, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DESK, PHONE, watchErrors } from './support';

/** A page of its own (cookies apart) signed in through the API, to keep the test fast. */
async function pageAs(browser: Browser, email: string, viewport: { width: number; height: number }, baseURL: string): Promise<Page> {
  const context = await browser.newContext({ viewport, baseURL });
  const res = await context.request.post('/api/auth/sign-in/email', { data: { email, password: DEMO_PASSWORD }, headers: { Origin: baseURL } });
  expect(res.ok()).toBe(true);
  return context.newPage();
}

const planIdOf = (page: Page) => Number(new URL(page.url()).pathname.split('/').pop());

for (const [size, stationName] of [[PHONE, 'STUDIO'], [DESK, 'DRAFT2']] as const) {
  test(`review loop at ${size.width} px on ${stationName}`, async ({ browser, baseURL }) => {
    const tech = await pageAs(browser, 'tech@bootwright.test', size, baseURL!);
    const lead = await pageAs(browser, 'lead@bootwright.test', size, baseURL!);
    const errors = [...watchErrors(tech), ...watchErrors(lead)];
    const shot = (page: Page, name: string) => page.screenshot({ path: `test-results/review-${size.width}-${name}.png` });

    // The technician makes a plan from the board and sends it.
    await tech.goto('/plans');
    await tech.getByTestId(`board-plan-${stationName}`).click();
    await expect(tech.getByTestId('plan-state')).toHaveText('✎ Draft');
    await expect(tech.getByTestId('diff-autoexec')).toContainText('TLRES.COM');
    const first = planIdOf(tech);
    await tech.getByTestId('submit-plan').click();
    await expect(tech.getByTestId('plan-state')).toHaveText('… In review');

    // The lead finds it in the queue, comments on a line of the new file, and returns it.
    await lead.goto('/review');
    await lead.getByTestId(`queue-${stationName}`).click();
    await expect(lead).toHaveURL(new RegExp(`/review/${first}$`));
    const view = (await (await lead.request.get(`/api/plans/${first}`)).json()) as { plan: { result: { changes: Array<{ file: string; line: number }> } } };
    const line = view.plan.result.changes.find((c) => c.file === 'AUTOEXEC.BAT')!.line + 1;
    await lead.getByTestId(`diff-autoexec-line-${line}`).click();
    await lead.getByTestId('line-comment-input').fill('Check the baud rate against the adapter switches.');
    await lead.getByTestId('line-comment-send').click();
    await expect(lead.getByTestId(`line-comment-AUTOEXEC.BAT-${line}`)).toContainText('Check the baud rate');
    await expect(lead.getByTestId('boot-after')).toContainText('TLRES.COM');
    await expect(lead.getByTestId('profile-summary')).toContainText('Threadline 2.1');
    await shot(lead, 'lead-comment');
    await lead.getByTestId('decision-comment').fill('Please confirm the adapter runs at 9600 baud.');
    await lead.getByTestId('return').click();
    await expect(lead.getByTestId('plan-state')).toHaveText('↩ Returned');

    // The technician reads the return and the line comment, and makes a new revision.
    await tech.goto(`/plans/${first}`);
    await expect(tech.getByTestId('decision-note')).toContainText('9600 baud');
    await expect(tech.getByTestId(`line-comment-AUTOEXEC.BAT-${line}`)).toBeVisible();
    await tech.getByTestId('new-revision').click();
    await expect(tech).not.toHaveURL(new RegExp(`/plans/${first}$`));
    await expect(tech.getByTestId('plan-state')).toHaveText('✎ Draft');
    const second = planIdOf(tech);
    await tech.getByTestId('submit-plan').click();
    await expect(tech.getByTestId('plan-state')).toHaveText('… In review');

    // The lead approves the new revision.
    await lead.goto(`/review/${second}`);
    await expect(lead.getByTestId('approving-hash')).toContainText('plan ');
    await lead.getByTestId('approve').click();
    await expect(lead.getByTestId('plan-state')).toHaveText('✓ Approved');
    await expect(lead.getByTestId('plan-state-stale')).toHaveCount(0);
    await shot(lead, 'approved');

    // The technician replaces the AUTOEXEC.BAT (the stations' paste route); the approval no longer holds.
    const plan = (await (await tech.request.get(`/api/plans/${second}`)).json()) as { station: { id: number }; plan: { result: { files: { autoexec: { beforeText: string } } } } };
    const text = `${plan.plan.result.files.autoexec.beforeText.replace(/\r\n/g, '\n')}ECHO Ready\n`;
    const pasted = await tech.request.post(`/api/stations/${plan.station.id}/files/paste`, { data: { kind: 'AUTOEXEC.BAT', text } });
    expect(pasted.status()).toBe(201);
    await tech.goto(`/plans/${second}`);
    await expect(tech.getByTestId('plan-state')).toHaveText('✓ Approved');
    await expect(tech.getByTestId('plan-state-stale')).toBeVisible();
    await expect(tech.getByTestId('stale-banner')).toContainText('AUTOEXEC.BAT');
    await tech.goto('/plans');
    await expect(tech.getByTestId(`board-state-${stationName}-stale`)).toBeVisible();
    await shot(tech, 'stale-board');
    expect(errors).toEqual([]);
  });
}

test('two leads approve at once: one wins, the other sees the fresh view', async ({ browser, baseURL }) => {
  const tech = await pageAs(browser, 'tech@bootwright.test', DESK, baseURL!);
  const a = await pageAs(browser, 'lead@bootwright.test', DESK, baseURL!);
  const b = await pageAs(browser, 'lead2@bootwright.test', PHONE, baseURL!);
  const made = await tech.request.post('/api/plans', { data: { stationId: (await stationId(tech, 'LIBRARY')) } });
  const plan = (await made.json()) as { plan: { id: number; version: number } };
  expect((await tech.request.post(`/api/plans/${plan.plan.id}/submit`, { data: { version: plan.plan.version } })).status()).toBe(200);
  await a.goto(`/review/${plan.plan.id}`);
  await b.goto(`/review/${plan.plan.id}`);
  await expect(b.getByTestId('approve')).toBeEnabled();
  await a.getByTestId('approve').click();
  await expect(a.getByTestId('plan-state')).toHaveText('✓ Approved');
  await b.getByTestId('approve').click();
  await expect(b.getByTestId('decision-error')).toContainText('approved');
  await expect(b.getByTestId('plan-state')).toHaveText('✓ Approved');
  await expect(b.getByTestId('decision-card')).toContainText('not waiting for review');
});

async function stationId(page: Page, name: string): Promise<number> {
  const board = (await (await page.request.get('/api/plans/board')).json()) as { items: Array<{ station: { id: number; name: string } }> };
  return board.items.find((i) => i.station.name === name)!.station.id;
}
