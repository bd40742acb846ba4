/**
 * The profile schema (zod 4) and the checks that need only the profile (shown live by the wizard).
 */
import { readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { checkProfile, parseProfile, profileSchema, type Profile } from '../../../generators/engine/index';

const ISSUE_FORM = {
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
const P = profileSchema.parse(ISSUE_FORM);
const slugs = (over: Partial<Profile>) => checkProfile({ ...P, ...over }).map((c) => c.slug);
const port = (name: string, attached: Profile['ports'][number]['attached'], present = true) => ({ name, present, attached });

test('the profile form from issue 3 validates as written, with no checks', () => {
  expect(parseProfile(ISSUE_FORM).ok).toBe(true);
  expect(checkProfile(P)).toEqual([]);
});

test('optional kit and memory fields, lower-case port names and parity are accepted', () => {
  const r = profileSchema.parse({ ...ISSUE_FORM, bootDrive: 'c:', ports: [port('com1', 'adapter')], network: { ...ISSUE_FORM.network, parity: 'n' }, kit: { name: 'Threadline', minDos: '3.30', residentKB: 38, files: 30 }, memory: { freeKB: 580 } });
  expect(r.bootDrive).toBe('C');
  expect(r.ports[0].name).toBe('COM1');
  expect(r.network.parity).toBe('N');
});

test.each([
  [{ network: { ...ISSUE_FORM.network, baud: 38400 } }, 'network.baud'],
  [{ network: { ...ISSUE_FORM.network, port: 'LPT1' } }, 'network.port'],
  [{ ports: [{ name: 'COM1', present: 'yes', attached: 'adapter' }] }, 'ports.0.present'],
  [{ ports: [{ name: 'COM1', present: true, attached: 'scanner' }] }, 'ports.0.attached'],
  [{ finalProgram: 0 }, 'finalProgram'],
  [{ loadHigh: 'always' }, 'loadHigh'],
])('an invalid profile names the field (%o)', (over, field) => {
  const r = parseProfile({ ...ISSUE_FORM, ...over });
  expect(r.ok).toBe(false);
  if (!r.ok) expect(r.error.startsWith(`${field}:`)).toBe(true);
});

test('DOS version: unknown is an error; below the kit minimum is an error, at it is fine', () => {
  expect(slugs({ dos: '6.23' })).toEqual(['dos-unknown']);
  expect(slugs({ dos: 'six' })).toEqual(['dos-unknown']);
  const kit = { name: 'Threadline', minDos: '3.30', residentKB: 38 };
  expect(slugs({ dos: '3.21', kit })).toEqual(['dos-below-kit']);
  expect(slugs({ dos: '3.3', kit })).toEqual([]);
});

test('ports: missing, absent, listed twice, not a DOS port', () => {
  expect(slugs({ ports: [port('LPT1', 'none')] })).toEqual(['port-missing', 'port-missing']);
  expect(slugs({ ports: [port('COM1', 'adapter', false), port('LPT1', 'none')] })).toEqual(['port-absent', 'port-absent']);
  expect(slugs({ ports: [port('COM1', 'adapter'), port('COM1', 'none'), port('LPT1', 'none')] })).toEqual(['port-listed-twice']);
  expect(slugs({ ports: [...P.ports, port('COM7', 'none')] })).toEqual(['port-not-dos']);
});

test('the network port taken by a mouse or modem, or given to another device', () => {
  expect(slugs({ ports: [port('COM1', 'mouse'), port('LPT1', 'none')] })).toEqual(['port-taken']);
  expect(slugs({ ports: [port('COM1', 'modem'), port('LPT1', 'none')] })).toEqual(['port-taken']);
  expect(slugs({ ports: [port('COM1', 'printer'), port('LPT1', 'none')] })).toEqual(['port-given-to-other']);
  expect(slugs({ ports: [port('COM1', 'none'), port('LPT1', 'none')] })).toEqual(['port-no-adapter']);
  expect(slugs({ ports: [port('COM1', 'adapter'), port('COM2', 'adapter'), port('LPT1', 'none')] })).toEqual(['adapter-elsewhere']);
});

test('[KB-IRQ] COM1/COM3 share IRQ4 and COM2/COM4 share IRQ3 (REFERENCES 4.1, 4.2)', () => {
  expect(slugs({ ports: [port('COM1', 'adapter'), port('COM3', 'modem'), port('LPT1', 'none')] })).toEqual(['irq-shared']);
  expect(slugs({ ports: [port('COM1', 'adapter'), port('COM3', 'none'), port('LPT1', 'none')] })).toEqual([]);
  const com2 = { network: { ...P.network, port: 'COM2' }, redirect: { from: 'LPT1', to: 'COM2' } };
  expect(slugs({ ...com2, ports: [port('COM2', 'adapter'), port('COM4', 'mouse'), port('LPT1', 'none')] })).toEqual(['irq-shared']);
  expect(slugs({ ...com2, ports: [port('COM2', 'adapter'), port('COM3', 'mouse'), port('LPT1', 'none')] })).toEqual([]);
});

test('redirection: a local printer on the redirected port, a target that is not the network port', () => {
  expect(slugs({ ports: [port('COM1', 'adapter'), port('LPT1', 'printer')] })).toEqual(['printer-on-redirected-lpt']);
  expect(slugs({ ports: [...P.ports, port('COM3', 'none')], redirect: { from: 'LPT1', to: 'COM3' } })).toEqual(['redirect-not-network']);
});

test('[M4] MODEPARS.ASM: mark/space parity, 5-6 data bits, 1.5 stop bits are PS/2-only in 4.0 (REFERENCES 1.10)', () => {
  expect(slugs({ network: { ...P.network, parity: 'M' } })).toEqual(['serial-setting-limited']);
  expect(slugs({ network: { ...P.network, stopBits: 1.5 } })).toEqual(['serial-setting-limited']);
  expect(slugs({ network: { ...P.network, dataBits: 7, parity: 'E' } })).toEqual([]);
});

test('[M4D] FCB.ASM, MSCONST.ASM: loader and DOS folder names must be 8.3 and no device (REFERENCES 5.2-5.4)', () => {
  expect(slugs({ loader: { path: 'C:\\THREADLINE\\TLRES.COM', args: '' } })).toEqual(['name-not-83']);
  expect(slugs({ loader: { path: 'C:\\NUL\\TLRES.COM', args: '' } })).toEqual(['name-reserved']);
  expect(slugs({ loader: { path: 'TLRES.COM', args: '' } })).toEqual(['loader-path-relative']);
  expect(slugs({ loader: { path: 'C:\\THREAD\\TLRES.DRV', args: '' } })).toEqual(['loader-extension']);
});

test('memory left for the main program: a warning below what it needs, a note otherwise', () => {
  const kit = { name: 'Threadline', minDos: '3.30', residentKB: 38 };
  expect(slugs({ kit, memory: { freeKB: 580, mainProgramKB: 545 } })).toEqual(['memory-low']);
  // 580 - 38 - 0.5 (MODE's resident part, an estimate: REFERENCES 1.22) = 541.5 >= 540
  expect(slugs({ kit, memory: { freeKB: 580, mainProgramKB: 540 } })).toEqual(['memory-left']);
  expect(slugs({ kit })).toEqual([]);
});

test('profile.ts and profile-checks.ts import no Node built-ins and no iconv-lite (the browser loads them)', () => {
  const seen = new Set<string>();
  const visit = (file: string) => {
    if (seen.has(file)) return;
    seen.add(file);
    const source = readFileSync(file, 'utf8');
    for (const m of source.matchAll(/from '([^']+)'/g)) {
      const spec = m[1];
      expect(spec).not.toMatch(/^(node:|fs$|path$|crypto$|iconv-lite$|buffer$)/);
      if (spec.startsWith('.')) visit(resolve(dirname(file), `${spec}.ts`));
    }
  };
  const engine = join(__dirname, '..', '..', '..', 'generators', 'engine');
  visit(join(engine, 'profile.ts'));
  visit(join(engine, 'profile-checks.ts'));
  expect(seen.size).toBeGreaterThanOrEqual(4);
});

test('paths and options we write must be printable ASCII, so they encode to code page 437 unchanged', () => {
  const r = parseProfile({ ...ISSUE_FORM, loader: { path: 'C:\\NETKIT\\NETRES.COM', args: '/N:\u20ac' } });
  expect(r.ok).toBe(false);
  if (!r.ok) expect(r.error).toBe('loader.args: printable ASCII characters only');
});
