/**
 * The CLI: npm run plan -- --profile P --autoexec F [--config F] --out DIR. Exit 0 (no error check),
 * 3 (an error check), 2 (unusable input, one line on stderr, nothing written).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../../generators/engine/cli';

const ISSUE_PROFILE = {
  dos: '6.22', bootDrive: 'C', dosDir: 'C:\\DOS',
  ports: [
    { name: 'COM1', present: true, attached: 'adapter' },
    { name: 'COM2', present: true, attached: 'mouse' },
    { name: 'LPT1', present: true, attached: 'none' },
  ],
  network: { port: 'COM1', baud: 9600, parity: 'N', dataBits: 8, stopBits: 1 },
  redirect: { from: 'LPT1', to: 'COM1' },
  loader: { path: 'C:\\NETKIT\\NETRES.COM', args: '/N:104' },
  finalProgram: 'auto', loadHigh: 'auto',
};

function work(): string {
  return mkdtempSync(join(tmpdir(), 'bw-cli-'));
}

function run(args: string[]): { code: number; stderr: string } {
  const spy = jest.spyOn(process.stderr, 'write').mockImplementation(() => true);
  try {
    const code = main(args);
    const stderr = spy.mock.calls.map((c) => String(c[0])).join('');
    return { code, stderr };
  } finally {
    spy.mockRestore();
  }
}

test('the issue\'s profile form works as written: exit 0 and the four outputs', () => {
  const dir = work();
  writeFileSync(join(dir, 'p.json'), JSON.stringify(ISSUE_PROFILE));
  writeFileSync(join(dir, 'A.BAT'), '@ECHO OFF\r\nPATH C:\\DOS\r\nC:\\MOUSE\\MOUSE.COM\r\nWIN\r\n');
  const out = join(dir, 'out');
  expect(run(['--profile', join(dir, 'p.json'), '--autoexec', join(dir, 'A.BAT'), '--out', out])).toEqual({ code: 0, stderr: '' });
  expect(readdirSync(out).sort()).toEqual(['AUTOEXEC.BAT', 'changes.diff', 'plan.json']);
  const planJson = JSON.parse(readFileSync(join(out, 'plan.json'), 'utf8'));
  expect(planJson).toMatchObject({ changed: true, insertedAt: 4 });
  expect(Object.keys(planJson.sha256)).toEqual(['input', 'output']);
  expect(planJson.boot.map((s: { program: string }) => s.program)).toEqual(['C:\\MOUSE\\MOUSE.COM', 'MODE', 'MODE', 'C:\\NETKIT\\NETRES.COM', 'WIN']);
  expect(readFileSync(join(out, 'changes.diff'), 'latin1')).toContain('+@C:\\NETKIT\\NETRES.COM /N:104\r\n');
  // The diff applies with GNU patch to the original and gives the written file.
  execFileSync('bash', ['-c', `mkdir "${dir}/t" && cp "${dir}/A.BAT" "${dir}/t/AUTOEXEC.BAT" && cd "${dir}/t" && patch -s -p1 < "${out}/changes.diff"`]);
  expect(readFileSync(join(dir, 't', 'AUTOEXEC.BAT')).equals(readFileSync(join(out, 'AUTOEXEC.BAT')))).toBe(true);
});

test('--autoexec may be omitted: a new file is written; CONFIG.SYS is written when given', () => {
  const dir = work();
  writeFileSync(join(dir, 'p.json'), JSON.stringify(ISSUE_PROFILE));
  writeFileSync(join(dir, 'C.SYS'), 'DOS=HIGH,UMB\r\n');
  const out = join(dir, 'out');
  expect(run(['--profile', join(dir, 'p.json'), '--config', join(dir, 'C.SYS'), '--out', out]).code).toBe(0);
  expect(readdirSync(out).sort()).toEqual(['AUTOEXEC.BAT', 'CONFIG.SYS', 'changes.diff', 'plan.json']);
  expect(readFileSync(join(out, 'AUTOEXEC.BAT'), 'latin1')).toContain('@LH C:\\NETKIT\\NETRES.COM /N:104\r\n');
});

test('an error check gives exit 3, and the files are still written whole', () => {
  const dir = work();
  writeFileSync(join(dir, 'p.json'), JSON.stringify({ ...ISSUE_PROFILE, network: { ...ISSUE_PROFILE.network, port: 'COM2' }, redirect: { from: 'LPT1', to: 'COM2' } }));
  writeFileSync(join(dir, 'A.BAT'), 'WIN\r\n');
  const out = join(dir, 'out');
  expect(run(['--profile', join(dir, 'p.json'), '--autoexec', join(dir, 'A.BAT'), '--out', out]).code).toBe(3);
  const planJson = JSON.parse(readFileSync(join(out, 'plan.json'), 'utf8'));
  expect(planJson.checks.map((c: { slug: string }) => c.slug)).toContain('port-taken');
});

test.each([
  ['invalid profile JSON', (d: string) => writeFileSync(join(d, 'p.json'), '{ "dos": "6.22", '), /not valid JSON/],
  ['a profile that fails the schema', (d: string) => writeFileSync(join(d, 'p.json'), JSON.stringify({ ...ISSUE_PROFILE, ports: 'COM1' })), /ports/],
  ['a missing AUTOEXEC.BAT file', (d: string) => writeFileSync(join(d, 'p.json'), JSON.stringify(ISSUE_PROFILE)), /cannot read AUTOEXEC\.BAT/],
  ['a binary AUTOEXEC.BAT', (d: string) => {
    writeFileSync(join(d, 'p.json'), JSON.stringify(ISSUE_PROFILE));
    writeFileSync(join(d, 'A.BAT'), Buffer.from([0x4d, 0x5a, 0, 0, 1, 2]));
  }, /NUL bytes/],
  ['a 5 MB AUTOEXEC.BAT', (d: string) => {
    writeFileSync(join(d, 'p.json'), JSON.stringify(ISSUE_PROFILE));
    writeFileSync(join(d, 'A.BAT'), Buffer.alloc(5 * 1024 * 1024, 'REM x\r\n'));
  }, /over 256 KB/],
])('unusable input (%s): exit 2, one line on stderr, nothing written', (_what, prepare, reason) => {
  const dir = work();
  prepare(dir);
  const out = join(dir, 'out');
  const { code, stderr } = run(['--profile', join(dir, 'p.json'), '--autoexec', join(dir, 'A.BAT'), '--out', out]);
  expect(code).toBe(2);
  expect(stderr).toMatch(reason);
  expect(stderr.trim().split('\n')).toHaveLength(1);
  expect(existsSync(out)).toBe(false);
  expect(readdirSync(dir).filter((f) => f.startsWith('.bootwright'))).toEqual([]);
});

test('when --out is a file, nothing is written and no temporary folder is left', () => {
  const dir = work();
  writeFileSync(join(dir, 'p.json'), JSON.stringify(ISSUE_PROFILE));
  writeFileSync(join(dir, 'out'), 'not a folder');
  const { code } = run(['--profile', join(dir, 'p.json'), '--out', join(dir, 'out')]);
  expect(code).toBe(2);
  expect(readFileSync(join(dir, 'out'), 'utf8')).toBe('not a folder');
  expect(readdirSync(dir).sort()).toEqual(['out', 'p.json']);
});

test('npm run plan runs the same code path (exit code through the script)', () => {
  const dir = work();
  writeFileSync(join(dir, 'p.json'), '{ nope');
  const res = spawnSync('npm', ['run', '-s', 'plan', '--', '--profile', join(dir, 'p.json'), '--out', join(dir, 'o')], { encoding: 'utf8', cwd: join(__dirname, '..', '..', '..') });
  expect(res.status).toBe(2);
  expect(res.stderr).toMatch(/^bootwright plan: profile .* is not valid JSON/m);
});
