/**
 * npm run bench:engine: plans a generated corpus of 10,000 AUTOEXEC.BAT files, and in the same run times only
 * decoding and splitting them into lines; prints plans per second, splits per second and the ratio.
 */
import { decodeCp437 } from '../dos/cp437';
import { generateCorpus } from './bench-corpus';
import { splitLines } from './lines';
import { plan } from './plan';
import type { Profile } from './profile';

const PROFILE: Profile = {
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
const CONFIG = Buffer.from('DEVICE=C:\\DOS\\HIMEM.SYS\r\nDOS=HIGH,UMB\r\nFILES=30\r\n[MENU]\r\nMENUITEM=NETWORK\r\nMENUITEM=PLAIN\r\n', 'latin1');

function time(run: () => void): number {
  const start = process.hrtime.bigint();
  run();
  return Number(process.hrtime.bigint() - start) / 1e9;
}

function main(): void {
  const count = Number(process.argv[2] ?? 10_000);
  const corpus = generateCorpus(count);
  let lines = 0;
  let changed = 0;
  // One warm-up pass each, so the timed passes measure the engine, not the JIT.
  corpus.slice(0, 500).forEach((b) => plan({ profile: PROFILE, autoexec: b, config: CONFIG }));
  const splitSeconds = time(() => corpus.forEach((b) => (lines += splitLines(decodeCp437(b)).lines.length)));
  const planSeconds = time(() => corpus.forEach((b) => (changed += plan({ profile: PROFILE, autoexec: b, config: CONFIG }).changed ? 1 : 0)));
  const plansPerSecond = count / planSeconds;
  const splitsPerSecond = count / splitSeconds;
  console.log(`files: ${count} (${lines} lines, ${changed} changed)`);
  console.log(`plans/s: ${plansPerSecond.toFixed(0)}`);
  console.log(`split/s: ${splitsPerSecond.toFixed(0)}`);
  console.log(`ratio plan/split: ${(planSeconds / splitSeconds).toFixed(1)} (a plan takes that many times as long as a split)`);
}

main();
