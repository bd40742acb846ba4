/**
 * A 1,000-station generated site streams into a file with its process memory growing by well under
 * 300 MB: each PC folder is rendered only when JSZip reaches it (the first bytes leave long before the
 * last folder exists), and the finished file passes Info-ZIP's `unzip -t`.
 */
import { createWriteStream, statSync } from 'node:fs';
import { join } from 'node:path';
import { buildBundle, bundleLayout, demoBundleSite } from '@/generators/bundle';
import { tempDir, unzipNames, unzipTest } from '@/tests/support/bundle-zip';

const MB = 1024 * 1024;

it('bundles a 1,000-station site with peak RSS growth under 300 MB, streaming as it renders', async () => {
  const site = demoBundleSite(1000);
  const file = join(tempDir('bw-bundle-mem-'), 'site-1000.zip');
  const baseline = process.memoryUsage();
  let peakRss = baseline.rss;
  let peakHeap = baseline.heapUsed;
  const sample = () => {
    const m = process.memoryUsage();
    peakRss = Math.max(peakRss, m.rss);
    peakHeap = Math.max(peakHeap, m.heapUsed);
  };
  const timer = setInterval(sample, 10);
  let done = 0;
  let doneAtFirstBytes = -1;
  await new Promise<void>((resolve, reject) => {
    const out = createWriteStream(file);
    const stream = buildBundle(site, { onProgress: (d) => (done = d) });
    stream.once('data', () => (doneAtFirstBytes = done));
    stream.on('error', reject);
    out.on('error', reject);
    out.on('finish', () => resolve());
    stream.pipe(out);
  });
  clearInterval(timer);
  sample();

  const rssGrowth = (peakRss - baseline.rss) / MB;
  const heapGrowth = (peakHeap - baseline.heapUsed) / MB;
  console.log(
    `1,000 stations (${site.pcs.length} PC folders): ${(statSync(file).size / MB).toFixed(1)} MB zip; ` +
      `RSS ${(baseline.rss / MB).toFixed(0)} -> peak ${(peakRss / MB).toFixed(0)} MB (+${rssGrowth.toFixed(0)}), ` +
      `heap +${heapGrowth.toFixed(0)} MB`,
  );
  expect(rssGrowth).toBeLessThan(300);
  expect(heapGrowth).toBeLessThan(300);
  expect(doneAtFirstBytes).toBeGreaterThanOrEqual(0);
  expect(doneAtFirstBytes).toBeLessThan(site.pcs.length / 10);
  expect(done).toBe(site.pcs.length);
  expect(unzipTest(file).status).toBe(0);
  expect(unzipNames(file)).toEqual(bundleLayout(site));
}, 60_000);
