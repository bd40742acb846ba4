/**
 * Bootwright's startup-file engine: the public entry points. The browser imports only ./profile and
 * ./profile-checks; this facade pulls in iconv-lite and node:crypto.
 */
import { plan as planImpl } from './plan';
import { parseBatch as parseBatchImpl, parseConfig as parseConfigImpl, printModel as printModelImpl } from './parse';
import type { BatchModel, ConfigModel, TextModel } from './model';
import type { PlanInput, PlanResult } from './types';

export { profileSchema, parseProfile, BAUD_RATES, ATTACHED } from './profile';
export type { Profile, ProfileInput, PortEntry, Attached } from './profile';
export { checkProfile } from './profile-checks';
export type { Check, Severity, StartupFileName } from './check';
export type { BatchModel, ConfigModel, TextModel, BatchLine, ConfigLine } from './model';
export type { Statement } from './batch-syntax';
export type { ConfigStatement } from './config-syntax';
export type { PlanInput, PlanResult, FileResult, BootStep, Candidate, Change, ChangeKind, FinalProgram } from './types';
export { MAX_FILE_BYTES } from './plan';
export { BLOCK_START, BLOCK_END, CONFIG_START, CONFIG_END } from './markers';

/**
 * Computes the plan for one PC: the patched AUTOEXEC.BAT (and CONFIG.SYS when given or needed), unified
 * diffs, the list of changes with reasons, the checks, the boot preview before and after, the insertion point
 * and SHA-256 hashes. `autoexec` null means the PC has none. Never throws on user input: a bad profile or an
 * unusable file gives a plan with `ok: false`, no changes and error checks saying why.
 */
export function plan(input: PlanInput): PlanResult {
  return planImpl(input);
}

/** Reads batch-file bytes (code page 437) into a lossless model: each line with its text, terminator and kind. */
export function parseBatch(bytes: Uint8Array): BatchModel {
  return parseBatchImpl(bytes);
}

/** Reads CONFIG.SYS bytes into a lossless model: directives, menu blocks, comments, prompts. */
export function parseConfig(bytes: Uint8Array): ConfigModel {
  return parseConfigImpl(bytes);
}

/** Prints a model back to bytes; for a model straight from parseBatch/parseConfig these are the input bytes. */
export function printModel(model: TextModel): Uint8Array {
  return printModelImpl(model);
}
