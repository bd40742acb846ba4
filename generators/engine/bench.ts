/**
 * npm run bench:engine: plans a generated corpus of 10,000 AUTOEXEC.BAT files, and in the same run times only
 * decoding and splitting them into lines; prints plans per second, splits per second and the ratio.
 */
import { decodeCp437 } from '../dos/cp437';
import { generateCorpus } from './bench-corpus';
import { splitLines } from './lines';
import { plan } from './plan';
import { parseProfile, type Profile } from './profile';

// Validated once, as the CLI and the API do before they plan; plan() then skips the schema (about 30 µs).
const RAW_PROFILE: Profile = {
  dos: '6.22', bootDrive: 'C', dosDir: 'C:\\DOS',
  ports: [
    { name: 'COM1', present: true, attached: 'adapter' },
    { name: 'COM2', present: true, attached: 'mouse' },
    { name: 'LPT1', present: true, attached: 'none' },
  ],
  network: { port: 'COM1', baud: 9600, parity: 'N', dataBits: 8, stopBits: 1 },
  redirect: { from: 'LPT1', to: 'COM1' },
  loader: { path: 'C:\\THREAD\\TLRES.COM', args: '/S:104 /Q' },
  finalProgram: 'auto', loadHigh: 'auto',
};
const parsed = parseProfile(RAW_PROFILE);
if (!parsed.ok) throw new Error(parsed.error);
const PROFILE = parsed.profile;
const CONFIG = Buffer.from('DEVICE=C:\\DOS\\HIMEM.SYS\r\nDOS=HIGH,UMB\r\nFILES=30\r\n[MENU]\r\nMENUITEM=NETWORK\r\nMENUITEM=PLAIN\r\n', 'latin1');

/** Wall-clock and CPU seconds (user + system) of one run; CPU time is what one core spends, even when
 * other processes share the machine. */
function time(run: () => void): { wall: number; cpu: number } {
  const start = process.hrtime.bigint();
  const cpu = process.cpuUsage();
  run();
  const used = process.cpuUsage(cpu);
  return { wall: Number(process.hrtime.bigint() - start) / 1e9, cpu: (used.user + used.system) / 1e6 };
}

function main(): void {
  const count = Number(process.argv[2] ?? 10_000);
  const corpus = generateCorpus(count);
  let lines = 0;
  let changed = 0;
  // One warm-up pass each, so the timed passes measure the engine, not the JIT.
  corpus.slice(0, 500).forEach((b) => plan({ profile: PROFILE, autoexec: b, config: CONFIG }));
  const split = time(() => corpus.forEach((b) => (lines += splitLines(decodeCp437(b)).lines.length)));
  const planned = time(() => corpus.forEach((b) => (changed += plan({ profile: PROFILE, autoexec: b, config: CONFIG }).changed ? 1 : 0)));
  console.log(`files: ${count} (${lines} lines, ${changed} changed)`);
  console.log(`plans/s: ${(count / planned.cpu).toFixed(0)} per CPU second (${(count / planned.wall).toFixed(0)} per wall-clock second)`);
  console.log(`split/s: ${(count / split.cpu).toFixed(0)} per CPU second (${(count / split.wall).toFixed(0)} per wall-clock second)`);
  console.log(`ratio plan/split: ${(planned.cpu / split.cpu).toFixed(1)} (CPU time of a plan over that of a split)`);
}

main();
