/**
 * The lossless models of AUTOEXEC.BAT and CONFIG.SYS: every line keeps its raw text and terminator, and
 * printing is concatenation (STYLE.md "The engine").
 */
import type { BatchSyntax } from './batch-syntax';
import type { ConfigSyntax } from './config-syntax';
import type { RawLine } from './lines';

export type BatchLine = RawLine & BatchSyntax;
export type ConfigLine = RawLine & ConfigSyntax & { section: string | null };

export type BatchModel = {
  kind: 'batch';
  /** The decoded file, one character per byte. */
  source: string;
  lines: BatchLine[];
  /** The Ctrl-Z and whatever follows it ('' when there is none). */
  tail: string;
};

export type ConfigModel = {
  kind: 'config';
  source: string;
  lines: ConfigLine[];
  tail: string;
};

export type TextModel = BatchModel | ConfigModel;
