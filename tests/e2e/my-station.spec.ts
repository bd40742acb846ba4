// An office user pastes their AUTOEXEC.BAT, sees the checked edit (diff, checks in plain words, boot order)
// and sends it; the technicians' mail links to the draft plan it opened.
import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, DESK, PHONE, watchErrors } from './support';

// Each width pastes its own file (a file byte for byte the one on record is not stored again).
const pasted = (width: number) => ['@ECHO OFF', `REM Reception PC, checked at ${width} px`, 'PROMPT $P$G', 'PATH C:\\DOS;C:\\WP51', 'C:\\WP51\\WP.EXE'].join('\n');

for (const size of [PHONE, DESK]) {
  test(`a user pastes a file and sends it at ${size.width} px`, async ({ browser, baseURL }) => {
    const context = await browser.newContext({ viewport: size, baseURL });
    await context.request.post('/api/auth/sign-in/email', { data: { email: 'user@bootwright.test', password: DEMO_PASSWORD }, headers: { Origin: baseURL! } });
    const page = await context.newPage();
    const errors = watchErrors(page);
    await page.goto('/');
    await page.getByTestId('nav-my-station').click();
    await expect(page).toHaveURL(/\/my-station$/);

    await page.getByTestId('check-files').click();
    await expect(page.getByTestId('autoexec-text-error')).toContainText('Paste or upload');
    await page.getByTestId('autoexec-text').fill(pasted(size.width));
    await page.getByTestId('check-files').click();
    await expect(page.getByTestId('checked-edit')).toBeVisible();
    await expect(page.getByTestId('diff-autoexec-counts')).toContainText('+ 5 added');
    await expect(page.getByTestId('diff-autoexec')).toContainText('MODE LPT1:=COM1:');
    await expect(page.getByTestId('user-checks')).toContainText('for your information');
    await expect(page.getByTestId('boot-after')).toContainText('+ new');
    await page.screenshot({ path: `test-results/my-station-${size.width}-checked.png` });
    await page.getByTestId('send-files').click();
    await expect(page.getByTestId('sent-banner')).toContainText('AUTOEXEC.BAT stored');

    // The technicians were told; the mail's link opens the draft plan made from the file.
    const admin = await browser.newContext({ viewport: size, baseURL });
    await admin.request.post('/api/auth/sign-in/email', { data: { email: 'admin@bootwright.test', password: DEMO_PASSWORD }, headers: { Origin: baseURL! } });
    const mail = (await (await admin.request.get('/api/dev/mail')).json()) as { items: Array<{ to: string[]; subject: string; text: string }> };
    const notice = mail.items.find((m) => m.subject === 'Priya Nair sent the startup files of RECEPT' && m.to.includes('tech@bootwright.test'));
    expect(notice).toBeDefined();
    const link = new URL(notice!.text.match(/https?:\/\/\S+/)![0]);
    const tech = await browser.newContext({ viewport: size, baseURL });
    await tech.request.post('/api/auth/sign-in/email', { data: { email: 'tech@bootwright.test', password: DEMO_PASSWORD }, headers: { Origin: baseURL! } });
    const techPage = await tech.newPage();
    await techPage.goto(link.pathname);
    await expect(techPage.getByTestId('plan-state')).toHaveText('✎ Draft');
    await expect(techPage.getByTestId('diff-autoexec')).toContainText('WP.EXE');
    expect(errors).toEqual([]);
  });
}
