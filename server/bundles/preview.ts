// What a bundle of a site (or of ticked stations) will hold and what it leaves out, and why. Only plans
// that currentApprovedPlans() (server/plans/current.ts) names go in: approved for their exact hash and
// still matching the station. Every other station gets one reason in plain words.
import type { LeftOutCode } from '@/db/requests/bundles';
import { placePcs, type BundlePc } from '@/generators/bundle';
import type { AppContext } from '../context';
import { badRequest, notFound } from '../http/errors';
import { currentApprovedPlans, freshnessOf } from '../plans/current';
import { surveyReportForSite } from '../survey/report';
import { createBundleRepository, type PlanMetaRow, type SiteRow, type StationRow } from './repository';

type StationRef = { stationId: number; name: string; number: number; kind: StationRow['kind']; location: string };

export type IncludedPc = StationRef & {
  folder: string;
  planId: number;
  revision: number;
  planHash: string;
  approvedBy: string;
  approvedAt: string;
};

export type LeftOut = StationRef & { code: LeftOutCode; reason: string; planId: number | null; revision: number | null };

export type BundlePreview = {
  site: { id: number; name: string };
  selection: number[] | null;
  included: IncludedPc[];
  leftOut: LeftOut[];
  /** Stations listed in STATIONS.TXT (every station of the site that is not archived). */
  directoryCount: number;
  /** Whether SURVEY.TXT will be the wiring survey report (else a placeholder says none was recorded). */
  survey: boolean;
};

const ref = (s: StationRow): StationRef => ({ stationId: s.id, name: s.name, number: s.number, kind: s.kind, location: s.location });

const KIND_WORDS: Record<StationRow['kind'], string> = { pc: 'PC', printer: 'A printer', modem: 'A modem', other: 'This device' };

/** The site, or 404; an archived site makes no bundle. */
export function bundleSite(ctx: AppContext, siteId: number): SiteRow {
  const s = createBundleRepository(ctx.db).site(siteId);
  if (!s) throw notFound('That site');
  if (s.archivedAt) throw badRequest('This site is archived; it makes no bundle.', { siteId: 'This site is archived.' });
  return s;
}

/** The stations in scope: the whole site, or the ticked ones (each must belong to the site). */
function scope(all: StationRow[], selection: number[] | null): StationRow[] {
  if (!selection) return all.filter((s) => !s.archivedAt);
  const byId = new Map(all.map((s) => [s.id, s]));
  const strangers = selection.filter((id) => !byId.has(id));
  if (strangers.length) throw badRequest('Some ticked stations are not part of this site.', { stationIds: `Not at this site: ${strangers.join(', ')}.` });
  return selection.map((id) => byId.get(id)!).sort((a, b) => a.number - b.number);
}

export function previewBundle(ctx: AppContext, siteId: number, selection: number[] | null): BundlePreview {
  const repo = createBundleRepository(ctx.db);
  const s = bundleSite(ctx, siteId);
  const all = repo.stations(siteId);
  const chosen = scope(all, selection);
  const bundleable = new Map(currentApprovedPlans(ctx, siteId).map((p) => [p.stationId, p]));
  const newest = repo.newestPlans(chosen.filter((st) => st.kind === 'pc').map((st) => st.id));
  const approvers = repo.userNames(chosen.flatMap((st) => newest.get(st.id)?.decidedBy ?? []));
  const included: Array<Omit<IncludedPc, 'folder'>> = [];
  const leftOut: LeftOut[] = [];
  for (const st of chosen) {
    const plan = newest.get(st.id) ?? null;
    const ok = plan && !st.archivedAt && st.kind === 'pc' && bundleable.get(st.id)?.planId === plan.id;
    if (ok) {
      included.push({ ...ref(st), planId: plan.id, revision: plan.revision, planHash: plan.planHash, approvedBy: approvers.get(plan.decidedBy ?? '') ?? 'unknown', approvedAt: (plan.decidedAt ?? plan.createdAt).toISOString() });
    } else {
      leftOut.push({ ...ref(st), ...whyLeftOut(ctx, s.id, st, plan, approvers), planId: plan?.id ?? null, revision: plan?.revision ?? null });
    }
  }
  return {
    site: { id: s.id, name: s.name },
    selection,
    included: withFolders(included),
    leftOut,
    directoryCount: all.filter((x) => !x.archivedAt).length,
    survey: surveyReportForSite(ctx, s.id) !== null,
  };
}

/** The folder each PC gets, exactly as the builder will name it. */
function withFolders(pcs: Array<Omit<IncludedPc, 'folder'>>): IncludedPc[] {
  const light = pcs.map((p) => ({ stationName: p.name, stationNumber: p.number, planRevisionId: String(p.planId) }) as BundlePc);
  const folderOf = new Map(placePcs({ pcs: light }).map(({ pc, folder }) => [pc.planRevisionId, folder]));
  return pcs.map((p) => ({ ...p, folder: folderOf.get(String(p.planId))! }));
}

function whyLeftOut(ctx: AppContext, siteId: number, st: StationRow, plan: PlanMetaRow | null, names: Map<string, string>): { code: LeftOutCode; reason: string } {
  if (st.kind !== 'pc') return { code: 'not_pc', reason: `${KIND_WORDS[st.kind]} has no startup files; it is listed in STATIONS.TXT only.` };
  if (st.archivedAt) return { code: 'archived', reason: 'This station is archived; archived stations are never bundled.' };
  if (!plan) return { code: 'no_plan', reason: 'No plan yet: a technician makes one from the Plans board.' };
  const rev = `Revision ${plan.revision}`;
  switch (plan.state) {
    case 'draft':
      return { code: 'draft', reason: `${rev} is a draft: the technician has not sent it for review.` };
    case 'in_review':
      return { code: 'in_review', reason: `${rev} waits for a lead's review.` };
    case 'returned':
      return { code: 'returned', reason: `${rev} was returned by ${names.get(plan.decidedBy ?? '') ?? 'a lead'}: the technician makes a new revision.` };
    case 'released': {
      const rec = createBundleRepository(ctx.db).releasedIn(siteId, plan.id);
      const reason = rec
        ? `${rev} already went out in bundle #${rec.id} of ${rec.generatedAt.slice(0, 10)}: fetch that bundle again from the history, or make a new revision.`
        : `${rev} already went out in a bundle: make a new revision to bundle it again.`;
      return { code: 'released', reason };
    }
    case 'approved': {
      if (plan.approvedHash !== plan.planHash) return { code: 'not_approved', reason: `${rev} was not approved for its exact content.` };
      const fresh = freshnessOf(ctx, plan);
      const what = fresh.changed.map((c) => (c === 'station' ? 'archived state' : c)).join(', ');
      return { code: 'stale', reason: `${rev} was approved, but the station's ${what || 'inputs'} changed since: make a new revision and have it reviewed.` };
    }
    default:
      return { code: 'not_approved', reason: `${rev} is ${plan.state}.` };
  }
}
