/**
 * Wire lengths: totals by gauge, the star's spoke limit, the total limit for every other shape, and the
 * gauge advice for new runs. Limits: common practice of the trade, no published source (see rules.ts).
 */
import { asSum, check } from './check';
import type { CleanRun, CleanSurvey } from './clean-input';
import { conductorOhms, loopOhms } from './gauge';
import {
  BUS_TOTAL_24AWG_MAX_FT, BUS_TOTAL_MAX_FT, NEW_RUN_GAUGE, STAR_SPOKE_MAX_FT, overLimit,
} from './rules';
import type { Layout, RunResult, Spoke, SurveyCheck, Totals } from './types';

export function runResults(survey: CleanSurvey): RunResult[] {
  return survey.runs.map((r) => {
    const usable = r.lengthFt !== null && r.gauge !== null;
    return {
      runId: r.id,
      from: r.from,
      to: r.to,
      kind: r.kind,
      lengthFt: r.lengthFt,
      gauge: r.gauge,
      reverses: r.reverses,
      conductorOhms: usable ? conductorOhms(r.gauge!, r.lengthFt!) : null,
      loopOhms: usable ? loopOhms(r.gauge!, r.lengthFt!) : null,
      inGraph: r.inGraph,
    };
  });
}

/** Every run with a usable length counts, whether or not it reaches the drawing: the wire is there. */
export function totals(runs: CleanRun[]): Totals {
  const sum: Totals = {
    lengthFt: 0, byGauge: { 22: 0, 24: 0, 26: 0 }, wallFt: 0, cordFt: 0, runsCounted: 0, runsSkipped: 0,
  };
  for (const r of runs) {
    if (r.lengthFt === null) {
      sum.runsSkipped += 1;
      continue;
    }
    sum.runsCounted += 1;
    sum.lengthFt += r.lengthFt;
    if (r.gauge !== null) sum.byGauge[r.gauge] += r.lengthFt;
    if (r.kind === 'wall') sum.wallFt += r.lengthFt;
    else sum.cordFt += r.lengthFt;
  }
  return sum;
}

export function spokeChecks(spokes: Spoke[]): SurveyCheck[] {
  return spokes
    .filter((s) => overLimit(s.farthest.lengthFt, STAR_SPOKE_MAX_FT))
    .map((s) => check('spoke-too-long', 'error',
      `The spoke through run ${s.firstRunId} reaches ${asSum(s.farthest.lengthFt)} ft from the centre; ` +
        `a star spoke may be at most ${STAR_SPOKE_MAX_FT} ft (trade practice).`,
      { runIds: s.farthest.runIds, nodeIds: s.nodeIds }));
}

/**
 * The total limit. Only 24 AWG (in our reading: no 22 AWG) in the wall wiring lowers it; the wall wiring
 * decides, because cords are short and are usually thinner wire anyway. With no wall runs, all runs decide.
 */
export function totalLimit(runs: CleanRun[]): { limitFt: number; reason: string } {
  const wall = runs.filter((r) => r.kind === 'wall' && r.lengthFt !== null && r.gauge !== null);
  const judged = wall.length > 0 ? wall : runs.filter((r) => r.lengthFt !== null && r.gauge !== null);
  const has22 = judged.some((r) => r.gauge === 22);
  if (judged.length > 0 && !has22) {
    return { limitFt: BUS_TOTAL_24AWG_MAX_FT, reason: 'with no 22 AWG wire in the wiring' };
  }
  return { limitFt: BUS_TOTAL_MAX_FT, reason: 'for a network with 22 AWG wiring' };
}

export function totalChecks(layout: Layout, runs: CleanRun[], sum: Totals): SurveyCheck[] {
  if (layout === 'star' || layout === 'empty') return [];
  const { limitFt, reason } = totalLimit(runs);
  if (!overLimit(sum.lengthFt, limitFt)) return [];
  const counted = runs.filter((r) => r.lengthFt !== null).map((r) => r.id);
  return [check('bus-too-long', 'error',
    `The ${layout} has ${asSum(sum.lengthFt)} ft of wire in total; at most ${limitFt} ft ${reason} (trade practice).`,
    { runIds: counted })];
}

export function gaugeChecks(runs: CleanRun[]): SurveyCheck[] {
  const other = runs.filter((r) => r.kind === 'wall' && r.gauge !== null && r.gauge !== NEW_RUN_GAUGE);
  if (other.length === 0) return [];
  const gauges = [...new Set(other.map((r) => r.gauge))].sort().join(' and ');
  return [check('gauge-not-22', 'note',
    `${other.length} wall run(s) use ${gauges} AWG; new runs should be ${NEW_RUN_GAUGE} AWG (trade practice).`,
    { runIds: other.map((r) => r.id) })];
}
