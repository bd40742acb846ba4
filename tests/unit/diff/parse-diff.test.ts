// The diff view's reader: line numbers of both files, +/- rows, side-by-side pairing, control bytes shown.
// The diffs are made by the `diff` package (the same one the engine uses) and checked against GNU patch's
// reading of hunk headers: "@@ -l,s +l,s @@" gives each file's first line.
import { createTwoFilesPatch } from 'diff';
import { countChanges, displayText, parseUnifiedDiff, sideBySide } from '@/components/diff/parse-diff';

const before = ['@ECHO OFF', 'PROMPT $P$G', 'PATH C:\\DOS', 'MOUSE', 'MENU'].map((l) => `${l}\r\n`).join('');
const after = ['@ECHO OFF', 'PROMPT $P$G', 'PATH C:\\DOS', 'REM MOUSE', '@MODE COM1 BAUD=9600', 'MENU'].map((l) => `${l}\r\n`).join('');
const diff = createTwoFilesPatch('a/AUTOEXEC.BAT', 'b/AUTOEXEC.BAT', before, after, undefined, undefined, { context: 3 });

describe('parseUnifiedDiff', () => {
  it('numbers every row in the old and the new file', () => {
    const [h] = parseUnifiedDiff(diff);
    expect(h!.rows.map((r) => [r.kind, r.oldNo, r.newNo, r.text])).toEqual([
      ['context', 1, 1, '@ECHO OFF'],
      ['context', 2, 2, 'PROMPT $P$G'],
      ['context', 3, 3, 'PATH C:\\DOS'],
      ['del', 4, null, 'MOUSE'],
      ['add', null, 4, 'REM MOUSE'],
      ['add', null, 5, '@MODE COM1 BAUD=9600'],
      ['context', 5, 6, 'MENU'],
    ]);
    expect(countChanges(parseUnifiedDiff(diff))).toEqual({ added: 2, removed: 1 });
  });

  it('gives no hunks for an empty diff and numbers a new file from 1', () => {
    expect(parseUnifiedDiff('')).toEqual([]);
    const created = createTwoFilesPatch('a/CONFIG.SYS', 'b/CONFIG.SYS', '', 'FILES=20\r\nBUFFERS=15\r\n');
    const [h] = parseUnifiedDiff(created);
    expect(h!.rows.map((r) => [r.kind, r.newNo])).toEqual([['add', 1], ['add', 2]]);
  });

  it('marks a last line without a line end and shows Ctrl-Z instead of dropping it', () => {
    const d = createTwoFilesPatch('a/X', 'b/X', 'A\r\nB', 'A\r\nC\x1a');
    const rows = parseUnifiedDiff(d)[0]!.rows;
    expect(rows.find((r) => r.kind === 'add')).toMatchObject({ text: 'C^Z', noEol: true });
    expect(displayText('ECHO\x07\r')).toBe('ECHO^G');
  });
});

describe('sideBySide', () => {
  it('puts a changed line beside its new form and an extra added line beside a blank', () => {
    const pairs = sideBySide(parseUnifiedDiff(diff)[0]!.rows);
    expect(pairs.map((p) => [p.left?.oldNo ?? null, p.right?.newNo ?? null])).toEqual([
      [1, 1],
      [2, 2],
      [3, 3],
      [4, 4],
      [null, 5],
      [5, 6],
    ]);
  });
});
