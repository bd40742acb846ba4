// Words and marks the survey screens share: every state has a symbol and a word, never colour alone.
import { colors } from '@/constants/theme';
import type { PairStatus, Severity } from '@/generators/survey/types';

export const SEVERITY: Record<Severity, { mark: string; word: string; fg: string; bg: string }> = {
  error: { mark: '✕', word: 'Error', fg: colors.danger, bg: colors.dangerSoft },
  warning: { mark: '!', word: 'Warning', fg: colors.warning, bg: colors.warningSoft },
  note: { mark: 'i', word: 'Note', fg: colors.note, bg: colors.noteSoft },
};

export const PAIR_STATUS: Record<PairStatus | 'untested', { mark: string; word: string; fg: string }> = {
  'in-use': { mark: '⚡', word: 'In use', fg: colors.danger },
  free: { mark: '✓', word: 'Free', fg: colors.success },
  fault: { mark: '✕', word: 'Fault', fg: colors.danger },
  unconfirmed: { mark: '?', word: 'Unconfirmed', fg: colors.warning },
  untested: { mark: '–', word: 'Untested', fg: colors.textMuted },
};

/** A voltage as typed, with its unit; a dash when not measured. */
export function volts(text: string | null, unit: 'V DC' | 'V AC'): string {
  return text === null ? '–' : `${text} ${unit}`;
}

export function feet(n: number): string {
  return `${n} ft`;
}

/** "2026-03-02 09:15" from an ISO time (UTC, as the report prints it). */
export function when(iso: string): string {
  return iso.slice(0, 16).replace('T', ' ');
}

/** The start of a label, short enough for the drawing. */
export function shortLabel(label: string, max = 16): string {
  return label.length <= max ? label : `${label.slice(0, max - 1)}…`;
}
