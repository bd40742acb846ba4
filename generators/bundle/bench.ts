/**
 * `npm run bench:bundle`: builds the bundle of a generated 1,000-station site (demo.ts) and, in the same
 * run, zips the very same files with Info-ZIP `zip` (Debian `zip`) at the same DEFLATE level. The files
 * are first written to a temporary folder (extracted from our zip with Info-ZIP `unzip`); only the `zip`
 * step is timed on that side, and only buildBundle (input to finished file) on ours. Prints the median
 * of a few runs in wall and CPU time (CPU is the fairer figure on a shared, busy machine), the ratios,
 * and the peak RSS while our builds ran. BENCH_STATIONS and BENCH_RUNS change
 * the size and the number of runs.
 */
import { spawnSync } from 'node:child_process';
import { createWriteStream, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BUNDLE_DEFLATE_LEVEL, buildBundle, demoBundleSite } from './index';
import type { BundleSite } from './index';
import type { DeflateEngine } from './deflate';

const ENGINES: DeflateEngine[] = ['pako', 'node-zlib'];

const STATIONS = Number(process.env.BENCH_STATIONS ?? 1000);
const RUNS = Number(process.env.BENCH_RUNS ?? 3);

function need(command: string): void {
  if (spawnSync('sh', ['-c', `command -v ${command}`]).status !== 0) {
    throw new Error(`${command} is missing: install the Debian package "${command}"`);
  }
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

type Timing = { wall: number; cpu: number; peakRss?: number };

/** Highest RSS seen while `run` is busy (sampled every 20 ms). */
async function withPeak<T extends Timing>(run: () => Promise<T>): Promise<T> {
  let peak = process.memoryUsage().rss;
  const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
  const result = await run();
  clearInterval(sampler);
  return { ...result, peakRss: Math.max(peak, process.memoryUsage().rss) };
}

/** Wall and CPU milliseconds of one build, from the call to the written file. */
function buildOnce(site: BundleSite, file: string, deflate: DeflateEngine): Promise<Timing> {
  return new Promise((resolve, reject) => {
    const started = process.hrtime.bigint();
    const cpu = process.cpuUsage();
    const out = createWriteStream(file);
    const stream = buildBundle(site, { deflate });
    stream.on('error', reject);
    out.on('error', reject);
    out.on('finish', () => {
      const used = process.cpuUsage(cpu);
      resolve({ wall: Number(process.hrtime.bigint() - started) / 1e6, cpu: (used.user + used.system) / 1000 });
    });
    stream.pipe(out);
  });
}

/** Wall and CPU milliseconds of one Info-ZIP run (CPU from bash's `times` for its child). */
function zipOnce(folder: string, file: string): Timing {
  rmSync(file, { force: true });
  // -X: no extra attributes, -D: no folder entries (the bundle has none), -q quiet.
  const script = `zip -q -r -X -D -${BUNDLE_DEFLATE_LEVEL} "$1" . && times`;
  const started = process.hrtime.bigint();
  const res = spawnSync('bash', ['-c', script, 'bench', file], { cwd: folder, encoding: 'utf8' });
  const wall = Number(process.hrtime.bigint() - started) / 1e6;
  if (res.status !== 0) throw new Error(`zip failed: ${res.stderr}`);
  // `times` prints the shell's user/sys, then its children's: "0m0.393s 0m0.234s".
  const child = res.stdout.trim().split('\n')[1] ?? '';
  const secs = [...child.matchAll(/(\d+)m([\d.]+)s/g)].map((m) => Number(m[1]) * 60 + Number(m[2]));
  return { wall, cpu: (secs[0] + secs[1]) * 1000 };
}

async function main(): Promise<void> {
  need('zip');
  need('unzip');
  const work = mkdtempSync(join(tmpdir(), 'bw-bench-bundle-'));
  const site = demoBundleSite(STATIONS);
  const ours = join(work, 'ours.zip');
  const theirs = join(work, 'infozip.zip');
  const files = join(work, 'files');

  const baseline = process.memoryUsage().rss;
  const oursRuns = new Map<DeflateEngine, Timing[]>();
  for (const engine of ENGINES) {
    const runs: Timing[] = [];
    for (let i = 0; i < RUNS; i++) runs.push(await withPeak(() => buildOnce(site, ours, engine)));
    oursRuns.set(engine, runs);
  }

  const unzip = spawnSync('unzip', ['-q', ours, '-d', files]);
  if (unzip.status !== 0) throw new Error(`unzip failed: ${unzip.stderr}`);
  const zipRuns: Timing[] = [];
  for (let i = 0; i < RUNS; i++) zipRuns.push(zipOnce(files, theirs));

  const mb = (n: number) => (n / 1024 / 1024).toFixed(1);
  const line = (runs: Timing[]) => {
    const wall = median(runs.map((r) => r.wall));
    const cpu = median(runs.map((r) => r.cpu));
    return { wall, cpu, text: `${wall.toFixed(0)} ms wall, ${cpu.toFixed(0)} ms CPU (wall runs: ${runs.map((r) => r.wall.toFixed(0)).join(', ')})` };
  };
  const b = line(zipRuns);
  console.log(`stations: ${STATIONS} (${site.pcs.length} PC folders), runs: ${RUNS}, DEFLATE level ${BUNDLE_DEFLATE_LEVEL}`);
  console.log(`Info-ZIP zip:                   ${b.text}, ${mb(statSync(theirs).size)} MB`);
  for (const engine of ENGINES) {
    const a = line(oursRuns.get(engine)!);
    console.log(`buildBundle (${engine.padEnd(9)}):       ${a.text}`);
    console.log(`  ratio to Info-ZIP: ${(a.wall / b.wall).toFixed(2)} wall, ${(a.cpu / b.cpu).toFixed(2)} CPU  (aim: at most 1.5)`);
  }
  console.log(`our zip (last build, node-zlib): ${mb(statSync(ours).size)} MB`);
  const first = oursRuns.get(ENGINES[0])![0].peakRss!;
  const all = Math.max(...[...oursRuns.values()].flat().map((r) => r.peakRss!));
  console.log(
    `peak RSS: first build ${mb(first)} MB (process at ${mb(baseline)} MB before it, demo site in memory); ` +
      `over all ${RUNS * ENGINES.length} builds ${mb(all)} MB (garbage of earlier builds not yet collected)`,
  );
  rmSync(work, { recursive: true, force: true });
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
