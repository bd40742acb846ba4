/**
 * A small independent reader of the bundle's batch files for the tests: which commands each line runs,
 * the labels and the GOTO targets. Written from REFERENCES §2 only (not from the generator's code).
 */
import { decodeCp437 } from '@/generators/dos/cp437';

/** COMMAND.COM 2.0's internal commands (REFERENCES 2.4, [M2] TDATA.ASM COMTAB). */
export const DOS2_COMMANDS = new Set([
  'DIR', 'REN', 'RENAME', 'DEL', 'ERASE', 'TYPE', 'REM', 'COPY', 'PAUSE', 'DATE', 'TIME', 'VER', 'VOL', 'CD',
  'CHDIR', 'MD', 'MKDIR', 'RD', 'RMDIR', 'BREAK', 'VERIFY', 'SET', 'PROMPT', 'PATH', 'EXIT', 'CTTY', 'ECHO',
  'GOTO', 'SHIFT', 'IF', 'FOR', 'CLS',
]);

export type BatchLine = { text: string; command: string | null; label: string | null };

/** Strips IF conditions (IF [NOT] EXIST x / ERRORLEVEL n / a==b) to find the command a line runs. */
function commandOf(text: string): string | null {
  let rest = text.trim().replace(/^@/, '');
  for (;;) {
    const m = /^IF\s+(NOT\s+)?(EXIST\s+\S+|ERRORLEVEL\s+\d+|\S+==\S+)\s+(.*)$/i.exec(rest);
    if (!m) break;
    rest = m[3];
  }
  const word = /^([^\s>]+)/.exec(rest)?.[1] ?? '';
  return word === '' ? null : word.toUpperCase();
}

/** The lines of a batch file (CR LF separated, code page 437). */
export function readBatch(bytes: Uint8Array): BatchLine[] {
  const text = decodeCp437(bytes);
  const lines = text.split('\r\n');
  if (lines[lines.length - 1] === '') lines.pop();
  return lines.map((line) => {
    const label = /^\s*:\s*(\S+)/.exec(line)?.[1] ?? null;
    return { text: line, label: label?.toUpperCase() ?? null, command: label ? null : commandOf(line) };
  });
}

/** Targets of every GOTO (also after IF). */
export function gotoTargets(lines: BatchLine[]): string[] {
  return lines.flatMap((l) => {
    const m = /\bGOTO\s+(\S+)\s*$/i.exec(l.text);
    return m && l.command !== 'REM' && l.command !== 'ECHO' ? [m[1].toUpperCase()] : [];
  });
}
