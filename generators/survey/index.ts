/**
 * Wiring survey: the pure computation behind the survey screens and the bundle's survey report.
 * No database, server or React here; the caller maps its rows to a SurveyInput.
 *
 * Trade limits are common practice with no published source (rules.ts); wire resistance comes from
 * REFERENCES §6.8 [HYPERPHYSICS] (gauge.ts).
 */
export type * from './types';

/**
 * Analyses a survey: layout, pair status per jack, wire totals by gauge, loop resistance per run and end
 * to end, and the checks (slug, severity, message, and the runs, jacks and nodes concerned).
 * Never throws: unknown ids, unusable numbers and an empty survey become checks.
 */
export { analyzeSurvey } from './analyze';

/**
 * The 80-column survey report as code page 437 bytes with CR LF line ends, for the rollout bundle.
 * Same input, same bytes; the only date printed is `opts.generatedAt`.
 */
export { renderSurveyReport } from './report';

/**
 * The same report as a JavaScript string with \n line ends, for the browser's printable page.
 * (Import it from './report-text' to keep iconv-lite out of a browser bundle.)
 */
export { renderSurveyText } from './report-text';
export type { ReportOptions } from './report-text';

/** Deterministic node positions for drawing the network, layered from the centre or the block. */
export { layoutSurvey } from './layout';
export type { SurveyDrawing } from './layout';

/** The cautions every survey screen keeps visible (sources named in cautions.ts). */
export { SURVEY_CAUTIONS } from './cautions';

/** Ohms per 1,000 ft by gauge at 20 °C [HYPERPHYSICS], and the loop-resistance formula. */
export { OHMS_PER_1000_FT, conductorOhms, loopOhms } from './gauge';

/** The trade's thresholds, for forms that question a value as it is typed. */
export * as surveyRules from './rules';

/** The invented demo site's survey (one spoke over 500 ft, no terminator). */
export { demoSurvey, DEMO_LONG_SPOKE_RUN_ID } from './demo';
