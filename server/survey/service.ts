// The survey's rules: reads for staff, edits for editors (the routes check roles), every write audited.
import type { AppContext } from '../context';
import type { SessionUser } from '../http/require-role';
import { jackEdits } from './edit-jacks';
import { wiringEdits } from './edit-wiring';
import { createSurveyKit } from './service-kit';
import { reportStamp, surveyReportBytes, surveySites, surveyView } from './view';

export function createSurveyService(ctx: AppContext) {
  const kit = createSurveyKit(ctx);

  function view(siteId: number) {
    return surveyView(kit.repo, kit.siteOr404(siteId));
  }

  function sites(q?: string) {
    return surveySites(kit.repo, q);
  }

  /** The report's bytes for a download; the download itself goes into the audit trail. */
  function report(actor: SessionUser, siteId: number) {
    const site = kit.siteOr404(siteId);
    const generatedAt = reportStamp(new Date());
    const bytes = surveyReportBytes(kit.repo, site, generatedAt)!;
    kit.record(actor, 'download', 'report', siteId, siteId, { bytes: bytes.length, generatedAt });
    return { bytes, site };
  }

  return { view, sites, report, ...jackEdits(kit), ...wiringEdits(kit) };
}

export type SurveyService = ReturnType<typeof createSurveyService>;
