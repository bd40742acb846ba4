/**
 * The AUTOEXEC.BAT half of a plan: find the final program and the insertion point, build our block in the
 * station's DOS syntax, turn conflicting old lines into REM lines, and collect the checks.
 */
import { autoexecFileChecks, BATCH_LINE_LIMIT } from './autoexec-checks';
import { lineCheck, type Check } from './check';
import { findConflicts } from './conflicts';
import { validCuts } from './cuts';
import { echoTransfer, holdsBefore, mustHold, pathTransfer } from './dataflow';
import { formatDosVersion, type DosFeatures } from './dos-version';
import { stemOf } from './dos-path';
import { buildFlow, reachable, type FlowGraph } from './flow';
import { batchOffPrefix, BLOCK_END, BLOCK_START, findBlock, isBlockEnd, isBlockStart, type BlockSpan } from './markers';
import type { BatchLine, BatchModel } from './model';
import { loaderCommand, modeCommand, redirectCommand, serialSetupCommand, useLoadHigh } from './commands';
import { parseBatchText } from './parse';
import { candidateIndexes, detectFinal, programOf, type Candidate } from './programs';
import type { Profile } from './profile';
import type { FinalProgram, PendingChange } from './types';

const F = 'AUTOEXEC.BAT';

export type AutoexecContext = {
  profile: Profile;
  dos: number | null;
  features: DosFeatures;
  /** CONFIG.SYS provides upper memory (DOS=UMB). */
  upperMemory: boolean;
  configGiven: boolean;
  configChoices: string[] | null;
};

export type AutoexecOutcome = {
  changes: PendingChange[];
  checks: Check[];
  insertedAt: number | null;
  finalProgram: FinalProgram | null;
  candidates: Candidate[];
  /** The parsed input, when there was one. */
  model: BatchModel | null;
};

/** Plans the edits to `source` (null or '' when the PC has no AUTOEXEC.BAT or an empty one). */
export function planAutoexec(source: string | null, ctx: AutoexecContext): AutoexecOutcome {
  if (source === null || source === '') return createAutoexec(source, ctx);
  const model = parseBatchText(source);
  const search = findBlock(model.lines.map((l) => l.text), isBlockStart, isBlockEnd);
  if (search.found === 'broken') {
    const check = lineCheck('block-broken', 'error', F, search.line + 1, `Our block cannot be rewritten safely: ${search.reason}. Fix the marker lines by hand.`);
    return { changes: [], checks: [check], insertedAt: null, finalProgram: null, candidates: [], model };
  }
  const span = search.found ? search.span : null;
  const view = span ? model.lines.filter((_, i) => i < span.start || i > span.end) : model.lines;
  return { ...planOnView(model.lines, view, span, source.length - model.tail.length, ctx), model };
}

type Analysis = {
  /** The final program ends the boot here. */
  graph: FlowGraph;
  /** The final program returns (what a GOTO menu loop does). */
  open: FlowGraph;
  reach: boolean[];
  final: number | null;
  finalChecks: Check[];
  candidates: number[];
};

function analyse(view: readonly BatchLine[], ctx: AutoexecContext): Analysis {
  const loaderStem = stemOf(ctx.profile.loader.path);
  const open = buildFlow(view, { finalIndex: null, configChoices: ctx.configChoices });
  const candidates = candidateIndexes(view, reachable(open), loaderStem);
  const { final, checks } = chooseFinal(view, candidates, ctx.profile.finalProgram);
  const graph = buildFlow(view, { finalIndex: final, configChoices: ctx.configChoices });
  return { graph, open, reach: reachable(graph), final, finalChecks: checks, candidates };
}

function chooseFinal(view: readonly BatchLine[], candidates: number[], wanted: Profile['finalProgram']): { final: number | null; checks: Check[] } {
  if (wanted === 'none') return { final: null, checks: [] };
  if (typeof wanted === 'number') {
    const i = view.findIndex((l) => l.index + 1 === wanted);
    if (i >= 0 && candidates.includes(i)) return { final: i, checks: [] };
    const msg = `Line ${wanted} is not a program line that a boot path reaches, so it cannot be the final program. Pick one of the listed candidates.`;
    return { final: null, checks: [lineCheck('final-program-invalid', 'error', F, wanted, msg)] };
  }
  const final = detectFinal(view, candidates);
  if (final === null) {
    return { final, checks: [lineCheck('no-final-program', 'note', F, null, 'No program that may never return was found; the block goes after the last setup line. Confirm or pick one.')] };
  }
  const no = view[final].index + 1;
  const msg = `Line ${no} (${programOf(view[final])!.program}) looks like the program that may not return; the block goes before it on every boot path. Confirm it or pick another.`;
  return { final, checks: [lineCheck('final-program-detected', 'note', F, no, msg)] };
}

/** The latest valid position, moved back over blank lines so the block sits with the commands. */
function choosePosition(view: readonly BatchLine[], valid: boolean[], kept: number | null): number {
  if (kept !== null && valid[kept]) return kept;
  let p = valid.lastIndexOf(true);
  while (p > 0 && valid[p - 1] && view[p - 1].stmt.kind === 'blank') p--;
  return p;
}

function planOnView(all: readonly BatchLine[], view: readonly BatchLine[], span: BlockSpan | null, bodyEnd: number, ctx: AutoexecContext): Omit<AutoexecOutcome, 'model'> {
  const a = analyse(view, ctx);
  const valid = validCuts(a.graph, a.open);
  const kept = span ? span.start : null;
  const p = choosePosition(view, valid, kept);
  const checks: Check[] = [...a.finalChecks];
  const { lines: block, notes } = blockLines(view, a.open, p, ctx);
  checks.push(...notes);
  const insertedAt = p === kept ? span!.start + 1 : p < view.length ? view[p].index + 1 : all.length + 1;
  for (const line of block) {
    if (line.length > BATCH_LINE_LIMIT) {
      checks.push(lineCheck('line-too-long', 'error', F, insertedAt, `A line our block would write has ${line.length} characters; DOS reads only ${BATCH_LINE_LIMIT}. Shorten the resident program path or options.`));
    }
  }
  const changes = blockChanges(all, view, span, p, bodyEnd, block, ctx, checks);
  const serialArgs = serialSetupCommand(ctx.profile, ctx.features, 'MODE').slice(5);
  for (const c of findConflicts({ lines: view, profile: ctx.profile, position: p, ourSerialArgs: serialArgs, reach: a.reach })) {
    const line = view[c.index];
    checks.push(lineCheck(c.slug, c.severity, F, line.index + 1, c.message));
    if (!a.reach[c.index] && c.slug.startsWith('loader')) {
      checks.push(lineCheck('loader-unreachable', 'warning', F, line.index + 1, `Line ${line.index + 1} loads the resident program, but no boot path reaches it.`));
    }
    const prefix = batchOffPrefix(line.text, ctx.features.atSign);
    changes.push({ edit: { offset: line.offset, length: 0, text: prefix }, kind: 'comment-out', lines: [prefix + line.text], reason: c.message });
  }
  checks.push(...autoexecFileChecks({ lines: view, graph: a.graph, reach: a.reach, features: ctx.features, dosKnown: ctx.dos !== null, configKnown: ctx.configChoices !== null }));
  const candidates = a.candidates.map((i) => ({ line: view[i].index + 1, program: programOf(view[i])!.program, text: view[i].text }));
  const finalProgram = a.final === null ? null : { line: view[a.final].index + 1, program: programOf(view[a.final])!.program, detected: ctx.profile.finalProgram === 'auto' };
  return { changes, checks, insertedAt, finalProgram, candidates };
}

/** Our block's lines for position p, with the notes that explain how they were written. */
function blockLines(view: readonly BatchLine[], graph: FlowGraph, p: number, ctx: AutoexecContext): { lines: string[]; notes: Check[] } {
  const { profile, features } = ctx;
  const notes: Check[] = [];
  const pathOk = holdsBefore(mustHold(graph, view, pathTransfer(profile.dosDir, profile.bootDrive), false), p, false);
  const mode = modeCommand(profile.dosDir, pathOk);
  if (!pathOk) {
    notes.push(lineCheck('mode-full-path', 'note', F, null, `PATH does not hold ${profile.dosDir} on every path to the block, so MODE is written with its full path.`));
  }
  if (!features.atSign && !holdsBefore(mustHold(graph, view, echoTransfer(features.atSign), false), p, false)) {
    notes.push(lineCheck('echo-visible', 'note', F, null, 'This DOS has no "@" (before 3.3) and ECHO is not off before the block, so its lines show on screen at boot.'));
  }
  if (features.loadHigh && profile.loadHigh === 'auto' && !useLoadHigh(profile, features, ctx.upperMemory)) {
    const why = ctx.configGiven ? 'CONFIG.SYS has no DOS=UMB' : 'No CONFIG.SYS was given, so no DOS=UMB is known';
    notes.push(lineCheck('loadhigh-unavailable', 'note', 'CONFIG.SYS', null, `${why}; the resident program loads into conventional memory (no LH).`));
  }
  const at = features.atSign ? '@' : '';
  const commands = [serialSetupCommand(profile, features, mode), redirectCommand(profile, mode), loaderCommand(profile, features, ctx.upperMemory)];
  const lines = [BLOCK_START, ...commands.filter((c): c is string => c !== null), BLOCK_END].map((l) => at + l);
  return { lines, notes };
}

function blockReason(ctx: AutoexecContext): string {
  const { network, redirect } = ctx.profile;
  const parts = [`sets ${network.port} up for the network adapter`];
  if (redirect) parts.push(`sends ${redirect.from} printing to ${redirect.to}`);
  parts.push('starts the resident program');
  return `Our block ${parts.join(', ')}, in DOS ${ctx.dos === null ? '(unknown)' : formatDosVersion(ctx.dos)} syntax, where every boot path passes once.`;
}

function blockChanges(
  all: readonly BatchLine[],
  view: readonly BatchLine[],
  span: BlockSpan | null,
  p: number,
  bodyEnd: number,
  block: string[],
  ctx: AutoexecContext,
  checks: Check[],
): PendingChange[] {
  const text = block.map((l) => `${l}\r\n`).join('');
  const reason = blockReason(ctx);
  const out: PendingChange[] = [];
  if (span) {
    const start = all[span.start].offset;
    const endLine = all[span.end];
    const length = endLine.offset + endLine.text.length + endLine.eol.length - start;
    const old = all.slice(span.start, span.end + 1).map((l) => l.text + l.eol).join('');
    if (p === span.start) {
      if (old !== text) {
        checks.push(lineCheck('block-rewritten', 'note', F, span.start + 1, 'Our block is rewritten to match the profile (it differed from what the profile gives now).'));
        out.push({ edit: { offset: start, length, text }, kind: 'replace-block', lines: block, reason });
      }
      return out;
    }
    checks.push(lineCheck('block-moved', 'note', F, span.start + 1, 'Our block was where not every boot path passes it exactly once; it is moved.'));
    out.push({ edit: { offset: start, length, text: '' }, kind: 'replace-block', lines: [], reason: 'Our old block is removed here; it moves to where every boot path passes once.' });
  }
  const offset = p < view.length ? view[p].offset : bodyEnd;
  let lead = '';
  const last = all[all.length - 1];
  if (p >= view.length && last && last.eol === '' && last.offset + last.text.length === bodyEnd && !(span && span.end === all.length - 1)) {
    lead = '\r\n';
    checks.push(lineCheck('line-end-added', 'note', F, last.index + 1, `The last line had no line end; CR LF is added so our block can follow it.`));
  }
  out.push({ edit: { offset, length: 0, text: lead + text }, kind: 'insert-block', lines: block, reason });
  return out;
}

/** A PC without AUTOEXEC.BAT (or with an empty one) gets a new file holding only our block. */
function createAutoexec(source: string | null, ctx: AutoexecContext): AutoexecOutcome {
  const { lines: block, notes } = blockLines([], buildFlow([], { finalIndex: null, configChoices: null }), 0, ctx);
  // [M4C] INIT.ASM: without AUTOEXEC.BAT COMMAND asks for date and time (REFERENCES 2.18); with one it does not.
  const check =
    source === null
      ? lineCheck('no-autoexec', 'note', F, null, 'This PC has no AUTOEXEC.BAT; a new one is created with only our block. DOS will no longer ask for date and time at boot.')
      : lineCheck('empty-autoexec', 'note', F, null, 'AUTOEXEC.BAT is empty; our block becomes its only content.');
  const checks = [check, ...notes];
  for (const line of block) {
    if (line.length > BATCH_LINE_LIMIT) checks.push(lineCheck('line-too-long', 'error', F, 1, `A line our block would write has ${line.length} characters; DOS reads only ${BATCH_LINE_LIMIT}.`));
  }
  const text = block.map((l) => `${l}\r\n`).join('');
  return {
    changes: [{ edit: { offset: 0, length: 0, text }, kind: 'insert-block', lines: block, reason: blockReason(ctx) }],
    checks,
    insertedAt: 1,
    finalProgram: null,
    candidates: [],
    model: null,
  };
}
