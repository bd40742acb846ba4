/**
 * What the bundle's batch files may use on one DOS version. The installers are written with the commands
 * MS-DOS 2.0 already had (REFERENCES 2.4, [M2] TDATA.ASM COMTAB: COPY, DEL, MD, CD, ECHO, GOTO, IF, REM),
 * never CALL (REFERENCES 2.2, [ENC] Appendix A: new in 3.3), never FOR (missing in DOSBox, REFERENCES 7.8),
 * so the only per-version difference is how echo is switched off.
 */

export type BatchDialect = {
  /** The version as comparable number: 3.30 -> 330. */
  version: number;
  /** "MS-DOS 3.30" for sheets and messages. */
  label: string;
  /** First line of every batch file. */
  echoOff: string;
};

/** Parses "6.22", "3.30", "5.0", "4.01" into major * 100 + two-digit minor; null when it is no version. */
export function parseDosVersion(text: string): number | null {
  const m = /^\s*(\d{1,2})\.(\d{1,2})\s*$/.exec(text);
  if (!m) return null;
  const minor = m[2].length === 1 ? Number(m[2]) * 10 : Number(m[2]);
  return Number(m[1]) * 100 + minor;
}

/**
 * The dialect for a station's DOS version. `@` hides a line from 3.3 on (REFERENCES 2.1, [M4C] TBATCH.ASM,
 * [3COM]); the installers use it only from 4.0, so the 3.3x releases (the boundary, and the demo's @-less
 * machines) get plain `ECHO OFF`, which every version accepts and which costs one echoed line.
 * An unknown version is treated like the oldest (2.0).
 */
export function batchDialect(dos: string): BatchDialect {
  const version = parseDosVersion(dos) ?? 200;
  const label = `MS-DOS ${Math.floor(version / 100)}.${String(version % 100).padStart(2, '0')}`;
  return { version, label, echoOff: version >= 400 ? '@ECHO OFF' : 'ECHO OFF' };
}
