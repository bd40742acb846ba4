/**
 * Runs batch files in DOSBox (Debian `dosbox`, headless) on temporary C: folders, with stub programs that log
 * their name and command tail to C:\STUBLOG.TXT (see stubs/stub.asm, assembled with Debian `nasm`).
 * Many runs share one DOSBox start: each run mounts its own folder as C:, runs its commands and unmounts.
 * DOSBox differs from MS-DOS in places (REFERENCES.md §7): callers adapt their test copies as §7 says.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync, copyFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';

const STUB_SOURCE = join(__dirname, 'stubs', 'stub.asm');

/** Throws a clear message naming the Debian package when a tool is missing. */
export function requireTool(command: string, debianPackage: string): void {
  const found = spawnSync('sh', ['-c', `command -v ${command}`], { encoding: 'utf8' });
  if (found.status !== 0) {
    throw new Error(`${command} is not installed; install the Debian package "${debianPackage}" (apt-get install ${debianPackage}).`);
  }
}

/** One logged program start: the stub's built-in name and its command tail (trimmed). */
export type StubEntry = { program: string; args: string };

/** One run: a host folder mounted as C:, and the DOS commands to run there (e.g. CALL C:\AUTOEXEC.BAT). */
export type DosboxRun = { name: string; root: string; commands: string[] };

export type DosboxResult = { logs: Map<string, StubEntry[]>; timedOut: boolean; seconds: number };

const stubCache = new Map<string, string>();

/** Assembles (once per name) a stub .COM that logs `name`; with `pick` it also returns menu answers from C:\PICK.TXT. */
export function stubBinary(name: string, pick = false): string {
  const key = `${name}|${pick}`;
  const cached = stubCache.get(key);
  if (cached) return cached;
  requireTool('nasm', 'nasm');
  const dir = mkdtempSync(join(tmpdir(), 'bw-stub-'));
  const out = join(dir, 'STUB.COM');
  const args = ['-f', 'bin', `-DNAME="${name.replace(/"/g, '')}"`, ...(pick ? ['-DPICK'] : []), '-o', out, STUB_SOURCE];
  execFileSync('nasm', args);
  stubCache.set(key, out);
  return out;
}

/** Host path of a DOS path (C:\DOS\MODE.COM -> root/DOS/MODE.COM), upper-cased as DOS shows names. */
export function hostPath(root: string, dosPath: string): string {
  const rest = dosPath.replace(/^[A-Za-z]:/, '').replace(/^\\+/, '');
  return join(root, ...rest.split('\\').filter((p) => p !== '').map((p) => p.toUpperCase()));
}

/** Writes a file at a DOS path under `root`, creating folders. */
export function writeDosFile(root: string, dosPath: string, data: Uint8Array | string): void {
  const file = hostPath(root, dosPath);
  mkdirSync(dirname(file), { recursive: true });
  writeFileSync(file, data);
}

/** Puts a stub program at a DOS path (a .COM image works under any extension, DOSBox checks the header). */
export function placeStub(root: string, dosPath: string, name: string, pick = false): void {
  const file = hostPath(root, dosPath);
  mkdirSync(dirname(file), { recursive: true });
  copyFileSync(stubBinary(name, pick), file);
}

/** Reads C:\STUBLOG.TXT of a run folder. */
export function readStubLog(root: string): StubEntry[] {
  const file = join(root, 'STUBLOG.TXT');
  if (!existsSync(file)) return [];
  return readFileSync(file, 'latin1')
    .split('\r\n')
    .filter((l) => l !== '')
    .map((l) => {
      const bar = l.indexOf('|');
      return { program: l.slice(0, bar), args: l.slice(bar + 1).trim() };
    });
}

// The [autoexec] section holds only a few hundred lines (observed: 60 runs of 8 lines ran nothing), so the
// runs go into a driver batch file on drive D:, which mounts and unmounts C: for each run. The unmount is
// given from Z: (from D: it failed when PATH pointed at C:, and every later run then used the first folder).
function conf(driverDir: string): string {
  const lines = ['[dosbox]', 'memsize=4', '[mixer]', 'nosound=true', '[speaker]', 'pcspeaker=false', 'tandy=off',
    '[sblaster]', 'sbtype=none', '[gus]', 'gus=false', '[midi]', 'mpu401=none', '[joystick]', 'joysticktype=none',
    '[serial]', 'serial1=disabled', 'serial2=disabled', '[autoexec]', `mount d ${driverDir}`, 'd:', 'call d:\\driver.bat', 'exit'];
  return `${lines.join('\n')}\n`;
}

function driver(runs: DosboxRun[]): string {
  const lines: string[] = [];
  for (const run of runs) {
    if (/\s/.test(run.root)) throw new Error(`DOSBox folder must not contain blanks: ${run.root}`);
    lines.push(`mount c ${run.root}`, 'c:', 'cd \\', ...run.commands, 'z:', 'mount -u c');
  }
  return `${lines.join('\r\n')}\r\n`;
}

/** Runs every run in one DOSBox start, bounded by `timeoutMs`, and returns each run's stub log. */
export function runDosbox(runs: DosboxRun[], timeoutMs = 60_000): DosboxResult {
  requireTool('dosbox', 'dosbox');
  requireTool('timeout', 'coreutils');
  const dir = mkdtempSync(join(tmpdir(), 'bw-dosbox-'));
  const confFile = join(dir, 'run.conf');
  const driverDir = join(dir, 'd');
  mkdirSync(driverDir);
  writeFileSync(join(driverDir, 'DRIVER.BAT'), driver(runs));
  writeFileSync(confFile, conf(driverDir));
  const started = Date.now();
  const res = spawnSync('timeout', [String(Math.ceil(timeoutMs / 1000)), 'dosbox', '-conf', confFile, '-exit'], {
    env: { ...process.env, SDL_VIDEODRIVER: 'dummy', SDL_AUDIODRIVER: 'dummy', HOME: dir },
    encoding: 'utf8',
  });
  const logs = new Map<string, StubEntry[]>();
  for (const run of runs) logs.set(run.name, readStubLog(run.root));
  return { logs, timedOut: res.status === 124, seconds: (Date.now() - started) / 1000 };
}

/**
 * Convenience for one batch file: writes `files` (DOS path -> bytes) and stubs (DOS path -> logged name) to a
 * fresh C: folder, runs `batch` with CALL, and returns what the stub log says.
 */
export function runBatch(options: {
  files: Record<string, Uint8Array | string>;
  stubs: Record<string, string>;
  batch: string;
  before?: string[];
  timeoutMs?: number;
}): StubEntry[] {
  const root = mkdtempSync(join(tmpdir(), 'bw-c-'));
  for (const [path, data] of Object.entries(options.files)) writeDosFile(root, path, data);
  for (const [path, name] of Object.entries(options.stubs)) placeStub(root, path, name);
  const result = runDosbox([{ name: 'one', root, commands: [...(options.before ?? []), `CALL ${options.batch}`] }], options.timeoutMs ?? 20_000);
  if (result.timedOut) throw new Error(`DOSBox did not finish ${options.batch} in time`);
  return result.logs.get('one') ?? [];
}
