/**
 * fast-check arbitraries for startup files built from real-world line shapes: echo off, PATH/SET/PROMPT,
 * drivers and resident programs, LH, labels and GOTO loops, IF ERRORLEVEL menus, GOTO %CONFIG%, CALL, FOR,
 * hand-off, EXIT, comments of every kind, CP437 text, long lines, mixed terminators and a Ctrl-Z tail.
 */
import fc from 'fast-check';
import iconv from 'iconv-lite';
import type { Profile } from '../../../../generators/engine/profile';

const SETUP = [
  '@ECHO OFF', 'echo off', '@ Echo off', 'ECHO ON', 'CLS', 'VER', 'PROMPT $P$G', 'PATH C:\\DOS;C:\\WINDOWS',
  'PATH=%PATH%;C:\\UTIL', 'SET PATH=C:\\WINDOWS', 'path c:\\dos', 'PATH ;', 'SET TEMP=C:\\TEMP', 'set BLASTER=A220 I5 D1',
  'C:\\MOUSE\\MOUSE.COM', '\tc:\\mouse\\mouse.com   /Y', 'LH C:\\DOS\\DOSKEY', 'LOADHIGH /L:1 C:\\DOS\\SMARTDRV.EXE',
  'C:\\DOS\\SHARE.EXE /L:500', 'KEYB GR,,C:\\DOS\\KEYBOARD.SYS', 'MODE LPT1:=COM2:', 'MODE COM1:2400,N,8,1', 'mode lpt1',
  'MODE LPT1:=COM1:', 'C:\\THREAD\\TLRES.COM /S:50', 'C:\\THREAD\\TLRES.COM /S:104 /Q', 'CD \\WP51', 'C:', 'D:',
  'IF NOT EXIST C:\\TEMP\\NUL MD C:\\TEMP', 'IF EXIST C:\\THREAD\\TLRES.COM C:\\THREAD\\TLRES.COM', 'ECHO \u2554\u2550\u2557 B\u00fcro \u00e9t\u00e9',
];
const COMMENTS = [':: plans archive', 'REM REM old line', 'rem *** disabled by SETUP: C:\\OLD\\NETDRV.COM', '; home comment', '*  star comment', 'REM'];
const FLOW = [
  ':L1', ':L2', ':MENU', ':  END', ':LONGLABEL1', 'GOTO L1', 'goto :L2', 'GOTO MENU', 'GOTO END', 'GOTO LONGLABEL2',
  'IF ERRORLEVEL 2 GOTO L2', 'IF EXIST C:\\X.FLG GOTO L1', 'IF "%CONFIG%"=="NET" GOTO MENU', 'IF (%CONFIG%)==(X) GOTO END',
  'GOTO %CONFIG%', 'GOTO   %CONFIG%', 'CHOICE /C:123', 'IF ERRORLEVEL 3 GOTO END', 'IF NOT ERRORLEVEL 1 GOTO MENU',
];
const PROGRAMS = [
  'CALL C:\\UTIL\\STAMP.BAT', 'FOR %%B IN (A.BAT B.BAT) DO CALL %%B', 'C:\\MENU\\START.BAT', 'IF EXIST C:\\GO.BAT C:\\GO.BAT',
  'WIN', 'C:\\WINDOWS\\WIN.COM', 'WP', 'C:\\OFFICE\\OFFMENU.EXE', 'C:\\CAD\\DRAW.EXE /P', 'EXIT', 'IF "%1"=="Q" EXIT',
];

const cp437Char = fc.integer({ min: 0x20, max: 0xfe }).filter((c) => c !== 0x7f).map((c) => iconv.decode(Buffer.from([c]), 'cp437'));
const freeText = fc.array(cp437Char, { maxLength: 40 }).map((cs) => cs.join(''));

/** One line's text, without terminator. */
export const lineArb: fc.Arbitrary<string> = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom(...SETUP) },
  { weight: 2, arbitrary: fc.constantFrom(...COMMENTS) },
  { weight: 4, arbitrary: fc.constantFrom(...FLOW) },
  { weight: 3, arbitrary: fc.constantFrom(...PROGRAMS) },
  { weight: 1, arbitrary: fc.constantFrom('', '   ', '\t') },
  { weight: 1, arbitrary: freeText.map((t) => `ECHO ${t}`) },
  { weight: 1, arbitrary: fc.integer({ min: 120, max: 200 }).map((n) => `ECHO ${'x'.repeat(n)}`) },
);

const eolArb = fc.oneof({ weight: 8, arbitrary: fc.constant('\r\n') }, { weight: 1, arbitrary: fc.constant('\n') }, { weight: 1, arbitrary: fc.constant('\r') });

/** A whole AUTOEXEC.BAT as bytes. */
export const autoexecArb: fc.Arbitrary<Buffer> = fc
  .record({
    lines: fc.array(fc.tuple(lineArb, eolArb), { maxLength: 25 }),
    lastEol: fc.boolean(),
    tail: fc.option(fc.uint8Array({ maxLength: 12 }), { freq: 8 }),
  })
  .map(({ lines, lastEol, tail }) => {
    const text = lines.map(([t, e], i) => t + (i === lines.length - 1 && !lastEol ? '' : e)).join('');
    const body = iconv.encode(text, 'cp437');
    return tail ? Buffer.concat([body, Buffer.from([0x1a]), Buffer.from(tail)]) : body;
  });

const CONFIGS = [
  null,
  'DEVICE=C:\\DOS\\HIMEM.SYS\r\nDOS=HIGH,UMB\r\nFILES=30\r\n',
  '[MENU]\r\nMENUITEM=NET, Network\r\nMENUITEM=X\r\n[COMMON]\r\nFILES=20\r\n[NET]\r\nDEVICE=C:\\DOS\\EMM386.EXE\r\n',
  'FILES=20\r\nBUFFERS=10',
];

/** A CONFIG.SYS (or none) as bytes. */
export const configArb: fc.Arbitrary<Buffer | null> = fc.constantFrom(...CONFIGS).map((c) => (c === null ? null : Buffer.from(c, 'latin1')));

const BASE: Profile = {
  dos: '6.22', bootDrive: 'C', dosDir: 'C:\\DOS',
  ports: [
    { name: 'COM1', present: true, attached: 'adapter' },
    { name: 'COM2', present: true, attached: 'none' },
    { name: 'LPT1', present: true, attached: 'none' },
  ],
  network: { port: 'COM1', baud: 9600, parity: 'N', dataBits: 8, stopBits: 1 },
  redirect: { from: 'LPT1', to: 'COM1' },
  loader: { path: 'C:\\THREAD\\TLRES.COM', args: '/S:104 /Q' },
  finalProgram: 'auto', loadHigh: 'auto',
};

/** Profiles across DOS versions, with and without redirection and kit CONFIG.SYS needs. */
export const profileArb: fc.Arbitrary<Profile> = fc
  .record({
    dos: fc.constantFrom('2.11', '3.20', '3.30', '4.01', '5.0', '6.22', '7.10'),
    redirect: fc.boolean(),
    baud: fc.constantFrom(2400, 9600, 19200),
    kit: fc.boolean(),
    loadHigh: fc.constantFrom('auto' as const, 'never' as const),
  })
  .map(({ dos, redirect, baud, kit, loadHigh }) => ({
    ...BASE,
    dos,
    loadHigh,
    network: { ...BASE.network, baud },
    redirect: redirect ? BASE.redirect : null,
    ...(kit ? { kit: { name: 'Threadline', minDos: '3.30', residentKB: 38, files: 30, buffers: 20, configLines: ['DEVICE=C:\\THREAD\\TLPORT.SYS /P:1'] } } : {}),
  }));

/** MENUITEM names of a CONFIG.SYS, for the test interpreter. */
export function choicesOf(config: Buffer | null): string[] | null {
  if (!config) return null;
  const names = [...config.toString('latin1').matchAll(/^menuitem=([^,\r\n]+)/gim)].map((m) => m[1].trim().toUpperCase());
  return names.length ? names : null;
}
