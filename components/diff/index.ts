export { DiffView, type DiffViewProps } from './diff-view';
export { parseUnifiedDiff, sideBySide, countChanges, displayText, type DiffHunk, type DiffRow, type SideRow } from './parse-diff';
