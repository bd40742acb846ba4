// Whether a plan still matches its station, and which approved plans may go into a rollout bundle. The
// bundle builder calls these: only an approved plan whose inputs hash as they did at approval is bundleable.
import { and, eq, isNull } from 'drizzle-orm';
import { planRevision } from '@/db/plans';
import { station } from '@/db/schema';
import type { Db } from '../db';
import { loadPlanInput } from '../stations/plan-input';
import { changedInputs, inputHashes, type InputPart } from './fingerprint';
import type { PlanRow } from './repository';

type DbOrCtx = Db | { db: Db };
const dbOf = (x: DbOrCtx): Db => ('db' in x && !('select' in x) ? x.db : (x as Db));

export type Freshness = { current: boolean; changed: Array<InputPart | 'station'> };

type Pinned = Pick<PlanRow, 'stationId' | 'profileHash' | 'kitHash' | 'autoexecInHash' | 'configInHash'>;

/** Compares a plan's input hashes with the station's inputs now. */
export function freshnessOf(source: DbOrCtx, plan: Pinned): Freshness {
  const input = loadPlanInput(source, plan.stationId);
  const changed: Freshness['changed'] = changedInputs(plan, inputHashes(input));
  if (input.station.archivedAt) changed.push('station');
  return { current: changed.length === 0, changed };
}

/** True when plan `planId` exists and its station's profile, kit and files hash as they did when it was made. */
export function planIsCurrent(source: DbOrCtx, planId: number): boolean {
  const plan = dbOf(source).select().from(planRevision).where(eq(planRevision.id, planId)).get();
  return !!plan && freshnessOf(source, plan).current;
}

export type BundleablePlan = {
  planId: number;
  stationId: number;
  stationName: string;
  stationNumber: number;
  revision: number;
  planHash: string;
  autoexecFileId: number | null;
  configFileId: number | null;
};

/**
 * The approved plans of a site that may be bundled: approved for exactly their plan hash and still current.
 * Stale approvals are left out (the screen shows them as stale; a new revision is needed).
 */
export function currentApprovedPlans(source: DbOrCtx, siteId: number): BundleablePlan[] {
  const rows = dbOf(source)
    .select({ plan: planRevision, stationName: station.name, stationNumber: station.number })
    .from(planRevision)
    .innerJoin(station, eq(station.id, planRevision.stationId))
    .where(and(eq(station.siteId, siteId), eq(planRevision.state, 'approved'), isNull(station.archivedAt)))
    .orderBy(station.number)
    .all();
  return rows
    .filter(({ plan }) => plan.approvedHash === plan.planHash && freshnessOf(source, plan).current)
    .map(({ plan, stationName, stationNumber }) => ({
      planId: plan.id,
      stationId: plan.stationId,
      stationName,
      stationNumber,
      revision: plan.revision,
      planHash: plan.planHash,
      autoexecFileId: plan.autoexecFileId,
      configFileId: plan.configFileId,
    }));
}
