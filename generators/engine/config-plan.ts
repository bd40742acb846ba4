/**
 * The CONFIG.SYS half of a plan: the kit's minimum FILES and BUFFERS (raised in place, REFERENCES 3.3, 3.4)
 * and its own lines (e.g. a DEVICE line, 3.8). From DOS 4.0, where REM is a CONFIG.SYS line (3.2 [M4S]
 * SYSINIT2.ASM COMTAB), added lines sit between our marker lines before the first menu block, so they count
 * for every configuration (3.13); before 4.0 they are plain lines at the end of the file.
 */
import { lineCheck, type Check } from './check';
import type { DosFeatures } from './dos-version';
import { stemOf } from './dos-path';
import { readConfigLine } from './config-syntax';
import { CONFIG_END, CONFIG_START, configOffPrefix, findBlock, isConfigEnd, isConfigStart, type BlockSpan } from './markers';
import type { ConfigLine, ConfigModel } from './model';
import type { Profile } from './profile';
import type { PendingChange } from './types';

const F = 'CONFIG.SYS';

export type ConfigOutcome = { changes: PendingChange[]; checks: Check[] };

type Needs = { files?: number; buffers?: number; lines: string[] };

function needsOf(profile: Profile): Needs {
  const kit = profile.kit;
  return { files: kit?.files, buffers: kit?.buffers, lines: (kit?.configLines ?? []).map((l) => l.trim()).filter((l) => l !== '') };
}

/** True when the kit asks anything of CONFIG.SYS (so a PC without one gets one). */
export function kitNeedsConfig(profile: Profile): boolean {
  const n = needsOf(profile);
  return n.files !== undefined || n.buffers !== undefined || n.lines.length > 0;
}

/** Plans the edits to CONFIG.SYS text (`model` null when the PC has none). */
export function planConfig(model: ConfigModel | null, profile: Profile, features: DosFeatures): ConfigOutcome {
  const needs = needsOf(profile);
  const checks: Check[] = [];
  if (!model || model.lines.length === 0) {
    if (!kitNeedsConfig(profile)) return { changes: [], checks };
    checks.push(lineCheck('no-config', 'note', F, null, 'This PC has no CONFIG.SYS (or an empty one); one is created with the lines the kit needs.'));
    const lines = wrap([...minimumLines(needs, [], []), ...needs.lines], features);
    return { changes: [{ edit: { offset: 0, length: 0, text: crlf(lines) }, kind: 'insert-block', lines, reason: 'The kit needs these CONFIG.SYS lines.' }], checks };
  }
  const search = findBlock(model.lines.map((l) => l.text), isConfigStart, isConfigEnd);
  if (search.found === 'broken') {
    return { changes: [], checks: [lineCheck('config-block-broken', 'error', F, search.line + 1, `Our CONFIG.SYS lines cannot be rewritten safely: ${search.reason}.`)] };
  }
  const span = search.found ? search.span : null;
  const view = span ? model.lines.filter((_, i) => i < span.start || i > span.end) : model.lines;
  const changes: PendingChange[] = [];
  const files = raiseAll(view, 'FILES', needs.files, changes, checks);
  const buffers = raiseAll(view, 'BUFFERS', needs.buffers, changes, checks);
  const kitLines = kitLineChanges(view, needs.lines, features, changes, checks);
  const added = [...minimumLines(needs, files, buffers), ...kitLines];
  changes.push(...placeLines(model, span, added, features, checks));
  return { changes, checks };
}

function crlf(lines: string[]): string {
  return lines.map((l) => `${l}\r\n`).join('');
}

function wrap(lines: string[], features: DosFeatures): string[] {
  if (lines.length === 0) return [];
  return features.configRem ? [CONFIG_START, ...lines, CONFIG_END] : lines;
}

/** FILES=/BUFFERS= lines to add when the file has none at all. */
function minimumLines(needs: Needs, files: ConfigLine[], buffers: ConfigLine[]): string[] {
  const out: string[] = [];
  if (needs.files !== undefined && files.length === 0) out.push(`FILES=${needs.files}`);
  if (needs.buffers !== undefined && buffers.length === 0) out.push(`BUFFERS=${needs.buffers}`);
  return out;
}

/** Raises every `name=` value below `need` in place, keeping the rest of the line; returns all such lines. */
function raiseAll(view: readonly ConfigLine[], name: string, need: number | undefined, changes: PendingChange[], checks: Check[]): ConfigLine[] {
  const found = view.filter((l) => l.stmt.kind === 'directive' && l.stmt.name === name);
  if (need === undefined) return found;
  for (const line of found) {
    if (line.stmt.kind !== 'directive') continue;
    const digits = /^\d+/.exec(line.stmt.value);
    if (!digits || Number(digits[0]) >= need) continue;
    const offset = line.offset + line.stmt.valueAt;
    const newText = line.text.slice(0, line.stmt.valueAt) + String(need) + line.text.slice(line.stmt.valueAt + digits[0].length);
    const reason = `${name} is raised from ${digits[0]} to ${need}, the kit's minimum.`;
    changes.push({ edit: { offset, length: digits[0].length, text: String(need) }, kind: 'raise-value', lines: [newText], reason });
    checks.push(lineCheck(`${name.toLowerCase()}-raised`, 'note', F, line.index + 1, `Line ${line.index + 1}: ${reason}`));
  }
  return found;
}

/** The identity of a CONFIG.SYS line: a driver line is the same line when it loads the same file. */
function identity(text: string): string | null {
  const s = readConfigLine(text).stmt;
  if (s.kind !== 'directive') return null;
  if (/^(DEVICE|DEVICEHIGH|INSTALL|INSTALLHIGH)$/.test(s.name)) {
    const file = s.value.split(/\s+/).find((w) => w !== '' && !w.startsWith('/') && !/^SIZE=/i.test(w)) ?? '';
    return `DRIVER ${stemOf(file)}`;
  }
  return `${s.name} ${s.value.trim().toUpperCase()}`;
}

function normal(text: string): string {
  return text.trim().toUpperCase().replace(/\s+/g, ' ');
}

/** Which kit lines go into our block; older copies are turned off (from 4.0) or left alone (before). */
function kitLineChanges(view: readonly ConfigLine[], wanted: string[], features: DosFeatures, changes: PendingChange[], checks: Check[]): string[] {
  const out: string[] = [];
  for (const want of wanted) {
    const id = identity(want);
    const olds = view.filter((l) => l.stmt.kind === 'directive' && id !== null && identity(l.text) === id);
    let add = true;
    for (const old of olds) {
      const same = normal(old.text) === normal(want);
      const no = old.index + 1;
      if (!features.configRem) {
        add = false;
        if (!same) checks.push(lineCheck('config-line-differs', 'warning', F, no, `Line ${no} differs from the kit's "${want}"; DOS before 4.0 has no REM in CONFIG.SYS, so change it by hand.`));
        continue;
      }
      const reason = same
        ? `Line ${no} is the kit's line; our marked lines hold it now, so this copy is turned into a REM line.`
        : `Line ${no} loads the same driver differently from the kit's "${want}"; it is turned into a REM line.`;
      checks.push(lineCheck(same ? 'config-line-duplicate' : 'config-line-replaced', same ? 'note' : 'warning', F, no, reason));
      const prefix = configOffPrefix();
      changes.push({ edit: { offset: old.offset, length: 0, text: prefix }, kind: 'comment-out', lines: [prefix + old.text], reason });
    }
    if (add) out.push(want);
  }
  return out;
}

/** Inserts (or rewrites) our lines: before the first menu block, or at the end of the file. */
function placeLines(model: ConfigModel, span: BlockSpan | null, added: string[], features: DosFeatures, checks: Check[]): PendingChange[] {
  const lines = wrap(added, features);
  const text = crlf(lines);
  const reason = "The kit's CONFIG.SYS lines, marked so a later run can find them.";
  if (span) {
    const start = model.lines[span.start].offset;
    const end = model.lines[span.end];
    const length = end.offset + end.text.length + end.eol.length - start;
    if (model.source.slice(start, start + length) === text) return [];
    return [{ edit: { offset: start, length, text }, kind: 'replace-block', lines, reason }];
  }
  if (lines.length === 0) return [];
  if (!features.configRem) {
    checks.push(lineCheck('config-no-rem', 'note', F, null, 'DOS before 4.0 has no REM in CONFIG.SYS, so the added lines carry no marker lines.'));
  }
  const header = model.lines.find((l) => l.stmt.kind === 'block');
  if (header && features.configRem) return [{ edit: { offset: header.offset, length: 0, text }, kind: 'insert-block', lines, reason }];
  const bodyEnd = model.source.length - model.tail.length;
  const last = model.lines[model.lines.length - 1];
  const lead = last && last.eol === '' ? '\r\n' : '';
  if (lead) checks.push(lineCheck('line-end-added', 'note', F, last.index + 1, 'The last line had no line end; CR LF is added before the new lines.'));
  const kind = features.configRem ? 'insert-block' : 'add-line';
  return [{ edit: { offset: bodyEnd, length: 0, text: lead + text }, kind, lines, reason }];
}
