import type { Severity, SurveyCheck } from './types';

export interface CheckRefs {
  runIds?: readonly string[];
  jackIds?: readonly string[];
  nodeIds?: readonly string[];
}

/** Builds one check; the id lists are copied so a check never shares arrays with the model. */
export function check(slug: string, severity: Severity, message: string, refs: CheckRefs = {}): SurveyCheck {
  return {
    slug,
    severity,
    message,
    runIds: [...(refs.runIds ?? [])],
    jackIds: [...(refs.jackIds ?? [])],
    nodeIds: [...(refs.nodeIds ?? [])],
  };
}

const ORDER: Record<Severity, number> = { error: 0, warning: 1, note: 2 };

/** Errors first, then warnings, then notes; the order within a severity stays as found. */
export function sortChecks(checks: SurveyCheck[]): SurveyCheck[] {
  return checks
    .map((c, i) => ({ c, i }))
    .sort((a, b) => ORDER[a.c.severity] - ORDER[b.c.severity] || a.i - b.i)
    .map(({ c }) => c);
}

/** Formats a number as entered (no rounding): JavaScript's shortest exact form. */
export function asEntered(value: number): string {
  return String(value);
}

/** Formats a computed sum of entered numbers: 15 significant digits hide floating-point noise
 * (0.1 + 0.2 prints as 0.3) and keep every digit a person could have entered. */
export function asSum(value: number): string {
  return String(Number.parseFloat(value.toPrecision(15)));
}
