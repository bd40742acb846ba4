/** The shapes plan() returns (the public API other parts of Bootwright code against). */
import type { Check, StartupFileName } from './check';
import type { Edit } from './edits';
import type { BootStep, Candidate } from './programs';
import type { Profile } from './profile';

export type { BootStep, Candidate };

export type ChangeKind = 'insert-block' | 'comment-out' | 'replace-block' | 'add-line' | 'raise-value';

export type Change = {
  file: StartupFileName;
  kind: ChangeKind;
  /** 1-based line in the new file where the change starts. */
  line: number;
  lines: string[];
  /** Plain words, shown to the lead. */
  reason: string;
};

/** A change still tied to its edit, before line numbers in the new file are known. */
export type PendingChange = { edit: Edit; kind: ChangeKind; lines: string[]; reason: string };

export type FileResult = {
  name: StartupFileName;
  before: Uint8Array | null;
  after: Uint8Array;
  beforeText: string | null;
  /** Decoded code page 437, for display. */
  afterText: string;
  changed: boolean;
  diff: string;
};

export type FinalProgram = { line: number; program: string; detected: boolean };

export type PlanResult = {
  /** No check is an error. */
  ok: boolean;
  changed: boolean;
  /** 1-based line of the original AUTOEXEC.BAT the block goes before (length + 1 = at the end). */
  insertedAt: number | null;
  finalProgram: FinalProgram | null;
  /** External-program lines the technician can pick as the final program. */
  candidates: Candidate[];
  files: { autoexec: FileResult; config: FileResult | null };
  /** Both files' unified diffs, concatenated, with a/ and b/ names. */
  diff: string;
  changes: Change[];
  checks: Check[];
  boot: { before: BootStep[]; after: BootStep[] };
  sha256: {
    input: string;
    output: string;
    autoexecIn: string | null;
    autoexecOut: string;
    configIn: string | null;
    configOut: string | null;
  };
};

export type PlanInput = { profile: Profile; autoexec: Uint8Array | null; config: Uint8Array | null };
