// Startup files of the invented demo office, one of every common shape. All names and programs are
// invented for the demo (the office menu OFFMENU, the drafting program DRAFTX, the ledger LEDGR, ...).
const dos = (...lines: string[]) => lines.join('\r\n') + '\r\n';

export const DEMO_FILES: Record<string, { autoexec: string | null; config: string | null }> = {
  // DOS 6.22, an office menu at the end that never returns.
  RECEPT: {
    autoexec: dos(
      '@ECHO OFF',
      'PROMPT $P$G',
      'PATH C:\\DOS;C:\\OFFMENU;C:\\WP51',
      'SET TEMP=C:\\TEMP',
      'LH C:\\DOS\\DOSKEY.COM',
      'C:\\OFFMENU\\OFFMENU.EXE',
    ),
    config: dos('DEVICE=C:\\DOS\\HIMEM.SYS', 'DEVICE=C:\\DOS\\EMM386.EXE NOEMS', 'DOS=HIGH,UMB', 'FILES=30', 'BUFFERS=20'),
  },
  // DOS 5.0, Windows at the end.
  DRAFT1: {
    autoexec: dos('@echo off', 'path c:\\windows;c:\\dos;c:\\draftx', 'set temp=c:\\windows\\temp', 'c:\\dos\\smartdrv.exe 1024', 'win'),
    config: dos('device=c:\\dos\\himem.sys', 'dos=high', 'files=40', 'buffers=25', 'stacks=9,256'),
  },
  // DOS 6.22, a GOTO menu loop that returns to its top after each program.
  DRAFT2: {
    autoexec: dos(
      '@ECHO OFF',
      'PATH C:\\DOS;C:\\DRAFTX;C:\\UTIL',
      'SET DRAFTX=C:\\DRAFTX\\CFG',
      ':TOP',
      'CLS',
      'ECHO 1 = Drafting   2 = Letters   3 = DOS prompt',
      'CHOICE /C:123 /N Pick a number:',
      'IF ERRORLEVEL 3 GOTO END',
      'IF ERRORLEVEL 2 GOTO LETTERS',
      'C:\\DRAFTX\\DRAFTX.EXE',
      'GOTO TOP',
      ':LETTERS',
      'C:\\WP51\\WP.EXE',
      'GOTO TOP',
      ':END',
    ),
    config: dos('DEVICE=C:\\DOS\\HIMEM.SYS', 'DOS=HIGH', 'FILES=30', 'BUFFERS=20'),
  },
  // DOS 4.01, a serial mouse on COM1 (the adapter goes on COM2), the ledger program at the end.
  ACCOUNTS: {
    autoexec: dos('@ECHO OFF', 'PATH C:\\DOS;C:\\LEDGR', 'C:\\MOUSE\\MOUSE.COM /C1', 'MODE LPT1:=COM1:', 'CD \\LEDGR', 'LEDGR'),
    config: dos('FILES=20', 'BUFFERS=15', 'SHELL=C:\\COMMAND.COM C:\\ /E:512 /P'),
  },
  // DOS 6.22 with a multi-configuration boot menu in CONFIG.SYS and GOTO %CONFIG% in AUTOEXEC.BAT.
  STUDIO: {
    autoexec: dos(
      '@ECHO OFF',
      'PROMPT $P$G',
      'PATH C:\\DOS;C:\\WINDOWS',
      'GOTO %CONFIG%',
      ':WINDOWS',
      'LH C:\\DOS\\SMARTDRV.EXE',
      'WIN',
      'GOTO DONE',
      ':PLAIN',
      'ECHO Plain DOS start.',
      'GOTO DONE',
      ':DONE',
    ),
    config: dos(
      '[MENU]',
      'MENUITEM=WINDOWS, Start Windows',
      'MENUITEM=PLAIN, Plain DOS',
      'MENUDEFAULT=WINDOWS, 10',
      '[COMMON]',
      'DEVICE=C:\\DOS\\HIMEM.SYS',
      'DOS=HIGH,UMB',
      'FILES=30',
      '[WINDOWS]',
      'DEVICE=C:\\DOS\\EMM386.EXE NOEMS',
      'BUFFERS=20',
      '[PLAIN]',
      'BUFFERS=10',
      '[COMMON]',
    ),
  },
  // DOS 3.30: no @, no CALL; the plan must stay within what 3.30 has.
  ARCHIVE: {
    autoexec: dos('ECHO OFF', 'PATH C:\\;C:\\DOS33;C:\\FILER', 'PROMPT $P$G', 'FILER'),
    config: dos('FILES=20', 'BUFFERS=10'),
  },
  // DOS 6.20, drivers loaded high, Windows at the end.
  PRINCIPL: {
    autoexec: dos(
      '@ECHO OFF',
      'LH /L:1 C:\\DOS\\SMARTDRV.EXE /X',
      'PATH C:\\DOS;C:\\WINDOWS;C:\\SHEETS',
      'SET TEMP=C:\\WINDOWS\\TEMP',
      'LH C:\\MOUSE\\MOUSE.COM',
      'WIN /3',
    ),
    config: dos('DEVICE=C:\\DOS\\HIMEM.SYS', 'DEVICE=C:\\DOS\\EMM386.EXE RAM', 'DOS=HIGH,UMB', 'DEVICEHIGH=C:\\DOS\\ANSI.SYS', 'FILES=40', 'BUFFERS=30'),
  },
  // DOS 5.0 with no AUTOEXEC.BAT at all (the engine creates one).
  INTERN: { autoexec: null, config: dos('FILES=20', 'BUFFERS=20') },
  // DOS 6.0, the modelling program at the end, lowercase commands and a CALL.
  MODELS: {
    autoexec: dos('@echo off', 'prompt $p$g', 'path=c:\\dos;c:\\model3d', 'call c:\\model3d\\setenv.bat', 'c:\\model3d\\model3d.exe'),
    config: dos('device=c:\\dos\\himem.sys', 'dos=high', 'files=50', 'buffers=30'),
  },
  // DOS 3.30, hands off to another batch file without CALL (control never returns).
  LIBRARY: {
    autoexec: dos('ECHO OFF', 'PATH C:\\DOS;C:\\CATALOG', 'SET CAT=C:\\CATALOG\\DATA', 'C:\\CATALOG\\START.BAT'),
    config: dos('FILES=20', 'BUFFERS=10'),
  },
};
