// Rollout bundles: start a build (a record pinned to exact plan revisions and hashes, with a fixed time),
// stream it once, and only when every byte went out record it done, release its plans and tell the leads.
// A cancelled or failed stream records the failure and releases nothing. A done record can be fetched
// again: it is rebuilt from the same revisions and sent only when its SHA-256 is the recorded one.
import type { Response } from 'express';
import type { BundleRecordPlan, BundleSnapshot } from '@/db/bundles';
import type { CreateBundleInput } from '@/db/requests/bundles';
import type { AppContext } from '../context';
import { conflict, HttpError, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { planIsCurrent } from '../plans/current';
import { createPlanService } from '../plans/service';
import { surveyReportForSite } from '../survey/report';
import { reportStamp } from '../survey/view';
import { bundleFileName } from './file-name';
import { bundleDownloaded } from './notices';
import { bundleSite, previewBundle } from './preview';
import { createBundleRepository, type BundleRecordMeta, type BundleRecordRow } from './repository';
import { hashBundle, pipeBundle } from './stream';
import { toBundleSite } from './to-bundle-site';

type Actor = SessionUser;
type Phase = 'checking' | 'sending';
type Live = { phase: Phase; done: number; total: number; planIds: number[]; first: boolean };

/** A building record nobody streamed for this long is taken as abandoned (a real build takes seconds). */
const ABANDON_AFTER_MS = 30 * 60 * 1000;

/** The zip's fixed time: now, to the second (zip times hold two-second steps; the record keeps the string). */
const fixedNow = () => new Date(Math.floor(Date.now() / 1000) * 1000).toISOString();

export function createBundleService(ctx: AppContext) {
  const repo = createBundleRepository(ctx.db);
  const plans = createPlanService(ctx);
  /** Streams running in this process, by record id: what the progress endpoint reports. */
  const live = new Map<number, Live>();

  function view(record: BundleRecordMeta, createdByName?: string) {
    const site = repo.site(record.siteId);
    return {
      id: record.id,
      siteId: record.siteId,
      state: record.state,
      createdAt: record.createdAt.toISOString(),
      createdBy: { id: record.createdBy, name: createdByName ?? repo.userNames([record.createdBy]).get(record.createdBy) ?? '' },
      generatedAt: record.generatedAt,
      finishedAt: record.finishedAt?.toISOString() ?? null,
      plans: record.plans,
      selection: record.snapshot?.selection ?? null,
      zipSha256: record.zipSha256,
      zipSize: record.zipSize,
      failure: record.failure,
      fileName: bundleFileName(record.snapshot?.site.name ?? site?.name ?? '', record.id),
    };
  }

  function fail(actor: Actor, record: BundleRecordMeta, failure: string) {
    if (!repo.markFailed(record.id, failure)) return;
    ctx.audit.record(actor, { action: 'bundle.fail', entity: 'bundle', entityId: record.id, siteId: record.siteId, details: { failure, plans: record.plans } });
  }

  /** Building records left behind by a stopped server or a closed tab become failed, so the history is honest. */
  function sweep() {
    for (const record of repo.abandoned(new Date(Date.now() - ABANDON_AFTER_MS))) {
      if (!live.has(record.id)) repo.markFailed(record.id, 'The download never finished (the page was closed or the server stopped).');
    }
  }

  function create(actor: Actor, input: CreateBundleInput) {
    sweep();
    const preview = previewBundle(ctx, input.siteId, input.stationIds ?? null);
    if (preview.included.length === 0) throw conflict('Nothing to bundle: no station in the selection has an approved, current plan.', 'nothing_to_bundle');
    const site = bundleSite(ctx, input.siteId);
    const generatedAt = fixedNow();
    const snapshot: BundleSnapshot = {
      site: { name: site.name, address: site.address },
      stations: repo.stations(site.id).filter((s) => !s.archivedAt).map((s) => ({ name: s.name, number: s.number, kind: s.kind, location: s.location })),
      selection: input.stationIds ?? null,
    };
    const planEntries: BundleRecordPlan[] = preview.included.map((p) => ({
      planId: p.planId, stationId: p.stationId, planHash: p.planHash, revision: p.revision,
      stationName: p.name, stationNumber: p.number, approvedBy: p.approvedBy, approvedAt: p.approvedAt,
    }));
    const survey = surveyReportForSite(ctx, site.id, { generatedAt: reportStamp(new Date(generatedAt)) });
    const record = repo.insert({ siteId: site.id, createdBy: actor.id, generatedAt, plans: planEntries, snapshot, surveyReport: survey ? Buffer.from(survey) : null });
    ctx.audit.record(actor, {
      action: 'bundle.create', entity: 'bundle', entityId: record.id, siteId: site.id,
      details: { generatedAt, selection: snapshot.selection, plans: planEntries.map(({ planId, revision, stationName, planHash }) => ({ planId, revision, stationName, planHash })), survey: !!survey },
    });
    return { record: view(record, actor.name), leftOut: preview.leftOut.length, survey: !!survey };
  }

  function list(siteId: number) {
    bundleSite(ctx, siteId);
    sweep();
    return repo.list(siteId).map(({ record, createdByName }) => view(record, createdByName));
  }

  function find(id: number): BundleRecordRow {
    const record = repo.find(id);
    if (!record) throw notFound('That bundle');
    return record;
  }

  function progress(id: number) {
    const record = find(id);
    const now = live.get(id);
    const total = record.plans.length;
    return {
      id,
      state: record.state,
      phase: now?.phase ?? null,
      done: now ? now.done : record.state === 'done' ? total : 0,
      total,
      failure: record.failure,
      zipSha256: record.zipSha256,
    };
  }

  function sendHeaders(res: Response, record: BundleRecordRow) {
    res.status(200);
    res.set('Content-Type', 'application/zip');
    res.set('Content-Disposition', `attachment; filename="${view(record).fileName}"`);
    res.set('X-Bundle-Id', String(record.id));
    res.set('X-Bundle-Stations', String(record.plans.length));
    if (record.zipSha256) res.set('X-Bundle-Sha256', record.zipSha256);
  }

  /** Plans of the record that may no longer go out: not approved for their hash any more, or stale. */
  function unreleasable(record: BundleRecordRow): string[] {
    const rows = new Map(repo.plans(record.plans.map((p) => p.planId)).map((r) => [r.id, r]));
    return record.plans
      .filter((p) => {
        const row = rows.get(p.planId);
        return !row || row.state !== 'approved' || row.approvedHash !== p.planHash || row.planHash !== p.planHash || !planIsCurrent(ctx, p.planId);
      })
      .map((p) => p.stationName ?? `plan ${p.planId}`);
  }

  function track(id: number, phase: Phase, first: boolean, record: BundleRecordRow) {
    const entry: Live = { phase, done: 0, total: record.plans.length, planIds: record.plans.map((p) => p.planId), first };
    live.set(id, entry);
    return (done: number, total: number) => Object.assign(entry, { done, total });
  }

  /** The one streaming download of a building record. */
  async function firstDownload(actor: Actor, record: BundleRecordRow, res: Response) {
    const ids = record.plans.map((p) => p.planId);
    const busy = [...live.values()].some((l) => l.first && l.planIds.some((id) => ids.includes(id)));
    if (busy) throw conflict('Another download of some of these plans is running. Wait for it to finish.', 'busy');
    if (!repo.claim(record.id)) throw conflict('This bundle is already being downloaded. Wait for it, or start a new one.', 'already_streaming');
    const moved = unreleasable(record);
    if (moved.length) {
      const failure = `The plans of ${moved.join(', ')} changed since the bundle was started; start a new bundle.`;
      fail(actor, record, failure);
      throw conflict(failure, 'plans_changed');
    }
    let site;
    try {
      site = toBundleSite(repo, record);
    } catch (err) {
      const failure = `The bundle could not be put together: ${(err as Error).message}.`;
      fail(actor, record, failure);
      throw conflict(failure, 'cannot_build');
    }
    const onProgress = track(record.id, 'sending', true, record);
    sendHeaders(res, record);
    const outcome = await pipeBundle(site, res, onProgress).finally(() => live.delete(record.id));
    if (!outcome.ok) return fail(actor, record, outcome.reason);
    try {
      // Released and done together, or neither: a plan that moved meanwhile makes the whole record fail.
      ctx.db.transaction(() => {
        plans.release(actor, ids);
        if (!repo.markDone(record.id, outcome.sha256, outcome.size)) throw conflict('The bundle record changed meanwhile.', 'record_changed');
      });
    } catch (err) {
      const why = err instanceof HttpError ? err.message : String(err);
      return fail(actor, record, `The zip was sent, but its plans could not be released (${why}). Do not use that download; start a new bundle.`);
    }
    const fileName = view(record).fileName;
    ctx.audit.record(actor, {
      action: 'bundle.download', entity: 'bundle', entityId: record.id, siteId: record.siteId,
      details: { fileName, generatedAt: record.generatedAt, zipSha256: outcome.sha256, zipSize: outcome.size, plans: record.plans.map(({ planId, revision, stationName, planHash }) => ({ planId, revision, stationName, planHash })) },
    });
    await bundleDownloaded(ctx, {
      recordId: record.id, siteName: site.name, by: actor.name, at: new Date(), fileName,
      stations: record.plans.map((p) => p.stationName ?? `plan ${p.planId}`), sha256: outcome.sha256,
    });
  }

  /** A done record again: rebuilt, hashed, and sent only when the SHA-256 is the recorded one. */
  async function refetch(actor: Actor, record: BundleRecordRow, res: Response) {
    let site;
    try {
      site = toBundleSite(repo, record);
    } catch (err) {
      throw conflict(`Bundle #${record.id} cannot be rebuilt: ${(err as Error).message}.`, 'cannot_rebuild');
    }
    const checked = await hashBundle(site, track(record.id, 'checking', false, record)).finally(() => live.delete(record.id));
    if (checked.sha256 !== record.zipSha256 || checked.size !== record.zipSize) {
      ctx.audit.record(actor, { action: 'bundle.refetch-refused', entity: 'bundle', entityId: record.id, siteId: record.siteId, details: { recorded: record.zipSha256, rebuilt: checked.sha256 } });
      throw conflict(
        `Bundle #${record.id} cannot be fetched again byte for byte: the rebuilt zip has SHA-256 ${checked.sha256.slice(0, 12)}…, the record says ${record.zipSha256?.slice(0, 12)}…. Nothing was sent; start a new bundle from the current approved plans instead.`,
        'hash_mismatch',
      );
    }
    sendHeaders(res, record);
    const outcome = await pipeBundle(site, res, track(record.id, 'sending', false, record)).finally(() => live.delete(record.id));
    ctx.audit.record(actor, {
      action: 'bundle.refetch', entity: 'bundle', entityId: record.id, siteId: record.siteId,
      details: outcome.ok ? { zipSha256: outcome.sha256, zipSize: outcome.size, same: outcome.sha256 === record.zipSha256 } : { stopped: outcome.reason },
    });
  }

  async function download(actor: Actor, id: number, res: Response) {
    const record = find(id);
    if (record.state === 'failed') throw conflict(`Bundle #${id} failed: ${record.failure ?? 'no reason recorded.'} Start a new bundle.`, 'bundle_failed');
    if (record.state === 'done') return refetch(actor, record, res);
    return firstDownload(actor, record, res);
  }

  return { preview: (siteId: number, selection: number[] | null) => previewBundle(ctx, siteId, selection), create, list, get: (id: number) => view(find(id)), progress, download };
}

export type BundleService = ReturnType<typeof createBundleService>;
