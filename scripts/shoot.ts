// Takes screenshots of app pages in Debian's chromium at phone and desk widths, for looking at screens.
// Usage: tsx scripts/shoot.ts --base http://127.0.0.1:3000 --as tech@bootwright.test --out tmp/shots /path1 /path2 ...
// Signs in first when --as is given (demo password). Writes <out>/<name>-390.png and -1280.png.
import { chromium } from '@playwright/test';
import { mkdirSync } from 'node:fs';
import path from 'node:path';

const args = process.argv.slice(2);
const opt = (name: string, dflt: string) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 ? args.splice(i, 2)[1]! : dflt;
};
const base = opt('base', 'http://127.0.0.1:3000');
const as = opt('as', '');
const out = opt('out', 'tmp/shots');
const password = opt('password', 'bootwright-demo-2026');
const paths = args.length ? args : ['/'];

async function main() {
  mkdirSync(out, { recursive: true });
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
  for (const width of [390, 1280]) {
    const page = await browser.newPage({ viewport: { width, height: width === 390 ? 844 : 800 } });
    if (as) {
      const res = await page.request.post(`${base}/api/auth/sign-in/email`, { data: { email: as, password }, headers: { Origin: base } });
      if (!res.ok()) throw new Error(`sign-in as ${as} failed: ${res.status()}`);
    }
    for (const p of paths) {
      await page.goto(base + p);
      await page.waitForLoadState('networkidle');
      await page.waitForTimeout(400);
      const name = (p.replace(/[^a-z0-9]+/gi, '_').replace(/^_|_$/g, '') || 'root') + (as ? `-${as.split('@')[0]}` : '');
      const file = path.join(out, `${name}-${width}.png`);
      await page.screenshot({ path: file, fullPage: true });
      console.log(file);
    }
    await page.close();
  }
  await browser.close();
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
