/**
 * Headless DOSBox (Debian `dosbox` 0.74, REFERENCES §7) for the bundle tests: one start runs many cases;
 * each case mounts its own host folder as C: holding a PC's startup files, extracted bundles are D: (and
 * F:), logs go to E:. Steps run as `COMMAND /C ... > E:\x.LOG` (DOSBox 0.74 drops the output of a
 * redirected CALL, seen here). Every start is bounded by `timeout`.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';

/** Throws naming the Debian package when a tool is missing. */
export function requireProgram(command: string, debianPackage: string): void {
  const found = spawnSync('sh', ['-c', `command -v ${command}`], { encoding: 'utf8' });
  if (found.status !== 0) throw new Error(`${command} is not installed: apt-get install ${debianPackage}`);
}

/** Runs DOSBox once with `lines` as its [autoexec], sound and devices off, bounded by `timeoutMs`. */
export function runDosboxLines(lines: string[], timeoutMs: number): { timedOut: boolean; seconds: number } {
  requireProgram('dosbox', 'dosbox');
  const dir = mkdtempSync(join(tmpdir(), 'bw-bundle-dbx-'));
  const conf = [
    '[dosbox]', 'memsize=4', '[cpu]', 'cycles=max', '[mixer]', 'nosound=true', '[speaker]', 'pcspeaker=false',
    'tandy=off', '[sblaster]', 'sbtype=none', '[gus]', 'gus=false', '[midi]', 'mpu401=none', '[joystick]',
    'joysticktype=none', '[serial]', 'serial1=disabled', 'serial2=disabled', '[autoexec]', ...lines, 'exit',
  ];
  writeFileSync(join(dir, 'run.conf'), `${conf.join('\n')}\n`);
  const started = Date.now();
  const res = spawnSync('timeout', [String(Math.ceil(timeoutMs / 1000)), 'dosbox', '-conf', join(dir, 'run.conf'), '-exit'], {
    env: { ...process.env, SDL_VIDEODRIVER: 'dummy', SDL_AUDIODRIVER: 'dummy', HOME: dir },
    encoding: 'utf8',
  });
  return { timedOut: res.status === 124, seconds: (Date.now() - started) / 1000 };
}

export type BundleCase = {
  id: string;
  /** Host files of the case's C: drive, by name in the root (null: the file is absent). */
  drive: Record<string, Uint8Array | null>;
  /** Extra host folders to create on C: before the run (e.g. 'BWSAVE/001'). */
  folders?: string[];
  /**
   * DOS command lines, each logged to E:. A plain step runs from the case's bundle folder; '~step' runs
   * from wherever the previous step left the shell (C:\ at the start); '!line' is a raw line, not logged.
   */
  steps: string[];
  folder: string;
};

export type BundleRunResult = {
  timedOut: boolean;
  seconds: number;
  /** Host folder of each case's C: drive. */
  roots: Map<string, string>;
  /** Text of each step's log: `${id}:${stepIndex}`. */
  logs: Map<string, string>;
};

/** Every file under `root` as 'REL/PATH' -> bytes, for comparing drive states. */
export function driveFiles(root: string): Map<string, Buffer> {
  const out = new Map<string, Buffer>();
  const walk = (dir: string) => {
    for (const name of readdirSync(dir).sort()) {
      const full = join(dir, name);
      if (statSync(full).isDirectory()) walk(full);
      else out.set(relative(root, full).split('\\').join('/'), readFileSync(full));
    }
  };
  walk(root);
  return out;
}

/** Runs all cases in one DOSBox start. `bundleDirs` maps a drive letter (D, F, ...) to an extracted bundle. */
export function runBundleCases(base: string, bundleDirs: Record<string, string>, cases: BundleCase[], bundleDrive = 'D'): BundleRunResult {
  for (const dir of [base, ...Object.values(bundleDirs)]) if (/\s/.test(dir)) throw new Error(`DOSBox cannot mount ${dir}: blank in path`);
  const logDir = join(base, 'logs');
  mkdirSync(logDir, { recursive: true });
  const roots = new Map<string, string>();
  const lines = [...Object.entries(bundleDirs).map(([letter, dir]) => `mount ${letter.toLowerCase()} ${dir}`), `mount e ${logDir}`];
  for (const c of cases) {
    const root = join(base, `c-${c.id}`);
    mkdirSync(root, { recursive: true });
    for (const folder of c.folders ?? []) mkdirSync(join(root, folder), { recursive: true });
    for (const [name, bytes] of Object.entries(c.drive)) if (bytes) writeFileSync(join(root, name), bytes);
    roots.set(c.id, root);
    lines.push(`mount c ${root}`, 'c:', 'cd \\');
    c.steps.forEach((step, i) => {
      const log = `E:\\${c.id}S${i}.LOG`;
      if (step.startsWith('!')) lines.push(step.slice(1));
      else if (step.startsWith('~')) lines.push(`command /c ${step.slice(1)} > ${log}`);
      else lines.push(`${bundleDrive}:`, `cd \\${c.folder}`, `command /c ${step} > ${log}`);
    });
    lines.push('z:', 'mount -u c');
  }
  const result = runDosboxLines(lines, 60_000);
  const logs = new Map<string, string>();
  for (const c of cases) {
    c.steps.forEach((_, i) => {
      const file = join(logDir, `${c.id}S${i}.LOG`);
      logs.set(`${c.id}:${i}`, existsSync(file) ? readFileSync(file, 'latin1') : '');
    });
  }
  return { timedOut: result.timedOut, seconds: result.seconds, roots, logs };
}
