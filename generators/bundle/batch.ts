/**
 * Pieces shared by the bundle's batch files: safe ECHO lines, the backup folders on the boot drive and
 * what a PC's plan touches.
 */
import { wrapWords } from './wrap';
import { DOS_COLUMNS } from './text';
import type { BundlePc } from './types';

/** Backup folders on the boot drive: BWSAVE\001 .. BWSAVE\009, a new one for every install. */
export const BACKUP_ROOT = 'BWSAVE';
export const BACKUP_SLOTS = 9;

/** Name of the file that marks a backup folder and records which plan made it. */
export const SLOT_RECORD = 'SLOT.TXT';

export function slotName(n: number): string {
  return String(n).padStart(3, '0');
}

/** What one PC's plan has and touches, read once for all its batch files. */
export type PcFacts = {
  drive: string;
  hasAutoexecOld: boolean;
  hasConfigOld: boolean;
  /** The plan writes CONFIG.SYS (configNew given); otherwise CONFIG.SYS stays as it is. */
  writesConfig: boolean;
};

export function pcFacts(pc: BundlePc): PcFacts {
  const letter = (pc.bootDrive ?? 'C').trim().replace(/:$/, '').toUpperCase();
  if (!/^[A-Z]$/.test(letter)) throw new Error(`boot drive ${JSON.stringify(pc.bootDrive)} is not a drive letter`);
  return {
    drive: `${letter}:`,
    hasAutoexecOld: pc.autoexecOld !== null,
    hasConfigOld: pc.configOld !== null,
    writesConfig: pc.configNew !== null,
  };
}

/**
 * Text that is safe after ECHO: no redirection or pipe characters (`<`, `>`, `|`), no `%` (batch
 * parameters, REFERENCES 2.9), and no leading ON/OFF word, which ECHO would take as its switch.
 */
export function echoSafe(text: string): string {
  const cleaned = squeeze(text);
  return /^(on|off)\b/i.test(cleaned) ? `- ${cleaned}` : cleaned;
}

const UNSAFE = /[<>|%\x00-\x1f\x7f]|\s\s|^\s|\s$|[^\S ]/;

/** Blanks for `<`, `>`, `|`, `%` and control characters, runs of blanks made one, ends trimmed. */
function squeeze(text: string): string {
  if (!UNSAFE.test(text)) return text;
  return text.replace(/[<>|%\x00-\x1f\x7f]/g, ' ').replace(/\s+/g, ' ').trim();
}

/** ECHO lines that show `text` wrapped to 80 columns. */
export function echo(text: string): string[] {
  const safe = echoSafe(text);
  if (safe === '') return [];
  return wrapWords(safe, DOS_COLUMNS, 'ECHO ', 'ECHO ');
}

/** REM lines for a comment; REM cannot hold `>`, `<` or `|` (REFERENCES 2.6, [HELP622] REM). */
export function rem(text: string): string[] {
  return wrapWords(squeeze(text), DOS_COLUMNS, 'REM ', 'REM ');
}

/** Leaves `name`'s check result in ERRORLEVEL: 0 same, 1 different, 2 missing (samefile.asm). */
export function samefile(a: string, b: string): string {
  return `SAMEFILE ${a} ${b}`;
}
