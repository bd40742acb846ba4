/**
 * DOS 8.3 file names and reserved device names.
 * Rules: [M4D] MS-DOS 4.0 kernel FCB.ASM (11-byte name field, CharType table) and MSCONST.ASM,
 * [M4S] MSBDATA.INC (device chain), summarised in REFERENCES.md §5.2–5.5.
 */

/** Device names that mean the device in any folder and with any extension (REFERENCES §5.4, §5.5). */
export const RESERVED_DEVICE_NAMES = [
  'CON', 'AUX', 'PRN', 'NUL', 'CLOCK$',
  'COM1', 'COM2', 'COM3', 'COM4',
  'LPT1', 'LPT2', 'LPT3',
] as const;

// Characters DOS refuses in a name (REFERENCES §5.3): control codes, space and " / \ [ ] : | < > + = ; ,
// `.` is only the separator, so it is refused inside a part. `*` and `?` are wildcards and refused too.
const FORBIDDEN = /[\x00-\x20"/\\[\]:|<>+=;,.*?]/;

export type NameProblem =
  | 'empty'
  | 'base-too-long'
  | 'extension-too-long'
  | 'bad-character'
  | 'reserved-device'
  | 'too-many-dots';

/** Why `name` is not a valid DOS 8.3 file name, or null when it is valid. */
export function problemWith83Name(name: string): NameProblem | null {
  if (name.length === 0) return 'empty';
  const parts = name.split('.');
  if (parts.length > 2) return 'too-many-dots';
  const [base, ext = ''] = parts;
  if (base.length === 0) return 'empty';
  if (base.length > 8) return 'base-too-long';
  if (ext.length > 3) return 'extension-too-long';
  if (FORBIDDEN.test(base) || FORBIDDEN.test(ext)) return 'bad-character';
  if (isReservedDeviceName(base)) return 'reserved-device';
  return null;
}

/** True when `name` is a valid 8.3 name (base up to 8, extension up to 3, allowed characters, no device). */
export function isValid83Name(name: string): boolean {
  return problemWith83Name(name) === null;
}

/** True when the base name (extension ignored, any case) is a DOS device name. */
export function isReservedDeviceName(name: string): boolean {
  const base = name.split('.')[0].toUpperCase();
  return (RESERVED_DEVICE_NAMES as readonly string[]).includes(base);
}

/** Plain-words explanation of a problem, for checks and form errors. */
export function describeNameProblem(problem: NameProblem): string {
  switch (problem) {
    case 'empty':
      return 'The name is empty.';
    case 'base-too-long':
      return 'DOS names have at most 8 characters before the dot.';
    case 'extension-too-long':
      return 'DOS extensions have at most 3 characters.';
    case 'bad-character':
      return 'DOS names cannot hold spaces or any of " / \\ [ ] : | < > + = ; , . * ?';
    case 'reserved-device':
      return 'This is a DOS device name (CON, AUX, PRN, NUL, CLOCK$, COM1–COM4, LPT1–LPT3).';
    case 'too-many-dots':
      return 'A DOS name has at most one dot, before the extension.';
  }
}

/**
 * Turns arbitrary text into a valid, upper-case 8.3 base name (no extension), for folder names derived from
 * station names. Keeps letters, digits and - _ ! # $ % & ' ( ) @ ^ ` { } ~, cuts to 8, and falls back to
 * `fallback` when nothing usable is left or the result is a device name.
 */
export function to83Base(text: string, fallback: string): string {
  const cleaned = text
    .toUpperCase()
    .replace(/[^A-Z0-9\-_!#$%&'()@^`{}~]/g, '')
    .slice(0, 8);
  if (cleaned.length === 0 || isReservedDeviceName(cleaned)) return fallback.toUpperCase().slice(0, 8);
  return cleaned;
}
