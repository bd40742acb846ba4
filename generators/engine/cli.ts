/**
 * npm run plan -- --profile PROFILE.json [--autoexec FILE] [--config FILE] --out DIR
 * Writes DIR/AUTOEXEC.BAT, DIR/CONFIG.SYS (when given or needed), DIR/changes.diff and DIR/plan.json.
 * Exit 0: no error check; 3: an error check; 2: unusable input (one line on stderr, nothing written).
 * Files are written to a temporary folder beside DIR first and renamed into place, so DIR never holds a
 * partial file.
 */
import { mkdtempSync, mkdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync, existsSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { encodeCp437 } from '../dos/cp437';
import { plan } from './plan';
import { parseProfile } from './profile';
import type { PlanResult } from './types';

class Unusable extends Error {}

/** Checks that mean the input cannot be planned at all. */
const UNUSABLE = new Set(['profile-invalid', 'not-text', 'file-too-large']);

type Args = { profile: string; autoexec: string | null; config: string | null; out: string };

function parseArgs(argv: string[]): Args {
  const found: Record<string, string> = {};
  for (let i = 0; i < argv.length; i++) {
    const flag = argv[i];
    if (!['--profile', '--autoexec', '--config', '--out'].includes(flag)) throw new Unusable(`unknown argument ${flag}`);
    const value = argv[i + 1];
    if (value === undefined || value.startsWith('--')) throw new Unusable(`${flag} needs a value`);
    found[flag.slice(2)] = value;
    i++;
  }
  if (!found.profile) throw new Unusable('--profile PROFILE.json is required');
  if (!found.out) throw new Unusable('--out DIR is required');
  return { profile: found.profile, autoexec: found.autoexec ?? null, config: found.config ?? null, out: found.out };
}

function readInput(path: string, what: string): Buffer {
  try {
    return readFileSync(path);
  } catch (e) {
    throw new Unusable(`cannot read ${what} ${path}: ${(e as NodeJS.ErrnoException).code ?? 'error'}`);
  }
}

function readProfile(path: string): unknown {
  const text = readInput(path, 'profile').toString('utf8');
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    throw new Unusable(`profile ${path} is not valid JSON: ${(e as Error).message}`);
  }
  const parsed = parseProfile(json);
  if (!parsed.ok) throw new Unusable(`profile ${path}: ${parsed.error}`);
  return parsed.profile;
}

function planJson(result: PlanResult): string {
  const out = {
    changed: result.changed,
    insertedAt: result.insertedAt,
    finalProgram: result.finalProgram,
    checks: result.checks.map((c) => ({ slug: c.slug, severity: c.severity, file: c.file, line: c.line, message: c.message })),
    boot: result.boot.after.map((s) => ({ line: s.line, program: s.program, args: s.args })),
    sha256: { input: result.sha256.input, output: result.sha256.output },
  };
  return `${JSON.stringify(out, null, 2)}\n`;
}

/** Writes every output to a temporary folder, then renames the files into `out`. */
function writeOutputs(out: string, result: PlanResult): void {
  const target = resolve(out);
  const parent = dirname(target);
  mkdirSync(parent, { recursive: true });
  const tmp = mkdtempSync(join(parent, '.bootwright-plan-'));
  try {
    const files: [string, Uint8Array | string][] = [
      ['AUTOEXEC.BAT', result.files.autoexec.after],
      ['changes.diff', encodeCp437(result.diff)],
      ['plan.json', planJson(result)],
    ];
    if (result.files.config) files.splice(1, 0, ['CONFIG.SYS', result.files.config.after]);
    for (const [name, data] of files) writeFileSync(join(tmp, name), data);
    if (!existsSync(target)) {
      renameSync(tmp, target);
      return;
    }
    if (!statSync(target).isDirectory()) throw new Unusable(`--out ${out} is not a folder`);
    for (const [name] of files) renameSync(join(tmp, name), join(target, name));
  } finally {
    rmSync(tmp, { recursive: true, force: true });
  }
}

export function main(argv: string[]): number {
  try {
    const args = parseArgs(argv);
    const profile = readProfile(args.profile);
    const autoexec = args.autoexec ? readInput(args.autoexec, 'AUTOEXEC.BAT') : null;
    const config = args.config ? readInput(args.config, 'CONFIG.SYS') : null;
    const result = plan({ profile: profile as never, autoexec, config });
    const unusable = result.checks.find((c) => UNUSABLE.has(c.slug));
    if (unusable) throw new Unusable(unusable.message);
    writeOutputs(args.out, result);
    return result.ok ? 0 : 3;
  } catch (e) {
    const message = e instanceof Unusable ? e.message : `cannot write the plan: ${(e as Error).message}`;
    process.stderr.write(`bootwright plan: ${message}\n`);
    return 2;
  }
}

if (require.main === module) process.exitCode = main(process.argv.slice(2));
