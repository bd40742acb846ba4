/**
 * A generated corpus of AUTOEXEC.BAT files for the speed bench: the shapes of the demo scenario (menu at the
 * end, WIN at the end, a GOTO menu loop, a mouse on COM1, a multi-configuration menu, DOS 3.30 without `@`),
 * mixed with setup lines, from a seeded generator so every run plans the same files.
 */

/** Park-Miller style generator: deterministic, no dependency. */
export function seeded(seed: number): () => number {
  let s = seed % 2147483647 || 1;
  return () => (s = (s * 48271) % 2147483647) / 2147483647;
}

const SETUP = [
  'PROMPT $P$G', 'PATH C:\\DOS;C:\\WINDOWS;C:\\UTIL', 'SET TEMP=C:\\TEMP', 'C:\\MOUSE\\MOUSE.COM', 'LH C:\\DOS\\DOSKEY',
  'C:\\DOS\\SMARTDRV.EXE 2048', 'C:\\DOS\\KEYB US', 'SET BLASTER=A220 I5 D1', 'C:\\DOS\\SHARE.EXE', 'VER',
  'IF EXIST C:\\TEMP\\NUL DEL C:\\TEMP\\*.TMP', 'CALL C:\\UTIL\\STAMP.BAT', 'rem old scanner driver', ':: plans archive',
];

const ENDINGS: ((pick: () => number) => string[])[] = [
  () => ['WIN'],
  () => ['CD \\MENU', 'MENU.EXE'],
  () => [':MENU', 'CLS', 'ECHO 1 Drawings  2 Letters  3 DOS', 'CHOICE /C:123', 'IF ERRORLEVEL 3 GOTO DONE', 'IF ERRORLEVEL 2 GOTO LETTERS', 'CD \\CAD', 'CAD', 'GOTO MENU', ':LETTERS', 'CD \\WP51', 'WP', 'GOTO MENU', ':DONE'],
  () => ['GOTO %CONFIG%', ':NETWORK', 'C:\\WINDOWS\\WIN', 'GOTO END', ':PLAIN', 'ECHO Plain DOS', ':END'],
  () => ['C:\\MENU\\START.BAT'],
  () => [],
];

/** One generated AUTOEXEC.BAT as text (CR LF, sometimes a trailing Ctrl-Z). */
export function generateAutoexec(pick: () => number): string {
  const lines: string[] = [pick() < 0.7 ? '@ECHO OFF' : 'ECHO OFF'];
  const count = 3 + Math.floor(pick() * 12);
  for (let i = 0; i < count; i++) lines.push(SETUP[Math.floor(pick() * SETUP.length)]);
  if (pick() < 0.2) lines.push('MODE LPT1:=COM2:');
  lines.push(...ENDINGS[Math.floor(pick() * ENDINGS.length)](pick));
  return lines.map((l) => `${l}\r\n`).join('') + (pick() < 0.1 ? '\x1a' : '');
}

/** `count` files as bytes. */
export function generateCorpus(count: number, seed = 42): Uint8Array[] {
  const pick = seeded(seed);
  return Array.from({ length: count }, () => Buffer.from(generateAutoexec(pick), 'latin1'));
}
