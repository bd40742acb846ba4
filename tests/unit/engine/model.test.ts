/**
 * The lossless models: line splitting with each terminator, the Ctrl-Z tail, and what each line is.
 */
import { parseBatch, parseConfig, printModel } from '../../../generators/engine/index';
import { decodeCp437, encodeCp437 } from '../../../generators/dos/cp437';
import type { Statement } from '../../../generators/engine/batch-syntax';

const bytes = (s: string) => Buffer.from(s, 'latin1');
const stmt = (line: string): Statement => parseBatch(bytes(line)).lines[0].stmt;

test('code page 437: every byte decodes to one character and encodes back (iconv-lite)', () => {
  const all = Buffer.from(Array.from({ length: 256 }, (_, i) => i));
  const text = decodeCp437(all);
  expect(text).toHaveLength(256);
  expect(Buffer.from(encodeCp437(text)).equals(all)).toBe(true);
  // [HELP622] Country: 437 is the United States code page (REFERENCES 5.6): box drawing and accents.
  expect(decodeCp437(bytes('\xc9\xcd\xbb\x81\x82'))).toBe('╔═╗üé');
});

test('each line keeps its own terminator: CR LF, LF, CR, or none on the last line', () => {
  const m = parseBatch(bytes('A\r\nB\nC\rD'));
  expect(m.lines.map((l) => [l.text, l.eol, l.offset])).toEqual([['A', '\r\n', 0], ['B', '\n', 3], ['C', '\r', 5], ['D', '', 7]]);
  expect(parseBatch(bytes('A\n\r\nB')).lines.map((l) => [l.text, l.eol])).toEqual([['A', '\n'], ['', '\r\n'], ['B', '']]);
});

test('[M4C] TBATCH2.ASM GetBatByt: a Ctrl-Z ends the file; it and what follows are kept as the tail (REFERENCES 2.14)', () => {
  const m = parseBatch(bytes('WIN\r\n\x1ajunk\x00\r\nMORE'));
  expect(m.lines.map((l) => l.text)).toEqual(['WIN']);
  expect(m.tail).toBe('\x1ajunk\x00\r\nMORE');
  expect(Buffer.from(printModel(m)).equals(bytes('WIN\r\n\x1ajunk\x00\r\nMORE'))).toBe(true);
});

test('an empty file has no lines and prints as zero bytes', () => {
  const m = parseBatch(Buffer.alloc(0));
  expect(m.lines).toEqual([]);
  expect(printModel(m)).toHaveLength(0);
});

describe('batch lines', () => {
  test('[M4C] COMEQU.ASM No_Echo_Char: @ with blanks after it, any case (REFERENCES 2.1, 2.20)', () => {
    const line = parseBatch(bytes('@ Echo off')).lines[0];
    expect(line.atSign).toBe(true);
    expect(line.prefix).toBe('@ ');
    expect(line.stmt).toEqual({ kind: 'internal', command: 'ECHO', args: ' off' });
  });

  test('comments: REM, REM REM, :: (a label, REFERENCES 2.5), and home-made ; and * (not comments, 2.6)', () => {
    expect(stmt('REM REM old')).toEqual({ kind: 'comment', style: 'rem' });
    expect(stmt('rem')).toEqual({ kind: 'comment', style: 'rem' });
    expect(stmt(':: note')).toEqual({ kind: 'comment', style: 'colons' });
    expect(stmt('; mouse')).toEqual({ kind: 'comment', style: 'home-made' });
    expect(stmt('*  star')).toEqual({ kind: 'comment', style: 'home-made' });
    expect(stmt('REMARK.EXE')).toMatchObject({ kind: 'program', path: 'REMARK.EXE' });
  });

  test('labels: blanks after the colon allowed, names upper-cased (REFERENCES 2.8)', () => {
    expect(stmt(':  menu')).toEqual({ kind: 'label', name: 'MENU' });
    expect(stmt(':LONGLABEL1 extra')).toEqual({ kind: 'label', name: 'LONGLABEL1' });
  });

  test('internal commands, also glued to what follows (ECHO. CD\\ PATH=)', () => {
    expect(stmt('ECHO.')).toMatchObject({ kind: 'internal', command: 'ECHO' });
    expect(stmt('CD\\WIN')).toMatchObject({ kind: 'internal', command: 'CD', args: '\\WIN' });
    expect(stmt('PATH=%PATH%;C:\\DOS')).toMatchObject({ kind: 'internal', command: 'PATH' });
    expect(stmt('\tprompt\t$p$g')).toMatchObject({ kind: 'internal', command: 'PROMPT' });
    expect(stmt('SETUP /Q')).toMatchObject({ kind: 'program', path: 'SETUP' });
    expect(stmt('D:')).toEqual({ kind: 'drive', drive: 'D' });
  });

  test('external programs: path, extension, arguments; LH and LOADHIGH with their switches (REFERENCES 2.24)', () => {
    expect(stmt('C:\\MOUSE\\MOUSE.COM /Y')).toEqual({ kind: 'program', path: 'C:\\MOUSE\\MOUSE.COM', args: ' /Y', loadHigh: false, handoff: false, dynamic: false });
    expect(stmt('LH /L:1,16000 /S C:\\DOS\\DOSKEY /INSERT')).toMatchObject({ kind: 'program', path: 'C:\\DOS\\DOSKEY', args: ' /INSERT', loadHigh: true });
    expect(stmt('loadhigh c:\\dos\\smartdrv.exe')).toMatchObject({ kind: 'program', path: 'c:\\dos\\smartdrv.exe', loadHigh: true });
    expect(stmt('%COMSPEC% /C X')).toMatchObject({ kind: 'program', dynamic: true });
  });

  test('[M4C] TBATCH.ASM BatCom: a .BAT started without CALL is a hand-off; CALL returns (REFERENCES 2.2, 2.3)', () => {
    expect(stmt('C:\\MENU\\START.BAT')).toMatchObject({ kind: 'program', handoff: true });
    expect(stmt('CALL C:\\UTIL\\STAMP.BAT /Q')).toEqual({ kind: 'call', target: 'C:\\UTIL\\STAMP.BAT', args: ' /Q' });
  });

  test('GOTO, IF, FOR and EXIT', () => {
    expect(stmt('GOTO :End')).toEqual({ kind: 'goto', target: 'END', dynamic: false });
    expect(stmt('GOTO   %CONFIG%')).toEqual({ kind: 'goto', target: '%CONFIG%', dynamic: true });
    expect(stmt('IF (%CONFIG%)==(X) GOTO X')).toEqual({ kind: 'if', negate: false, test: 'compare', condition: '(%CONFIG%)==(X)', then: { kind: 'goto', target: 'X', dynamic: false } });
    expect(stmt('IF NOT ERRORLEVEL 2 GOTO A')).toMatchObject({ kind: 'if', negate: true, test: 'errorlevel', condition: '2' });
    expect(stmt('if exist c:\\x.bat call c:\\x.bat')).toMatchObject({ kind: 'if', test: 'exist', then: { kind: 'call', target: 'c:\\x.bat' } });
    expect(stmt('FOR %%B IN (A.BAT B.BAT) DO CALL %%B')).toEqual({ kind: 'for', variable: '%%B', set: 'A.BAT B.BAT', then: { kind: 'call', target: '%%B', args: '' } });
    expect(stmt('EXIT')).toEqual({ kind: 'exit' });
  });
});

describe('CONFIG.SYS lines', () => {
  const lines = (text: string) => parseConfig(bytes(text)).lines;

  test('directives with blanks around =, menu blocks, REM and ; comments (REFERENCES 3.13, 3.14)', () => {
    const m = lines('buffers = 30\r\n[MENU]\r\nMENUITEM=NET, Network\r\n; note\r\nREM old\r\n[COMMON]\r\nSET TEMP=C:\\TEMP\r\nINCLUDE=NET\r\n');
    expect(m.map((l) => l.stmt.kind)).toEqual(['directive', 'block', 'directive', 'comment', 'comment', 'block', 'directive', 'directive']);
    expect(m[0].stmt).toMatchObject({ name: 'BUFFERS', value: '30', valueAt: 10 });
    expect(m[6].stmt).toMatchObject({ name: 'SET', value: 'TEMP=C:\\TEMP' });
    expect(m.map((l) => l.section)).toEqual([null, 'MENU', 'MENU', 'MENU', 'MENU', 'COMMON', 'COMMON', 'COMMON']);
  });

  test('prompts: DOS 6 name?= and FreeDOS !, ? and menu digits 12? ([HELP622] clean_start, [FDK] config.c; REFERENCES 3.14, 3.16)', () => {
    const m = lines('DEVICE?=C:\\X.SYS\r\n!FILES=40\r\n12?DOS=HIGH,UMB\r\n');
    expect(m[0].stmt).toMatchObject({ kind: 'directive', name: 'DEVICE', ask: true, value: 'C:\\X.SYS' });
    expect(m[1].stmt).toMatchObject({ kind: 'directive', name: 'FILES', marker: '!', value: '40' });
    expect(m[2].stmt).toMatchObject({ kind: 'directive', name: 'DOS', marker: '12?', value: 'HIGH,UMB' });
  });
});
