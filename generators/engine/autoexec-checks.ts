/**
 * Checks about the lines already in AUTOEXEC.BAT: over-long lines (REFERENCES 2.10), odd line ends (2.13),
 * `;`/`*` used as comments (2.6), `@` and CALL before 3.3 (2.1, 2.2), names that break 8.3 rules or are
 * devices (5.2-5.5), GOTO to a missing label (2.8), GOTO %CONFIG% without a label for every menu block (2.23).
 */
import { innermost } from './batch-syntax';
import { lineCheck, type Check } from './check';
import type { DosFeatures } from './dos-version';
import { pathProblems } from './dos-path';
import type { FlowGraph } from './flow';
import type { BatchLine } from './model';
import { programOf } from './programs';

const F = 'AUTOEXEC.BAT';
/** COMMAND.COM's batch line buffer holds 127 characters (REFERENCES 2.10 [M4C] COMEQU.ASM COMBUFLEN). */
export const BATCH_LINE_LIMIT = 127;

export type FileCheckInput = {
  lines: readonly BatchLine[];
  graph: FlowGraph;
  reach: readonly boolean[];
  features: DosFeatures;
  dosKnown: boolean;
  configKnown: boolean;
};

export function autoexecFileChecks(input: FileCheckInput): Check[] {
  return [...perLineChecks(input), ...lineEndChecks(input.lines), ...labelChecks(input)];
}

function perLineChecks({ lines, reach, features, dosKnown }: FileCheckInput): Check[] {
  const out: Check[] = [];
  let homeMade = 0;
  lines.forEach((line, i) => {
    const no = line.index + 1;
    const s = line.stmt;
    if (s.kind === 'comment' && s.style === 'home-made' && homeMade++ === 0) {
      out.push(lineCheck('home-made-comment', 'note', F, no, `Line ${no} starts with "${line.text.trim()[0]}", which DOS does not read as a comment; it tries to run the line. Use REM.`));
    }
    const runsSomething = s.kind !== 'blank' && s.kind !== 'comment' && s.kind !== 'label';
    if (runsSomething && line.text.length > BATCH_LINE_LIMIT) {
      out.push(lineCheck('long-line', 'warning', F, no, `Line ${no} has ${line.text.length} characters; DOS reads only the first ${BATCH_LINE_LIMIT} and drops the rest.`));
    }
    if (dosKnown && line.atSign && !features.atSign) {
      out.push(lineCheck('at-before-33', 'warning', F, no, `Line ${no} starts with "@", which this DOS (before 3.3) does not know; the line fails.`));
    }
    if (dosKnown && innermost(s).kind === 'call' && !features.call) {
      out.push(lineCheck('call-before-33', 'warning', F, no, `Line ${no} uses CALL, which DOS before 3.3 does not have.`));
    }
    const p = reach[i] ? programOf(line) : null;
    if (p && !p.program.includes('%')) {
      for (const problem of pathProblems(p.program)) {
        const slug = problem.problem === 'reserved-device' ? 'name-reserved' : 'name-not-83';
        out.push(lineCheck(slug, 'warning', F, no, `Line ${no}: "${problem.part}": ${problem.reason}`));
      }
    }
  });
  return out;
}

function lineEndChecks(lines: readonly BatchLine[]): Check[] {
  const odd = lines.filter((l) => l.eol === '\n' || l.eol === '\r');
  if (odd.length === 0) return [];
  const first = odd[0];
  const kind = first.eol === '\n' ? 'LF' : 'CR';
  // [M4C] TBATCH.ASM: COMMAND reads to CR and eats one more byte (REFERENCES 2.13).
  return [
    lineCheck(
      'odd-line-end',
      'warning',
      F,
      first.index + 1,
      `${odd.length} line(s) end in ${kind} alone (first: line ${first.index + 1}); DOS expects CR LF and may run such lines together or lose characters. Lines we write use CR LF.`,
    ),
  ];
}

function labelChecks({ lines, graph, reach, configKnown }: FileCheckInput): Check[] {
  const out: Check[] = [];
  for (const m of graph.missingLabels) {
    if (!reach[m.line]) continue;
    const no = lines[m.line].index + 1;
    const dynamic = innermost(lines[m.line].stmt);
    if (dynamic.kind === 'goto' && dynamic.dynamic) {
      out.push(lineCheck('goto-config-missing', 'warning', F, no, `Line ${no}: the startup menu has a choice "${m.label}" with no label here; for that choice the batch file stops at this line.`));
    } else {
      out.push(lineCheck('label-missing', 'warning', F, no, `Line ${no}: GOTO ${m.label} has no matching label; DOS stops the batch file there ("Label not found").`));
    }
  }
  if (!configKnown) {
    const i = lines.findIndex((l, k) => reach[k] && innermost(l.stmt).kind === 'goto' && (innermost(l.stmt) as { dynamic: boolean }).dynamic);
    if (i >= 0) {
      const no = lines[i].index + 1;
      out.push(lineCheck('goto-config-unknown', 'note', F, no, `Line ${no} jumps to a label named by a variable; without the CONFIG.SYS menu every label (or none) is assumed.`));
    }
  }
  return out;
}
