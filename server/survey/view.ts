// Reading a survey: its rows, what the computation made of them, the drawing's positions, the report.
import type { SurveySiteSummary, SurveyView } from '@/db/requests/survey';
import { analyzeSurvey, layoutSurvey, renderSurveyReport } from '@/generators/survey';
import type { SurveyRepository } from './repository';
import {
  jackRow, nodeRow, readingRow, runRow, settingsRow, terminatorRow, toSurveyInput,
} from './to-input';

export function surveyView(repo: SurveyRepository, site: { id: number; name: string }): SurveyView {
  const rows = repo.allRows(site.id);
  const input = toSurveyInput(site.name, rows);
  return {
    site,
    settings: settingsRow(rows.settings),
    jacks: rows.jacks.map(jackRow),
    readings: rows.readings.map(readingRow),
    nodes: rows.nodes.map(nodeRow),
    runs: rows.runs.map(runRow),
    terminators: rows.terminators.map(terminatorRow),
    input,
    result: analyzeSurvey(input),
    drawing: layoutSurvey(input),
  };
}

/** Every site with the size of its survey and its open errors and warnings, for the site picker. */
export function surveySites(repo: SurveyRepository, q?: string): SurveySiteSummary[] {
  const needle = q?.toLowerCase();
  return repo
    .sites()
    .filter((s) => s.archivedAt === null && (!needle || s.name.toLowerCase().includes(needle)))
    .map((s) => {
      const rows = repo.allRows(s.id);
      const recorded = rows.jacks.length + rows.nodes.length + rows.runs.length > 0;
      const counts = recorded ? analyzeSurvey(toSurveyInput(s.name, rows)).counts : { error: 0, warning: 0 };
      return { id: s.id, name: s.name, jacks: rows.jacks.length, runs: rows.runs.length, errors: counts.error, warnings: counts.warning };
    });
}

/** "2026-03-04 10:20 UTC": when the report was made, as it prints. */
export function reportStamp(at: Date): string {
  return `${at.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

/** The survey report's CP437 bytes; with `skipEmpty`, null when nothing has been surveyed at the site yet. */
export function surveyReportBytes(repo: SurveyRepository, site: { id: number; name: string }, generatedAt: string, skipEmpty = false): Uint8Array | null {
  const rows = repo.allRows(site.id);
  if (skipEmpty && rows.jacks.length + rows.nodes.length + rows.runs.length === 0) return null;
  const input = toSurveyInput(site.name, rows);
  return renderSurveyReport(input, analyzeSurvey(input), { generatedAt });
}
