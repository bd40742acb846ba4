/**
 * DOS version strings as users read them with VER ("6.22", "3.30", "5.0"), turned into a comparable number
 * (major * 100 + two-digit minor: 3.30 -> 330, 6.22 -> 622). Browser-safe.
 */

/** Releases we know of (MS-DOS / PC DOS 2.0 to 7.10, from memory). Anything else is "unknown". */
const KNOWN = new Set([
  200, 201, 210, 211, 225, 300, 310, 320, 321, 330, 331, 400, 401, 500, 502, 600, 610, 620, 621, 622, 630,
  700, 710,
]);

/** The comparable number of a version string, or null when it is not a DOS release we know. */
export function parseDosVersion(text: string): number | null {
  const m = /^\s*(\d{1,2})\.(\d{1,2})\s*$/.exec(text);
  if (!m) return null;
  const minor = m[2].length === 1 ? Number(m[2]) * 10 : Number(m[2]);
  const value = Number(m[1]) * 100 + minor;
  return KNOWN.has(value) ? value : null;
}

/** "3.30" for 330: the way DOS prints its version. */
export function formatDosVersion(value: number): string {
  return `${Math.floor(value / 100)}.${String(value % 100).padStart(2, '0')}`;
}

/** What each DOS version lets us write; the source of each rule is named beside it. */
export type DosFeatures = {
  /** MODE keyword form `BAUD= PARITY= DATA= STOP=` (REFERENCES 1.2) [M4] MODEPARS.ASM, new in 4.0. */
  modeKeywords: boolean;
  /** COM3 and COM4 (REFERENCES 1.6) [KB40594]: recognised only from 3.3. */
  com34: boolean;
  /** `@` to hide one line (REFERENCES 2.1) [M4C] TBATCH.ASM, [3COM]: from 3.3. */
  atSign: boolean;
  /** CALL returns to the caller (REFERENCES 2.2) [ENC] Appendix A, [M4C] TDATA.ASM: from 3.3. */
  call: boolean;
  /** LH / LOADHIGH (REFERENCES 2.24) [HELP622] loadhigh: from 5.0, and only with DOS=UMB (3.10). */
  loadHigh: boolean;
  /** REM as a CONFIG.SYS line (REFERENCES 3.2) [M4S] SYSINIT2.ASM COMTAB: in 4.0, not in 2.0. */
  configRem: boolean;
};

/** Features of `version`; an unknown version gets the most cautious set (what 2.0 accepts). */
export function dosFeatures(version: number | null): DosFeatures {
  const v = version ?? 200;
  return {
    modeKeywords: v >= 400,
    com34: v >= 330,
    atSign: v >= 330,
    call: v >= 330,
    loadHigh: v >= 500,
    configRem: v >= 400,
  };
}
