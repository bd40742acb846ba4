// The foundation in the browser: every demo role signs in, sees its own home and navigation, signs out;
// protected routes send a signed-out visitor to sign-in; a wrong password gets a clear message; fonts load;
// an invitation link sets a password once.
import { expect, test } from '@playwright/test';
import { NAV_ITEMS, navFor } from '../../constants/navigation';
import { DESK, PHONE, signInAs, signOut, watchErrors } from './support';

const ROLES = [
  { role: 'admin' as const, email: 'admin@bootwright.test' },
  { role: 'lead' as const, email: 'lead@bootwright.test' },
  { role: 'technician' as const, email: 'tech@bootwright.test' },
  { role: 'user' as const, email: 'user@bootwright.test' },
];

for (const size of [PHONE, DESK]) {
  test.describe(`at ${size.width} px`, () => {
    test.use({ viewport: size });

    for (const r of ROLES) {
      test(`${r.role} signs in, sees its home and navigation, signs out`, async ({ page }) => {
        const errors = watchErrors(page);
        const mine = navFor(r.role).map((i) => i.testID);
        const others = NAV_ITEMS.map((i) => i.testID).filter((id) => !mine.includes(id));
        await signInAs(page, r.email, r.role);
        await expect(page.getByTestId('role-chip')).toBeVisible();
        const wide = size.width >= 900;
        const nav = page.getByTestId(wide ? 'side-nav' : 'bottom-tabs');
        await expect(nav).toBeVisible();
        await expect(page.getByTestId(wide ? 'bottom-tabs' : 'side-nav')).toHaveCount(0);
        // On a phone the bar holds the first few; the rest are one tap away under More.
        const inBar = wide || mine.length <= 5 ? mine : mine.slice(0, 4);
        for (const id of inBar) await expect(nav.getByTestId(id)).toBeVisible();
        for (const id of others) await expect(page.getByTestId(id)).toHaveCount(0);
        await page.screenshot({ path: `test-results/home-${r.role}-${size.width}.png`, fullPage: true });
        if (inBar.length < mine.length) {
          await nav.getByTestId('nav-more').click();
          for (const id of mine) await expect(page.getByTestId(`more-${id}`)).toBeVisible();
          for (const id of others) await expect(page.getByTestId(`more-${id}`)).toHaveCount(0);
        }
        await signOut(page);
        expect(errors).toEqual([]);
      });
    }
  });
}

test('a signed-out visit to a protected route ends on sign-in', async ({ page }) => {
  await page.goto('/people');
  await expect(page.getByTestId('sign-in-screen')).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in$/);
});

test('a wrong password shows a clear message and keeps the visitor on sign-in', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByTestId('email').fill('tech@bootwright.test');
  await page.getByTestId('password').fill('not-the-right-password');
  await page.getByTestId('sign-in-submit').click();
  await expect(page.getByTestId('sign-in-error')).toContainText('do not match');
  await expect(page).toHaveURL(/\/sign-in$/);
});

test('empty fields and a malformed e-mail are questioned before anything is sent', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByTestId('sign-in-submit').click();
  await expect(page.getByTestId('email-error')).toHaveText('Enter an e-mail address.');
  await expect(page.getByTestId('password-error')).toHaveText('Enter your password.');
  await page.getByTestId('email').fill('not-an-email');
  await page.getByTestId('password').fill('x');
  await page.getByTestId('sign-in-submit').click();
  await expect(page.getByTestId('email-error')).toContainText('valid e-mail');
});

test('a non-admin opening an admin screen is told it is not part of the role', async ({ page }) => {
  await signInAs(page, 'lead@bootwright.test', 'lead');
  await page.goto('/people');
  await expect(page.getByTestId('role-refused')).toBeVisible();
});

test('the shipped fonts load before the first screen', async ({ page }) => {
  await page.goto('/sign-in');
  await expect(page.getByTestId('sign-in-screen')).toBeVisible();
  const ok = await page.evaluate(async () => {
    await document.fonts.ready;
    return document.fonts.check('16px Inter_400Regular') && document.fonts.check('16px Inter_600SemiBold') && document.fonts.check('13px JetBrainsMono_400Regular');
  });
  expect(ok).toBe(true);
});

test('an admin invites a technician; the link sets a password once; the new person signs in', async ({ page, browser }) => {
  test.setTimeout(90_000);
  await page.setViewportSize(PHONE);
  await signInAs(page, 'admin@bootwright.test', 'admin');
  await page.goto('/people');
  await page.getByTestId('invite-name').fill('Noor Abbasi');
  await page.getByTestId('invite-email').fill('noor@bootwright.test');
  await page.getByTestId('invite-role-technician').click();
  await page.getByTestId('invite-submit').click();
  await expect(page.getByTestId('invite-sent')).toBeVisible();

  // The local mail fake kept the message; read the link from the admin-only API.
  const mail = await page.request.get('/api/dev/mail');
  const items = (await mail.json()).items as Array<{ to: string[]; text: string }>;
  const invite = items.find((m) => m.to.includes('noor@bootwright.test'));
  expect(invite).toBeDefined();
  const link = invite!.text.match(/https?:\/\/\S+accept-invite\?token=\S+/)![0];

  const other = await browser.newContext({ viewport: PHONE });
  const guest = await other.newPage();
  await guest.goto(new URL(link).pathname + new URL(link).search);
  await guest.getByTestId('new-password').fill('lantern-harbor-91');
  await guest.getByTestId('confirm-password').fill('lantern-harbor-91');
  await guest.getByTestId('set-password').click();
  await expect(guest.getByTestId('invite-done')).toBeVisible();

  // The link works once.
  await guest.goto(new URL(link).pathname + new URL(link).search);
  await expect(guest.getByTestId('invite-invalid')).toBeVisible();

  await signInAs(guest, 'noor@bootwright.test', 'technician', 'lantern-harbor-91');
  await other.close();
});
