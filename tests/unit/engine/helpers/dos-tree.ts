/**
 * Builds DOSBox test copies of a startup file and the C: folder it needs: stub programs for every program
 * the file names, small batch files for CALL and hand-off targets. Test copies are adapted where DOSBox
 * differs from MS-DOS, as REFERENCES.md §7 says: cut at Ctrl-Z (7.4), no blanks before @ (7.6), CHOICE by
 * full path to a scripted stub (7.7), EXIT and PAUSE made REM (7.8, 7.9), LH without /L /S options (7.5).
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { placeStub, writeDosFile } from '../../../support/dosbox';
import { batchLines, parseCmd, programsNamed } from './walker';

/** The DOSBox copy of a batch text (CR LF line ends kept). */
export function dosboxCopy(text: string): string {
  const body = text.split('\x1a')[0];
  return body
    .split('\r\n')
    .map((line) =>
      line
        .replace(/^[ \t]+@/, '@')
        .replace(/^(\s*@?\s*)choice\b/i, '$1C:\\BIN\\CHOICE.COM')
        .replace(/\bexit\s*$/i, 'REM EXIT')
        .replace(/^(\s*@?\s*)pause\b/i, '$1REM PAUSE')
        .replace(/^(\s*@?\s*(?:lh|loadhigh))((?:\s+\/\S*)+)(\s)/i, '$1$3'),
    )
    .join('\r\n');
}

export function stemOf(program: string): string {
  const base = program.split('\\').pop()!.replace(/^[A-Za-z]:/, '');
  return base.replace(/\.[^.]*$/, '').toUpperCase();
}

function folders(texts: string[]): string[] {
  const out = new Set<string>(['C:\\BIN']);
  for (const text of texts) {
    for (const raw of batchLines(text)) {
      const path = /^\s*@?\s*(?:set\s+)?path\s*[= ]\s*(.*)$/i.exec(raw);
      if (path) for (const dir of path[1].split(';')) if (dir.trim() && !dir.includes('%')) out.add(dir.trim());
      const cd = /^\s*@?\s*(?:cd|chdir)\s*(\\\S*)/i.exec(raw);
      if (cd) out.add(`C:${cd[1]}`);
    }
  }
  return [...out];
}

export type TreeOptions = { dosDir: string; loaderPath: string; pick?: string };

/** A fresh C: folder holding `autoexec` (null: none) and every stub the files name. */
export function buildTree(autoexec: string | null, allTexts: string[], options: TreeOptions): string {
  const root = mkdtempSync(join(tmpdir(), 'bwc'));
  if (autoexec !== null) writeDosFile(root, 'C:\\AUTOEXEC.BAT', Buffer.from(autoexec, 'latin1'));
  const dirs = folders(allTexts);
  placeStub(root, `${options.dosDir}\\MODE.COM`, 'MODE');
  placeStub(root, options.loaderPath, stemOf(options.loaderPath));
  placeStub(root, 'C:\\BIN\\CHOICE.COM', 'CHOICE', true);
  placeStub(root, 'C:\\BIN\\BATRUN.COM', 'BATRUN');
  writeDosFile(root, 'C:\\PICK.TXT', options.pick ?? '');
  for (const text of allTexts) {
    for (const { program } of programsNamed(text)) {
      if (program.includes('%') || /^choice$/i.test(program) || /\\CHOICE\.COM$/i.test(program)) continue;
      const stem = stemOf(program);
      const batch = /\.bat$/i.test(program);
      const targets = program.includes('\\') ? [program] : stem === 'MODE' ? [] : dirs.map((d) => `${d}\\${program}`);
      for (const target of targets) {
        if (batch) writeDosFile(root, target, `C:\\BIN\\BATRUN.COM ${stem}\r\n`);
        else placeStub(root, /\.[A-Za-z]{1,3}$/.test(target.split('\\').pop()!) ? target : `${target}.COM`, stem);
      }
    }
  }
  return root;
}

/** The (stem, args) entries our block's lines log when they run, in order. */
export function blockEntries(after: string): { program: string; args: string }[] {
  const lines = batchLines(after);
  const start = lines.findIndex((l) => /REM --- Bootwright network block start/i.test(l));
  const end = lines.findIndex((l) => /REM --- Bootwright network block end/i.test(l));
  const out: { program: string; args: string }[] = [];
  for (const raw of lines.slice(start + 1, end)) {
    const c = parseCmd(raw);
    if (c.t === 'run') out.push({ program: stemOf(c.program), args: c.args });
    if (c.t === 'call') out.push({ program: 'BATRUN', args: stemOf(c.target) });
  }
  return out;
}

/** The entry a program line logs (a batch target logs BATRUN with its stem). */
export function entryOf(raw: string): { program: string; args: string } | null {
  let c = parseCmd(raw);
  if (c.t === 'cond') c = c.inner;
  if (c.t === 'run') return c.batch ? { program: 'BATRUN', args: stemOf(c.program) } : { program: stemOf(c.program), args: c.args };
  if (c.t === 'call') return { program: 'BATRUN', args: stemOf(c.target) };
  return null;
}
