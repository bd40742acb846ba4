// The survey report for the rollout bundle: the same CP437, 80-column, CR LF bytes as the download.
import type { AppContext } from '../context';
import { createSurveyRepository } from './repository';
import { reportStamp, surveyReportBytes } from './view';

/**
 * The site's survey report as code page 437 bytes, or null when the site is unknown or nothing has been
 * surveyed there yet (no jacks, nodes or runs), so the bundle can say the survey is missing.
 * `generatedAt` is printed as given (default: now, in UTC); pass a fixed one for reproducible bundles.
 * The caller audits the download it belongs to.
 */
export function surveyReportForSite(ctx: Pick<AppContext, 'db'>, siteId: number, opts: { generatedAt?: string } = {}): Uint8Array | null {
  const repo = createSurveyRepository(ctx.db);
  const site = repo.site(siteId);
  if (!site) return null;
  return surveyReportBytes(repo, site, opts.generatedAt ?? reportStamp(new Date()), true);
}
