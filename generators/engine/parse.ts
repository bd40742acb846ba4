/**
 * Bytes to lossless models and back. Parsing never throws: any byte sequence gives a model whose printout
 * is the same bytes.
 */
import { decodeCp437, encodeCp437 } from '../dos/cp437';
import { readBatchLine, type BatchSyntax } from './batch-syntax';
import { readConfigLine } from './config-syntax';
import { joinLines, splitLines } from './lines';
import type { BatchLine, BatchModel, ConfigLine, ConfigModel, TextModel } from './model';

// Startup files share most of their lines ("@ECHO OFF", "PATH C:\\DOS"); classifying each distinct line
// once keeps planning fast. Statements are never changed after classification, so sharing them is safe.
const batchMemo = new Map<string, BatchSyntax>();
const MEMO_LIMIT = 20_000;

function classifyBatch(text: string): BatchSyntax {
  let syntax = batchMemo.get(text);
  if (syntax === undefined) {
    syntax = readBatchLine(text);
    if (text.length <= 200) {
      if (batchMemo.size >= MEMO_LIMIT) batchMemo.clear();
      batchMemo.set(text, syntax);
    }
  }
  return syntax;
}

/** Reads AUTOEXEC.BAT (or any batch file) bytes into a model. */
export function parseBatch(bytes: Uint8Array): BatchModel {
  return parseBatchText(decodeCp437(bytes));
}

/** Same as parseBatch over already decoded text. */
export function parseBatchText(source: string): BatchModel {
  const { lines, tail } = splitLines(source);
  const out: BatchLine[] = new Array(lines.length);
  for (let i = 0; i < lines.length; i++) {
    const l = lines[i];
    const syntax = classifyBatch(l.text);
    // Built field by field: object spread here was the slowest step of a plan.
    out[i] = { index: l.index, offset: l.offset, text: l.text, eol: l.eol, prefix: syntax.prefix, atSign: syntax.atSign, stmt: syntax.stmt };
  }
  return { kind: 'batch', source, tail, lines: out };
}

/** Reads CONFIG.SYS bytes into a model; each line knows the `[block]` it sits in (null before the first). */
export function parseConfig(bytes: Uint8Array): ConfigModel {
  return parseConfigText(decodeCp437(bytes));
}

export function parseConfigText(source: string): ConfigModel {
  const { lines, tail } = splitLines(source);
  let section: string | null = null;
  const out: ConfigLine[] = lines.map((l) => {
    const syntax = readConfigLine(l.text);
    if (syntax.stmt.kind === 'block') section = syntax.stmt.name;
    return { index: l.index, offset: l.offset, text: l.text, eol: l.eol, stmt: syntax.stmt, section };
  });
  return { kind: 'config', source, tail, lines: out };
}

/** The model's text: lines with their own terminators, then the tail. */
export function printText(model: TextModel): string {
  return joinLines(model.lines, model.tail);
}

/** The model's bytes; for a parsed model these are the input bytes exactly. */
export function printModel(model: TextModel): Uint8Array {
  return encodeCp437(printText(model));
}
