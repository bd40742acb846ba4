/**
 * The survey report's lines: 80 columns, only characters code page 437 can print. No Buffer and no
 * iconv-lite here, so the browser's printable page can use it; report.ts encodes the bytes.
 * Readings and lengths print exactly as entered; only computed figures (ohms, sums) are rounded.
 * Deterministic: nothing depends on the clock unless `generatedAt` is given.
 */
import { asEntered, asSum } from './check';
import { cleanSurvey, type CleanSurvey } from './clean-input';
import { RULES_NOTE, SURVEY_CAUTIONS } from './cautions';
import { GAUGES, OHMS_PER_1000_FT } from './gauge';
import { STAR_SPOKE_MAX_FT, overLimit } from './rules';
import { fitWidth, heading, tableHeader, tableRow, wrap, type Column } from './report-format';
import type { PairResult, SurveyInput, SurveyPath, SurveyResult } from './types';

export interface ReportOptions {
  /** Printed as given, e.g. an ISO date; omitted when absent. */
  generatedAt?: string;
}

const STATUS_WORDS: Record<PairResult['status'], string> = {
  'in-use': 'IN USE', free: 'free', fault: 'FAULT', unconfirmed: 'unconfirmed',
};

function ohms(value: number | null): string {
  return value === null ? '?' : `${value.toFixed(2)} Ω`;
}

function volts(value: number | null): string {
  return value === null ? '-' : Number.isFinite(value) ? asEntered(value) : '?';
}

function head(survey: CleanSurvey, opts: ReportOptions): string[] {
  const lines = ['BOOTWRIGHT WIRING SURVEY REPORT', ...wrap(`Site: ${survey.siteName || '(no name)'}`)];
  if (opts.generatedAt) lines.push(...wrap(`Generated: ${opts.generatedAt}`));
  lines.push('='.repeat(80));
  return lines;
}

function cautions(): string[] {
  return [...heading('Caution'), ...SURVEY_CAUTIONS.flatMap((c) => wrap(c, ' * ', '   '))];
}

const PAIR_COLUMNS: Column[] = [
  { header: 'Pair', width: 20 },
  { header: 'V DC', width: 9, align: 'right' },
  { header: 'V AC', width: 9, align: 'right' },
  { header: 'Continuity', width: 10 },
  { header: 'Status', width: 17 },
];

function pairLines(p: PairResult, by: string): string[] {
  const status = STATUS_WORDS[p.status] + (p.current ? '' : ' (retested)');
  const lines = tableRow(PAIR_COLUMNS, [p.pair, volts(p.vdc), volts(p.vac), p.continuity ?? '-', status]);
  if (by !== '') lines.push(...wrap(`tested by ${by}`, '      ', '        '));
  return lines;
}

function jackLines(survey: CleanSurvey, result: SurveyResult): string[] {
  const lines = heading('Jacks and pair readings');
  lines.push(...wrap('Readings in volts, printed as entered; "-" means not measured.'));
  if (survey.networkPair) lines.push(...wrap(`Network pair: ${survey.networkPair}`));
  const tests = new Map(survey.pairTests.map((t) => [t.id, t]));
  if (result.jacks.length === 0) lines.push('  (no jacks recorded)');
  for (const jack of result.jacks) {
    const info = survey.jacks.find((j) => j.id === jack.jackId);
    const extra = [info?.room ? `room ${info.room}` : '', info?.station ? `station ${info.station}` : ''].filter(Boolean);
    lines.push('', ...wrap(`${jack.label || jack.jackId}${extra.length ? ` (${extra.join(', ')})` : ''}`, '', '    '));
    if (jack.pairs.length === 0) {
      lines.push('  (no readings)');
      continue;
    }
    lines.push(...tableHeader(PAIR_COLUMNS));
    for (const p of jack.pairs) {
      const t = tests.get(p.testId);
      lines.push(...pairLines(p, [t?.by, t?.at].filter(Boolean).join(', ')));
    }
  }
  return lines;
}

const RUN_COLUMNS: Column[] = [
  { header: 'Run', width: 12 },
  { header: 'Kind', width: 4 },
  { header: 'Feet', width: 10, align: 'right' },
  { header: 'AWG', width: 3, align: 'right' },
  { header: 'Reverses', width: 8 },
  { header: 'Loop resistance', width: 15, align: 'right' },
];

function runLines(survey: CleanSurvey, result: SurveyResult): string[] {
  const lines = heading('Cable runs');
  if (result.runs.length === 0) return [...lines, '  (no runs recorded)'];
  lines.push(...tableHeader(RUN_COLUMNS));
  for (const r of result.runs) {
    lines.push(...tableRow(RUN_COLUMNS, [
      r.runId, r.kind, r.lengthFt === null ? '?' : asEntered(r.lengthFt), r.gauge === null ? '?' : String(r.gauge),
      r.reverses ? 'yes' : 'no', ohms(r.loopOhms),
    ]));
    lines.push(...wrap(`${labelOrId(survey, r.from)} -> ${labelOrId(survey, r.to)}`, '      ', '        '));
  }
  const rates = GAUGES.map((g) => `${g} AWG ${OHMS_PER_1000_FT[g]} Ω`).join(', ');
  lines.push('', ...wrap(`Wire resistance per 1,000 ft at 20 °C: ${rates} (HyperPhysics wire-gauge table, ` +
    'after Floyd). Loop resistance = 2 x conductor resistance x length.', '  ', '  '));
  return lines;
}

function labelOrId(survey: CleanSurvey, id: string): string {
  const node = survey.nodeById.get(id);
  return node && node.label !== '' ? node.label : id;
}

function pathText(survey: CleanSurvey, p: SurveyPath): string {
  const partial = p.complete ? '' : ' (some runs unknown, counted as 0)';
  return `${labelOrId(survey, p.fromNodeId)} to ${labelOrId(survey, p.toNodeId)}: ${asSum(p.lengthFt)} ft, ` +
    `loop ${ohms(p.loopOhms)}${partial}`;
}

function totalLines(survey: CleanSurvey, result: SurveyResult): string[] {
  const t = result.totals;
  const lines = heading('Totals');
  lines.push(...wrap(`Wire in all: ${asSum(t.lengthFt)} ft in ${t.runsCounted} run(s)` +
    (t.runsSkipped ? `; ${t.runsSkipped} run(s) with an unusable length left out` : ''), '  ', '    '));
  lines.push(...wrap(`By gauge: ${GAUGES.map((g) => `${g} AWG ${asSum(t.byGauge[g])} ft`).join('; ')}`, '  ', '    '));
  lines.push(...wrap(`Wall wiring ${asSum(t.wallFt)} ft; cords ${asSum(t.cordFt)} ft`, '  ', '    '));
  if (result.endToEnd) lines.push(...wrap(`End to end, ${pathText(survey, result.endToEnd)}`, '  ', '    '));
  return lines;
}

function polarityLine(result: SurveyResult): string {
  const odd = result.adapterPaths.filter((p) => !p.even).length;
  const all = result.adapterPaths.length;
  if (all === 0) return 'Polarity: fewer than two joined adapters, nothing to compare.';
  return odd === 0
    ? `Polarity: all ${all} adapter pair(s) see an even number of reversals.`
    : `Polarity: ${odd} of ${all} adapter pair(s) see an odd number of reversals (see the checks).`;
}

function layoutLines(survey: CleanSurvey, result: SurveyResult): string[] {
  const lines = heading('Layout');
  const centre = result.centreNodeId === null ? '' : `, seen from ${labelOrId(survey, result.centreNodeId)}`;
  lines.push(...wrap(`Shape: ${result.layout}${centre}`, '  ', '    '));
  for (const s of result.spokes) {
    const over = overLimit(s.farthest.lengthFt, STAR_SPOKE_MAX_FT) ? ` - OVER ${STAR_SPOKE_MAX_FT} FT` : '';
    const far = s.farthest;
    lines.push(...wrap(`Spoke ${s.firstRunId}: ${asSum(far.lengthFt)} ft to ${labelOrId(survey, far.toNodeId)}, ` +
      `loop ${ohms(far.loopOhms)}${far.complete ? '' : ' (some runs unknown)'}${over}`, '  ', '    '));
  }
  const fitted = survey.terminators.map((t) => `${asEntered(t.ohms)} Ω at ${labelOrId(survey, t.nodeId)}`);
  lines.push(...wrap(`Terminator: ${result.terminatorNeeded ? 'needed' : 'not needed'}; fitted: ` +
    (fitted.length ? fitted.join(', ') : 'none'), '  ', '    '));
  lines.push(...wrap(polarityLine(result), '  ', '    '));
  lines.push('', ...wrap(RULES_NOTE, '  ', '  '));
  return lines;
}

function checkLines(result: SurveyResult): string[] {
  const { error, warning, note } = result.counts;
  const lines = [...heading('Checks'), `  ${error} error(s), ${warning} warning(s), ${note} note(s)`];
  for (const c of result.checks) {
    lines.push('', ...wrap(`${c.severity.toUpperCase()} ${c.slug}`, '  '));
    lines.push(...wrap(c.message, '    '));
    const refs = [
      c.runIds.length ? `runs: ${c.runIds.join(', ')}` : '',
      c.jackIds.length ? `jacks: ${c.jackIds.join(', ')}` : '',
      c.nodeIds.length ? `nodes: ${c.nodeIds.join(', ')}` : '',
    ].filter(Boolean);
    if (refs.length) lines.push(...wrap(refs.join('; '), '    ', '      '));
  }
  return lines;
}

export function reportLines(input: SurveyInput, result: SurveyResult, opts: ReportOptions): string[] {
  const { survey } = cleanSurvey(input);
  return fitWidth([
    ...head(survey, opts),
    ...cautions(),
    ...jackLines(survey, result),
    ...runLines(survey, result),
    ...totalLines(survey, result),
    ...layoutLines(survey, result),
    ...checkLines(result),
    '', 'END OF REPORT',
  ]);
}

/** The report as printable text with \n line ends (for the browser's printable page). */
export function renderSurveyText(input: SurveyInput, result: SurveyResult, opts: ReportOptions = {}): string {
  return `${reportLines(input, result, opts).join('\n')}\n`;
}

