/**
 * Programs that set something up and return at once, so they are never taken as the program that may not
 * return. The list is common practice of the trade, written from memory (no published source): DOS's own
 * drivers and utilities and the usual resident helpers.
 */
const RETURNING = new Set([
  'MODE', 'CHOICE', 'MOUSE', 'CTMOUSE', 'GMOUSE', 'SMARTDRV', 'DOSKEY', 'KEYB', 'KEYBOARD', 'SHARE', 'MSCDEX',
  'NLSFUNC', 'APPEND', 'SUBST', 'ASSIGN', 'JOIN', 'ATTRIB', 'MEM', 'FASTOPEN', 'GRAPHICS', 'GRAFTABL', 'PRINT',
  'VSAFE', 'MIRROR', 'UNDELETE', 'SETVER', 'LOADFIX', 'EMM386', 'POWER', 'CHKDSK', 'SCANDISK', 'XCOPY',
  'DELTREE', 'DEBUG', 'SORT', 'MORE', 'FIND', 'LABEL', 'DISPLAY', 'MSAV', 'CHKSTATE', 'SETUP', 'TREE',
]);

/** True when a program with this stem (name without extension) is known to return at once. */
export function isKnownReturning(stem: string): boolean {
  return RETURNING.has(stem.toUpperCase());
}
