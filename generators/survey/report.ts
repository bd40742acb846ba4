/**
 * The survey report for the rollout bundle: 80 columns, CR LF line ends, code page 437 encoded with
 * iconv-lite; and the same text as a JavaScript string with \n for the browser's printable page.
 */
import iconv from 'iconv-lite';
import { reportLines, renderSurveyText, type ReportOptions } from './report-text';
import type { SurveyInput, SurveyResult } from './types';

export { renderSurveyText, type ReportOptions };

/** The report as DOS text: code page 437 bytes, CR LF line ends, no line over 80 columns. */
export function renderSurveyReport(input: SurveyInput, result: SurveyResult, opts: ReportOptions = {}): Uint8Array {
  const text = `${reportLines(input, result, opts).join('\r\n')}\r\n`;
  return Uint8Array.from(iconv.encode(text, 'cp437'));
}
