/**
 * CONFIG.SYS edits: the kit's lines between our marker lines from DOS 4.0 (REM is a CONFIG.SYS line there,
 * [M4S] SYSINIT2.ASM COMTAB, REFERENCES 3.2), plain lines before; older copies turned off or flagged.
 */
import { plan } from '../../../generators/engine/index';
import type { Profile } from '../../../generators/engine/profile';

const KIT = { name: 'Threadline', minDos: '3.30', residentKB: 38, configLines: ['DEVICE=C:\\THREAD\\TLPORT.SYS /P:1'] };
const BASE: Profile = {
  dos: '6.22', bootDrive: 'C', dosDir: 'C:\\DOS',
  ports: [{ name: 'COM1', present: true, attached: 'adapter' }, { name: 'LPT1', present: true, attached: 'none' }],
  network: { port: 'COM1', baud: 9600, parity: 'N', dataBits: 8, stopBits: 1 },
  redirect: { from: 'LPT1', to: 'COM1' },
  loader: { path: 'C:\\THREAD\\TLRES.COM', args: '/S:104 /Q' },
  finalProgram: 'auto', loadHigh: 'auto', kit: KIT,
};
const AUTO = Buffer.from('@ECHO OFF\r\nPATH C:\\DOS\r\nWIN\r\n');
const run = (config: string | null, over: Partial<Profile> = {}) =>
  plan({ profile: { ...BASE, ...over }, autoexec: AUTO, config: config === null ? null : Buffer.from(config, 'latin1') });
const slugs = (r: ReturnType<typeof plan>) => r.checks.map((c) => c.slug);

test('no CONFIG.SYS but the kit needs lines: one is created, with a note', () => {
  const r = run(null, { kit: { ...KIT, files: 30 } });
  expect(slugs(r)).toContain('no-config');
  expect(r.files.config!.before).toBeNull();
  expect(r.files.config!.afterText).toBe(
    'REM --- Bootwright CONFIG.SYS lines start (do not edit by hand) ---\r\nFILES=30\r\nDEVICE=C:\\THREAD\\TLPORT.SYS /P:1\r\nREM --- Bootwright CONFIG.SYS lines end ---\r\n',
  );
  expect(r.files.config!.diff).toMatch(/^--- a\/CONFIG\.SYS\n\+\+\+ b\/CONFIG\.SYS\n@@ -0,0 \+1,4 @@\n/);
});

test('no CONFIG.SYS and a kit that needs none: no CONFIG.SYS in the plan', () => {
  expect(run(null, { kit: { name: 'Threadline', minDos: '3.30', residentKB: 38 } }).files.config).toBeNull();
});

test('from 4.0 an identical older copy of the kit line is turned off and the line moves between our markers', () => {
  const r = run('FILES=30\r\nDEVICE=C:\\THREAD\\TLPORT.SYS /P:1\r\n');
  expect(slugs(r)).toContain('config-line-duplicate');
  expect(r.files.config!.afterText).toContain('REM Bootwright off: DEVICE=C:\\THREAD\\TLPORT.SYS /P:1\r\n');
});

test('before 4.0 an older copy is left alone: identical means nothing to add, different is a warning', () => {
  const same = run('DEVICE=C:\\THREAD\\TLPORT.SYS /P:1\r\n', { dos: '3.30' });
  expect(same.files.config!.changed).toBe(false);
  const other = run('DEVICE=C:\\THREAD\\TLPORT.SYS /P:2\r\n', { dos: '3.30' });
  expect(slugs(other)).toContain('config-line-differs');
  expect(other.files.config!.changed).toBe(false);
});

test("before 4.0 the kit's lines are plain lines added at the end (change kind add-line), values raised in place", () => {
  const r = run('FILES=20\r\n', { dos: '3.30', kit: { ...KIT, files: 30 } });
  expect(r.changes.filter((c) => c.file === 'CONFIG.SYS').map((c) => c.kind)).toEqual(['raise-value', 'add-line']);
  expect(r.files.config!.afterText).toBe('FILES=30\r\nDEVICE=C:\\THREAD\\TLPORT.SYS /P:1\r\n');
});

test('a broken pair of our CONFIG.SYS marker lines is an error and CONFIG.SYS is left alone', () => {
  const r = run('REM --- Bootwright CONFIG.SYS lines start (do not edit by hand) ---\r\nFILES=30\r\n');
  expect(slugs(r)).toContain('config-block-broken');
  expect(r.files.config!.changed).toBe(false);
  expect(r.ok).toBe(false);
});

test('changing the kit rewrites only our CONFIG.SYS lines', () => {
  const first = run('FILES=30\r\n[MENU]\r\nMENUITEM=A\r\n');
  const second = plan({ profile: { ...BASE, kit: { ...KIT, configLines: ['DEVICE=C:\\THREAD\\TLPORT.SYS /P:2'] } }, autoexec: first.files.autoexec.after, config: first.files.config!.after });
  expect(second.changes.map((c) => [c.file, c.kind])).toEqual([['CONFIG.SYS', 'replace-block']]);
  expect(second.files.config!.diff).toContain('-DEVICE=C:\\THREAD\\TLPORT.SYS /P:1\r\n+DEVICE=C:\\THREAD\\TLPORT.SYS /P:2\r\n');
});

test("a kit whose lowest DOS is not a version we know is a warning", () => {
  expect(slugs(run(null, { kit: { ...KIT, minDos: '9.1' } }))).toContain('kit-dos-unknown');
});
