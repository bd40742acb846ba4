import { chromium } from '@playwright/test';
(async () => {
  const b = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--headless', '--no-sandbox', '--disable-gpu'] });
  const p = await b.newPage();
  p.on('console', (m) => console.log('console', m.type(), m.text().slice(0, 300)));
  p.on('pageerror', (e) => console.log('pageerror', e.message.slice(0, 500)));
  const base = process.argv[2];
  await p.request.post(`${base}/api/auth/sign-in/email`, { data: { email: 'admin@bootwright.test', password: 'bootwright-demo-2026' }, headers: { Origin: base } });
  await p.goto(base + (process.argv[3] ?? '/'));
  await p.waitForTimeout(3000);
  await b.close();
})();
