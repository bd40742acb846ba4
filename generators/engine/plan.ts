/**
 * One plan for one PC: validates the profile, plans both startup files, applies the edits, and derives the
 * patched bytes, diffs, boot preview, checks and hashes. Never throws on user input.
 */
import { decodeCp437, encodeCp437 } from '../dos/cp437';
import { planAutoexec, type AutoexecOutcome } from './autoexec-plan';
import { hasError, lineCheck, profileCheck, type Check, type StartupFileName } from './check';
import { configFacts } from './config-facts';
import { kitNeedsConfig, planConfig, type ConfigOutcome } from './config-plan';
import { editsDiff } from './diff';
import { dosFeatures, parseDosVersion } from './dos-version';
import { applyEdits, newLineOf } from './edits';
import { buildFlow, reachable } from './flow';
import { sha256Hex } from './hash';
import { binaryReason } from './lines';
import type { BatchModel } from './model';
import { parseBatchText, parseConfigText } from './parse';
import { parseProfile, type Profile } from './profile';
import { checkProfile } from './profile-checks';
import { bootSteps, type BootStep } from './programs';
import type { Change, FileResult, PendingChange, PlanInput, PlanResult } from './types';

/** Larger startup files are refused: DOS startup files are a few KB, and planning time grows with size. */
export const MAX_FILE_BYTES = 256 * 1024;

/** Plans the edits for one PC. */
export function plan(input: PlanInput): PlanResult {
  const parsed = parseProfile(input.profile);
  if (!parsed.ok) return refused(input, [profileCheck('profile-invalid', 'error', `The profile is not valid: ${parsed.error}`)]);
  const autoText = input.autoexec && input.autoexec.length <= MAX_FILE_BYTES ? decodeCp437(input.autoexec) : null;
  const configText = input.config && input.config.length <= MAX_FILE_BYTES ? decodeCp437(input.config) : null;
  const unusable = [...fileProblems('AUTOEXEC.BAT', input.autoexec, autoText), ...fileProblems('CONFIG.SYS', input.config, configText)];
  if (unusable.length > 0) return refused(input, unusable);
  return planValid(parsed.profile, input, autoText, configText);
}

/** Checks that make a file unusable: not text, or too large. */
function fileProblems(name: StartupFileName, bytes: Uint8Array | null, text: string | null): Check[] {
  if (!bytes) return [];
  if (bytes.length > MAX_FILE_BYTES || text === null) {
    return [lineCheck('file-too-large', 'error', name, null, `${name} has ${bytes.length} bytes; a startup file over ${MAX_FILE_BYTES / 1024} KB is not planned.`)];
  }
  const reason = binaryReason(text);
  return reason ? [lineCheck('not-text', 'error', name, null, `${name} cannot be edited: ${reason}.`)] : [];
}

function planValid(profile: Profile, input: PlanInput, autoText: string | null, configText: string | null): PlanResult {
  const dos = parseDosVersion(profile.dos);
  const features = dosFeatures(dos);
  const configModel = configText === null ? null : parseConfigText(configText);
  const facts = configFacts(configModel);
  const auto = planAutoexec(autoText, { profile, dos, features, upperMemory: facts.upperMemory, configGiven: configModel !== null, configChoices: facts.choices });
  const conf: ConfigOutcome = planConfig(configModel, profile, features);
  const autoFile = fileResult('AUTOEXEC.BAT', input.autoexec, autoText, auto.changes);
  const needConfig = input.config !== null || kitNeedsConfig(profile);
  const confFile = needConfig ? fileResult('CONFIG.SYS', input.config, configText, conf.changes) : null;
  const checks = [...profileChecksOf(profile), ...auto.checks, ...conf.checks];
  return assemble(input, auto, autoFile, confFile, [...changesOf('AUTOEXEC.BAT', autoText, auto.changes), ...changesOf('CONFIG.SYS', configText, conf.changes)], checks, autoText);
}

// A validated profile is frozen, so its checks never change: compute them once per profile.
const profileChecksCache = new WeakMap<Profile, Check[]>();

function profileChecksOf(profile: Profile): Check[] {
  let checks = profileChecksCache.get(profile);
  if (!checks) {
    checks = checkProfile(profile);
    profileChecksCache.set(profile, checks);
  }
  return checks.map((c) => ({ ...c }));
}

function fileResult(name: StartupFileName, before: Uint8Array | null, beforeText: string | null, changes: PendingChange[]): FileResult {
  const edits = changes.map((c) => c.edit);
  const afterText = applyEdits(beforeText ?? '', edits);
  const changed = beforeText === null || afterText !== beforeText;
  const after = changed ? encodeCp437(afterText) : before!;
  return { name, before, after, beforeText, afterText, changed, diff: changed ? editsDiff(name, beforeText, edits) : '' };
}

function changesOf(file: StartupFileName, source: string | null, pending: PendingChange[]): Change[] {
  const edits = pending.map((c) => c.edit);
  return pending
    .map((c) => ({ file, kind: c.kind, line: newLineOf(source ?? '', edits, c.edit), lines: c.lines, reason: c.reason }))
    .sort((a, b) => a.line - b.line);
}

function bootOf(text: string | null, parsed: BatchModel | null = null): BootStep[] {
  if (text === null) return [];
  const model: BatchModel = parsed ?? parseBatchText(text);
  const reach = reachable(buildFlow(model.lines, { finalIndex: null, configChoices: null }));
  return bootSteps(model.lines, reach, (i) => i + 1);
}

function assemble(
  input: PlanInput,
  auto: AutoexecOutcome,
  autoFile: FileResult,
  confFile: FileResult | null,
  changes: Change[],
  checks: Check[],
  autoText: string | null,
): PlanResult {
  const autoIn = input.autoexec ? sha256Hex(input.autoexec) : null;
  const autoOut = autoFile.changed || autoIn === null ? sha256Hex(autoFile.after) : autoIn;
  const configIn = input.config ? sha256Hex(input.config) : null;
  return {
    ok: !hasError(checks),
    changed: autoFile.changed || (confFile?.changed ?? false),
    insertedAt: auto.insertedAt,
    finalProgram: auto.finalProgram,
    candidates: auto.candidates,
    files: { autoexec: autoFile, config: confFile },
    diff: autoFile.diff + (confFile?.diff ?? ''),
    changes,
    checks,
    boot: { before: bootOf(autoText, auto.model), after: bootOf(autoFile.afterText) },
    sha256: {
      input: autoIn ?? sha256Hex(new Uint8Array(0)),
      output: autoOut,
      autoexecIn: autoIn,
      autoexecOut: autoOut,
      configIn: configIn,
      configOut: confFile ? (confFile.changed || configIn === null ? sha256Hex(confFile.after) : configIn) : null,
    },
  };
}

/** A plan that changes nothing, for unusable input: the error checks say why. */
function refused(input: PlanInput, checks: Check[]): PlanResult {
  const autoBytes = input.autoexec ?? new Uint8Array(0);
  const text = (b: Uint8Array | null) => (b ? decodeCp437(b) : null);
  const same = (name: StartupFileName, b: Uint8Array | null): FileResult => ({
    name, before: b, after: b ?? new Uint8Array(0), beforeText: text(b), afterText: text(b) ?? '', changed: false, diff: '',
  });
  const hash = sha256Hex(autoBytes);
  return {
    ok: false, changed: false, insertedAt: null, finalProgram: null, candidates: [],
    files: { autoexec: same('AUTOEXEC.BAT', input.autoexec), config: input.config ? same('CONFIG.SYS', input.config) : null },
    diff: '', changes: [], checks, boot: { before: [], after: [] },
    sha256: { input: hash, output: hash, autoexecIn: input.autoexec ? hash : null, autoexecOut: hash, configIn: input.config ? sha256Hex(input.config) : null, configOut: input.config ? sha256Hex(input.config) : null },
  };
}
