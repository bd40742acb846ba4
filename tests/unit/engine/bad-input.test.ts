/**
 * Bad input: binary files, empty files, a 5 MB file, 10,000-character lines, invalid profiles, ports that do
 * not exist, an unknown DOS version. Always a clear check or error, never a crash.
 */
import fc from 'fast-check';
import { plan, parseBatch, printModel } from '../../../generators/engine/index';
import type { Profile } from '../../../generators/engine/profile';

const PROFILE: Profile = {
  dos: '6.22', bootDrive: 'C', dosDir: 'C:\\DOS',
  ports: [
    { name: 'COM1', present: true, attached: 'adapter' },
    { name: 'LPT1', present: true, attached: 'none' },
  ],
  network: { port: 'COM1', baud: 9600, parity: 'N', dataBits: 8, stopBits: 1 },
  redirect: { from: 'LPT1', to: 'COM1' },
  loader: { path: 'C:\\THREAD\\TLRES.COM', args: '/S:104 /Q' },
  finalProgram: 'auto', loadHigh: 'auto',
};
const slugs = (r: ReturnType<typeof plan>) => r.checks.map((c) => c.slug);

test('a binary file is refused with not-text, and nothing changes', () => {
  const exe = Buffer.from([0x4d, 0x5a, 0x90, 0x00, 0x03, 0x00, 0x00, 0x00, 0x04, 0x00, 0xff, 0xff]);
  const r = plan({ profile: PROFILE, autoexec: exe, config: null });
  expect(r.ok).toBe(false);
  expect(slugs(r)).toEqual(['not-text']);
  expect(r.changed).toBe(false);
  expect(r.changes).toEqual([]);
  expect(Buffer.from(r.files.autoexec.after).equals(exe)).toBe(true);
});

test('a binary CONFIG.SYS is refused too', () => {
  const r = plan({ profile: PROFILE, autoexec: Buffer.from('WIN\r\n'), config: Buffer.from([0, 1, 2, 3, 0]) });
  expect(slugs(r)).toEqual(['not-text']);
  expect(r.checks[0].file).toBe('CONFIG.SYS');
});

test('an empty file gets our block, with a note', () => {
  const r = plan({ profile: PROFILE, autoexec: Buffer.alloc(0), config: null });
  expect(r.ok).toBe(true);
  expect(slugs(r)).toContain('empty-autoexec');
  expect(r.files.autoexec.afterText).toMatch(/^@REM --- Bootwright network block start/);
  // SHA-256 of zero bytes (FIPS 180-4 test vector).
  expect(r.sha256.input).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
});

test('a 5 MB file is refused quickly with file-too-large', () => {
  const big = Buffer.alloc(5 * 1024 * 1024, 'ECHO filler line\r\n');
  const start = Date.now();
  const r = plan({ profile: PROFILE, autoexec: big, config: null });
  expect(Date.now() - start).toBeLessThan(1000);
  expect(slugs(r)).toEqual(['file-too-large']);
  expect(r.changed).toBe(false);
});

test('the model still keeps a 5 MB file byte for byte', () => {
  const big = Buffer.alloc(5 * 1024 * 1024, 'PATH C:\\DOS\r\nECHO \xdb\xdb\n');
  expect(Buffer.from(printModel(parseBatch(big))).equals(big)).toBe(true);
});

test('lines of 10,000 characters: kept byte for byte, warned about, planned', () => {
  const long = `ECHO ${'x'.repeat(10_000)}`;
  const file = Buffer.from(`@ECHO OFF\r\n${long}\r\n${'y'.repeat(10_000)}\r\nWIN\r\n`, 'latin1');
  const r = plan({ profile: PROFILE, autoexec: file, config: null });
  expect(r.ok).toBe(true);
  expect(r.checks.filter((c) => c.slug === 'long-line').map((c) => c.line)).toEqual([2, 3]);
  expect(r.insertedAt).toBe(4);
  expect(Buffer.from(printModel(parseBatch(file))).equals(file)).toBe(true);
});

test('an invalid profile object gives a profile-invalid error naming the field, not an exception', () => {
  const r = plan({ profile: { ...PROFILE, network: { ...PROFILE.network, baud: 38400 } } as unknown as Profile, autoexec: null, config: null });
  expect(r.ok).toBe(false);
  expect(slugs(r)).toEqual(['profile-invalid']);
  expect(r.checks[0].message).toContain('network.baud');
});

test('ports that do not exist in DOS (COM5, LPT4) are error checks', () => {
  const r = plan({
    profile: { ...PROFILE, ports: [...PROFILE.ports, { name: 'COM5', present: true, attached: 'modem' }], redirect: { from: 'LPT4', to: 'COM1' } },
    autoexec: Buffer.from('WIN\r\n'),
    config: null,
  });
  // [M4S] MSBDATA.INC: DOS has COM1-COM4 and LPT1-LPT3 (REFERENCES 5.4, 1.5, 1.24).
  expect(r.checks.filter((c) => c.slug === 'port-not-dos').map((c) => c.message)).toEqual([
    expect.stringContaining('COM5'),
    expect.stringContaining('LPT4'),
  ]);
  expect(r.ok).toBe(false);
});

test('an unknown DOS version is an error and the plan uses the most cautious syntax', () => {
  const r = plan({ profile: { ...PROFILE, dos: '9.9' }, autoexec: Buffer.from('@ECHO OFF\r\nPATH C:\\DOS\r\nWIN\r\n'), config: null });
  expect(slugs(r)).toContain('dos-unknown');
  expect(r.ok).toBe(false);
  const block = r.changes.find((c) => c.kind === 'insert-block')!.lines;
  expect(block.some((l) => l.startsWith('@'))).toBe(false);
  expect(block[1]).toBe('MODE COM1 96,N,8,1');
});

test('plan never throws, whatever the profile and bytes', () => {
  fc.assert(
    fc.property(fc.anything(), fc.option(fc.uint8Array({ maxLength: 200 })), fc.option(fc.uint8Array({ maxLength: 100 })), (profile, a, c) => {
      const r = plan({ profile: profile as Profile, autoexec: a, config: c });
      expect(r.ok).toBe(false);
      expect(r.checks.length).toBeGreaterThan(0);
    }),
    { numRuns: 1000 },
  );
  fc.assert(
    fc.property(fc.uint8Array({ maxLength: 400 }), (bytes) => {
      expect(() => plan({ profile: PROFILE, autoexec: bytes, config: bytes })).not.toThrow();
    }),
    { numRuns: 1000 },
  );
});
