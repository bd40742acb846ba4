/**
 * One finding of the engine (PRODUCT.md "check"). Browser-safe: no Node built-ins, no iconv-lite.
 * `line` is the 1-based line of the file the technician gave us (for a file we create, the line of the new
 * file); null when the finding is about the profile rather than a line.
 */
export type Severity = 'error' | 'warning' | 'note';
export type StartupFileName = 'AUTOEXEC.BAT' | 'CONFIG.SYS';

export type Check = {
  slug: string;
  severity: Severity;
  file: StartupFileName | null;
  line: number | null;
  message: string;
};

/** Builds a check about the profile (no file, no line). */
export function profileCheck(slug: string, severity: Severity, message: string): Check {
  return { slug, severity, file: null, line: null, message };
}

/** Builds a check about one line of a startup file. */
export function lineCheck(
  slug: string,
  severity: Severity,
  file: StartupFileName,
  line: number | null,
  message: string,
): Check {
  return { slug, severity, file, line, message };
}

/** True when any check blocks approval. */
export function hasError(checks: readonly Check[]): boolean {
  return checks.some((c) => c.severity === 'error');
}
