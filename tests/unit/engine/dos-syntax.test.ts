/**
 * What the engine writes for each DOS version, checked against the published facts in REFERENCES.md; the
 * source key is named beside each check.
 */
import { plan } from '../../../generators/engine/index';
import type { Profile } from '../../../generators/engine/profile';

const BASE: Profile = {
  dos: '6.22', bootDrive: 'C', dosDir: 'C:\\DOS',
  ports: [
    { name: 'COM1', present: true, attached: 'adapter' },
    { name: 'COM2', present: true, attached: 'none' },
    { name: 'COM3', present: true, attached: 'none' },
    { name: 'LPT1', present: true, attached: 'none' },
  ],
  network: { port: 'COM1', baud: 9600, parity: 'N', dataBits: 8, stopBits: 1 },
  redirect: { from: 'LPT1', to: 'COM1' },
  loader: { path: 'C:\\THREAD\\TLRES.COM', args: '/S:104 /Q' },
  finalProgram: 'auto', loadHigh: 'auto',
};
const FILE = Buffer.from('@ECHO OFF\r\nPATH C:\\DOS;C:\\WINDOWS\r\nWIN\r\n');
const UMB = Buffer.from('DEVICE=C:\\DOS\\HIMEM.SYS\r\nDOS=HIGH,UMB\r\n');

function block(over: Partial<Profile>, autoexec: Buffer | null = FILE, config: Buffer | null = null): string[] {
  const r = plan({ profile: { ...BASE, ...over }, autoexec, config });
  return r.changes.find((c) => c.kind === 'insert-block')!.lines;
}
const slugs = (over: Partial<Profile>, config: Buffer | null = null) =>
  plan({ profile: { ...BASE, ...over }, autoexec: FILE, config }).checks.map((c) => c.slug);

describe('serial setup', () => {
  test('[M4] MODEPARS.ASM (keywords new in 4.0) and [HELPSB]: keyword form from 4.0, positional before (REFERENCES 1.1, 1.2)', () => {
    expect(block({ dos: '3.30' })[1]).toBe('@MODE COM1 96,N,8,1');
    expect(block({ dos: '4.00' })[1]).toBe('@MODE COM1 BAUD=9600 PARITY=N DATA=8 STOP=1');
    expect(block({ dos: '6.22' })[1]).toBe('@MODE COM1 BAUD=9600 PARITY=N DATA=8 STOP=1');
  });

  test('[HELP622] vs [M4] MODECOM.ASM disagree on omitted fields (REFERENCES 1.13), so every field is written', () => {
    for (const dos of ['2.11', '3.30', '4.01', '5.0', '6.22', '7.10']) {
      const line = block({ dos, network: { port: 'COM2', baud: 2400, parity: 'E', dataBits: 7, stopBits: 2 } })[1];
      expect(line).toMatch(/(BAUD=2400 PARITY=E DATA=7 STOP=2|24,E,7,2)$/);
    }
  });

  test('[PC11] [M4] [HELP622]: the two-digit baud abbreviations in the positional form (REFERENCES 1.4, 1.8, 1.9)', () => {
    const rates: [number, string][] = [[110, '11'], [300, '30'], [1200, '12'], [2400, '24'], [4800, '48'], [9600, '96'], [19200, '19']];
    for (const [baud, short] of rates) {
      expect(block({ dos: '3.30', network: { ...BASE.network, baud } })[1]).toBe(`@MODE COM1 ${short},N,8,1`);
    }
  });

  test('[PC11] no 19200 in PC-DOS 1.1 MODE, [M4] PS/2 only in 4.0 (REFERENCES 1.4, 1.10): 19200 is flagged', () => {
    const low = plan({ profile: { ...BASE, dos: '3.30', network: { ...BASE.network, baud: 19200 } }, autoexec: FILE, config: null });
    expect(low.checks.find((c) => c.slug === 'baud-19200')?.severity).toBe('warning');
    const high = plan({ profile: { ...BASE, dos: '6.22', network: { ...BASE.network, baud: 19200 } }, autoexec: FILE, config: null });
    expect(high.checks.find((c) => c.slug === 'baud-19200')?.severity).toBe('note');
    expect(slugs({ network: { ...BASE.network, baud: 9600 } })).not.toContain('baud-19200');
  });
});

describe('printer redirection', () => {
  test('[HELP622] MODE (Redirect Printing): MODE LPTn:=COMm:, after the serial setup (REFERENCES 1.23, 1.26)', () => {
    const lines = block({});
    expect(lines[2]).toBe('@MODE LPT1:=COM1:');
    expect(lines.findIndex((l) => / COM1 BAUD=/.test(l))).toBeLessThan(lines.findIndex((l) => /LPT1:=COM1:/.test(l)));
    expect(lines.findIndex((l) => /LPT1:=COM1:/.test(l))).toBeLessThan(lines.findIndex((l) => /TLRES/.test(l)));
  });

  test('no redirection line when the profile asks for none', () => {
    expect(block({ redirect: null }).some((l) => l.includes('LPT'))).toBe(false);
  });
});

describe('version features', () => {
  test('[KB40594]: COM3 and COM4 only from DOS 3.3 (REFERENCES 1.5, 1.6)', () => {
    const com3 = { network: { ...BASE.network, port: 'COM3' }, redirect: { from: 'LPT1', to: 'COM3' }, ports: BASE.ports.map((p) => (p.name === 'COM3' ? { ...p, attached: 'adapter' as const } : p.name === 'COM1' ? { ...p, attached: 'none' as const } : p)) };
    expect(slugs({ ...com3, dos: '3.20' })).toContain('com34-before-33');
    expect(slugs({ ...com3, dos: '3.30' })).not.toContain('com34-before-33');
  });

  test('[M4C] TBATCH.ASM No_Echo_Char, [3COM]: @ only from 3.3 (REFERENCES 2.1)', () => {
    expect(block({ dos: '3.20' }).every((l) => !l.startsWith('@'))).toBe(true);
    expect(block({ dos: '3.30' }).every((l) => l.startsWith('@'))).toBe(true);
  });

  test('[ENC] Appendix A, [M4C] TDATA.ASM: CALL only from 3.3, so a batch-file loader before 3.3 is an error (REFERENCES 2.2, 2.3)', () => {
    const loader = { path: 'C:\\THREAD\\TLSTART.BAT', args: '' };
    expect(block({ dos: '3.30', loader })[3]).toBe('@CALL C:\\THREAD\\TLSTART.BAT');
    expect(slugs({ dos: '3.20', loader })).toContain('loader-batch-needs-call');
    expect(slugs({ dos: '3.30', loader })).not.toContain('loader-batch-needs-call');
  });

  test('[HELP622] loadhigh, Dos: LH only from 5.0 and only with DOS=UMB in CONFIG.SYS (REFERENCES 2.24, 3.10)', () => {
    const loaderLine = (dos: string, config: Buffer | null, loadHigh: 'auto' | 'never' = 'auto') =>
      block({ dos, loadHigh }, FILE, config)[3];
    expect(loaderLine('4.01', UMB)).toBe('@C:\\THREAD\\TLRES.COM /S:104 /Q');
    expect(loaderLine('5.0', UMB)).toBe('@LH C:\\THREAD\\TLRES.COM /S:104 /Q');
    expect(loaderLine('5.0', Buffer.from('DOS=HIGH\r\n'))).toBe('@C:\\THREAD\\TLRES.COM /S:104 /Q');
    expect(loaderLine('6.22', Buffer.from('dos = high, umb\r\n'))).toBe('@LH C:\\THREAD\\TLRES.COM /S:104 /Q');
    expect(loaderLine('6.22', Buffer.from('DOS=HIGH,NOUMB\r\n'))).toBe('@C:\\THREAD\\TLRES.COM /S:104 /Q');
    expect(loaderLine('6.22', UMB, 'never')).toBe('@C:\\THREAD\\TLRES.COM /S:104 /Q');
    expect(slugs({ dos: '6.22' }, Buffer.from('DOS=HIGH\r\n'))).toContain('loadhigh-unavailable');
  });

  test('[M4S] SYSINIT2.ASM COMTAB: REM is a CONFIG.SYS line in 4.0 but not before, so no marker lines before 4.0 (REFERENCES 3.2)', () => {
    const kit = { name: 'Threadline', minDos: '3.30', residentKB: 38, configLines: ['DEVICE=C:\\THREAD\\TLPORT.SYS /P:1'] };
    const conf = (dos: string) => plan({ profile: { ...BASE, dos, kit }, autoexec: FILE, config: Buffer.from('FILES=30\r\n') }).files.config!.afterText;
    expect(conf('3.30')).toBe('FILES=30\r\nDEVICE=C:\\THREAD\\TLPORT.SYS /P:1\r\n');
    expect(conf('4.01')).toMatch(/^FILES=30\r\nREM --- Bootwright CONFIG\.SYS lines start .*\r\nDEVICE=C:\\THREAD\\TLPORT\.SYS \/P:1\r\nREM --- Bootwright CONFIG\.SYS lines end ---\r\n$/);
  });

  test('[M4S] SYSCONF.ASM, [HELP622] Files/Buffers: FILES and BUFFERS below the kit minimum are raised in place (REFERENCES 3.3, 3.4)', () => {
    const kit = { name: 'Threadline', minDos: '3.30', residentKB: 38, files: 30, buffers: 20 };
    const r = plan({ profile: { ...BASE, kit }, autoexec: FILE, config: Buffer.from('files=20\r\nBUFFERS = 10,4\r\n') });
    expect(r.files.config!.afterText).toBe('files=30\r\nBUFFERS = 20,4\r\n');
    expect(r.changes.filter((c) => c.kind === 'raise-value')).toHaveLength(2);
  });
});

describe('limits and paths', () => {
  test('[M4C] COMEQU.ASM COMBUFLEN: a written line of 127 characters passes, 128 is an error (REFERENCES 2.10)', () => {
    const fixed = '@C:\\THREAD\\TLRES.COM '.length;
    const at = (n: number) => plan({ profile: { ...BASE, loader: { path: 'C:\\THREAD\\TLRES.COM', args: `/X:${'a'.repeat(n - fixed - 3)}` } }, autoexec: FILE, config: null });
    expect(at(127).changes.find((c) => c.kind === 'insert-block')!.lines[3]).toHaveLength(127);
    expect(at(127).checks.map((c) => c.slug)).not.toContain('line-too-long');
    expect(at(128).checks.map((c) => c.slug)).toContain('line-too-long');
  });

  test('[HELP622] PATH: when PATH does not hold the DOS folder at the block, MODE gets its full path (REFERENCES 2.12)', () => {
    expect(block({}, Buffer.from('@ECHO OFF\r\nPATH C:\\WINDOWS\r\nWIN\r\n'))[1]).toBe('@C:\\DOS\\MODE COM1 BAUD=9600 PARITY=N DATA=8 STOP=1');
    expect(block({}, Buffer.from('@ECHO OFF\r\nPATH C:\\WINDOWS;\\DOS\\\r\nWIN\r\n'))[1]).toBe('@MODE COM1 BAUD=9600 PARITY=N DATA=8 STOP=1');
    // A PATH under IF may not run, so it does not count.
    expect(block({}, Buffer.from('@ECHO OFF\r\nIF EXIST C:\\X PATH C:\\DOS\r\nWIN\r\n'))[1]).toMatch(/^@C:\\DOS\\MODE /);
  });

  test('[M4C] TBATCH2.ASM GOTO: labels compare in their first 8 characters (REFERENCES 2.8)', () => {
    const file = Buffer.from('@ECHO OFF\r\nPATH C:\\DOS\r\n:LONGLABEL1\r\nCHOICE /C:YN\r\nIF ERRORLEVEL 2 GOTO LONGLABEL2\r\nWIN\r\n');
    const r = plan({ profile: BASE, autoexec: file, config: null });
    // GOTO LONGLABEL2 finds :LONGLABEL1 and loops back, so every path leaves the loop towards WIN and the
    // block goes just before WIN (line 6). Were the whole label compared, the GOTO would end the batch file
    // ("Label not found") and the block would have to go before the IF (line 5).
    expect(r.insertedAt).toBe(6);
    expect(r.checks.map((c) => c.slug)).not.toContain('label-missing');
  });

  test('[HELP622] multi-configuration, [TECHHELP] 271: GOTO %CONFIG% jumps to one label per menu block (REFERENCES 2.23)', () => {
    const file = Buffer.from('@ECHO OFF\r\nPATH C:\\DOS\r\nGOTO %CONFIG%\r\n:A\r\nWIN\r\n:B\r\nC:\\CAD\\DRAW.EXE\r\n');
    const menu = (items: string) => Buffer.from(`[MENU]\r\n${items}`);
    // WIN (line 5) is the final program of choice A, so the block must come before the GOTO.
    const r = plan({ profile: { ...BASE, finalProgram: 5 }, autoexec: file, config: menu('MENUITEM=A\r\nMENUITEM=B\r\n') });
    expect(r.insertedAt).toBe(3);
    expect(r.checks.map((c) => c.slug)).not.toContain('goto-config-missing');
    // Only choice B: the GOTO always lands on :B, and the block may follow the label, before DRAW.
    const onlyB = plan({ profile: BASE, autoexec: file, config: menu('MENUITEM=B\r\n') });
    expect(onlyB.insertedAt).toBe(7);
    const missing = plan({ profile: BASE, autoexec: file, config: menu('MENUITEM=A\r\nMENUITEM=C\r\n') });
    expect(missing.checks.map((c) => c.slug)).toContain('goto-config-missing');
  });

  test('[M4C] INIT.ASM: without AUTOEXEC.BAT DOS asks for date and time, so creating one says so (REFERENCES 2.18)', () => {
    const r = plan({ profile: BASE, autoexec: null, config: null });
    expect(r.checks.find((c) => c.slug === 'no-autoexec')?.message).toMatch(/date and time/);
  });

  test('[HELP622] REM--Note: the marker lines hold no > < | (REFERENCES 2.6); a turned-off line with them gets ::', () => {
    const r = plan({ profile: BASE, autoexec: Buffer.from('MODE LPT1:=COM2: > NUL\r\nWIN\r\n'), config: null });
    for (const line of r.changes.find((c) => c.kind === 'insert-block')!.lines.filter((l) => /REM/.test(l))) expect(line).not.toMatch(/[<>|]/);
    expect(r.files.autoexec.afterText.split('\r\n')[0]).toBe(':: Bootwright off: MODE LPT1:=COM2: > NUL');
  });

  test('[M4C] TBATCH.ASM, [3COM]: before 3.3 "@ECHO OFF" fails, so ECHO stays on and the block lines show (REFERENCES 2.1)', () => {
    const echo = (file: string) => slugs({ dos: '3.20' }).length >= 0 && plan({ profile: { ...BASE, dos: '3.20' }, autoexec: Buffer.from(file), config: null }).checks.map((c) => c.slug);
    expect(echo('@ECHO OFF\r\nPATH C:\\DOS\r\nWIN\r\n')).toContain('echo-visible');
    expect(echo('ECHO OFF\r\nPATH C:\\DOS\r\nWIN\r\n')).not.toContain('echo-visible');
    const at33 = plan({ profile: { ...BASE, dos: '3.30' }, autoexec: Buffer.from('@ECHO OFF\r\nWIN\r\n'), config: null });
    expect(at33.checks.map((c) => c.slug)).not.toContain('echo-visible');
  });

  test('[HELP622], [M4] MODEPARS.ASM: an older setup of the same port with the same values, in either form, is a duplicate (REFERENCES 1.1, 1.2, 1.8)', () => {
    const old = (line: string) => plan({ profile: BASE, autoexec: Buffer.from(`${line}\r\nWIN\r\n`), config: null }).checks.map((c) => c.slug);
    expect(old('MODE COM1:96,N,8,1')).toContain('serial-setup-duplicate');
    expect(old('mode com1 baud=9600 parity=n data=8 stop=1')).toContain('serial-setup-duplicate');
    expect(old('MODE COM1:96,E,7,1')).toContain('serial-setup-replaced');
    // An omitted field may mean another value in another DOS (REFERENCES 1.13), so it is not the same setup.
    expect(old('MODE COM1:96,N,8')).toContain('serial-setup-replaced');
    expect(old('MODE COM2:96,N,8,1')).not.toContain('serial-setup-replaced');
  });

  test('marker lines fit in 80 columns', () => {
    for (const line of block({}).filter((l) => l.includes('REM'))) expect(line.length).toBeLessThanOrEqual(80);
  });
});
