/**
 * Applies many unified diffs with GNU patch (Debian `patch`) in one shell run: each case gets a folder with
 * its original files, `patch -p1` runs there, and the patched files are read back.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { requireTool } from '../../../support/dosbox';

export type PatchCase = { files: Record<string, Uint8Array | null>; diff: Uint8Array };
export type PatchOutcome = { ok: boolean; output: string; files: Record<string, Buffer | null> };

export function applyWithGnuPatch(cases: PatchCase[]): PatchOutcome[] {
  requireTool('patch', 'patch');
  const root = mkdtempSync(join(tmpdir(), 'bw-patch-'));
  cases.forEach((c, i) => {
    const dir = join(root, String(i));
    mkdirSync(dir);
    for (const [name, data] of Object.entries(c.files)) if (data) writeFileSync(join(dir, name), data);
    writeFileSync(join(root, `${i}.diff`), c.diff);
  });
  const script = `cd "${root}" && for i in $(seq 0 ${cases.length - 1}); do
    ( cd "$i" && patch -p1 --forward --no-backup-if-mismatch < "../$i.diff" > ../$i.out 2>&1; echo $? > ../$i.rc )
  done`;
  const run = spawnSync('bash', ['-c', script], { encoding: 'utf8' });
  if (run.status !== 0) throw new Error(`patch batch failed: ${run.stderr}`);
  const outcomes = cases.map((c, i) => {
    const files: Record<string, Buffer | null> = {};
    for (const name of Object.keys(c.files)) {
      const f = join(root, String(i), name);
      files[name] = existsSync(f) ? readFileSync(f) : null;
    }
    const rc = readFileSync(join(root, `${i}.rc`), 'utf8').trim();
    return { ok: rc === '0', output: readFileSync(join(root, `${i}.out`), 'utf8'), files };
  });
  rmSync(root, { recursive: true, force: true });
  return outcomes;
}
