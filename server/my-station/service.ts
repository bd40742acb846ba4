// The office user's own station: read it, check pasted or uploaded startup files against its profile (the
// same engine and inputs as the technician's plan), and send them to the technicians, which stores them as
// a new file revision and opens a draft plan.
import type { UserEditInput } from '@/db/requests/plans';
import { decodeCp437 } from '@/generators/dos/cp437';
import type { AppContext } from '../context';
import { notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { freshnessOf } from '../plans/current';
import { userFileReceived } from '../plans/notices';
import { createPlanRepository } from '../plans/repository';
import { createPlanService } from '../plans/service';
import { assertCanReadStation, ownStationId } from '../stations/access';
import { createFileService } from '../stations/files';
import { loadPlanInput, runPlan, sha256, type FileInput } from '../stations/plan-input';
import { userFileBytes } from './files';

const fileText = (f: FileInput) => (f.bytes ? decodeCp437(f.bytes) : null);

export function createMyStationService(ctx: AppContext) {
  const repo = createPlanRepository(ctx.db);
  const plans = createPlanService(ctx);
  const files = createFileService(ctx);

  function summary(me: SessionUser) {
    const id = ownStationId(ctx, me);
    if (id == null) return { station: null };
    const input = loadPlanInput(ctx, id);
    const latest = repo.revisionsOf(id)[0];
    const meta = latest ? repo.findMeta(latest.id)! : null;
    return {
      station: { id, name: input.station.name, number: input.station.number, location: input.station.location },
      site: { id: input.site.id, name: input.site.name },
      profile: { dos: input.profile.dos, network: input.profile.network?.port ?? null, kit: input.kit?.name ?? null, profileError: input.profileError },
      files: {
        autoexec: { text: fileText(input.autoexec), uploadedAt: input.autoexec.file?.uploadedAt ?? null },
        config: { text: fileText(input.config), uploadedAt: input.config.file?.uploadedAt ?? null },
      },
      latestPlan: latest && meta ? { id: latest.id, revision: latest.revision, state: latest.state, current: freshnessOf(ctx, meta).current } : null,
    };
  }

  function bytesOf(input: UserEditInput) {
    return {
      autoexec: userFileBytes(input.autoexec, 'AUTOEXEC.BAT', 'autoexec'),
      config: input.config ? userFileBytes(input.config, 'CONFIG.SYS', 'config') : undefined,
    };
  }

  /** The checked edit: what the engine would do with these files on this station. Nothing is stored. */
  function check(me: SessionUser, stationId: number, input: UserEditInput) {
    ownStation(me, stationId);
    const bytes = bytesOf(input);
    const { json } = runPlan(loadPlanInput(ctx, stationId), bytes);
    return { result: json };
  }

  /** Stores the files as a new revision of the station's files, opens a draft plan and tells the technicians. */
  async function send(me: SessionUser, stationId: number, input: UserEditInput) {
    const st = ownStation(me, stationId);
    const bytes = bytesOf(input);
    const before = loadPlanInput(ctx, stationId);
    const stored: string[] = [];
    for (const [kind, data, current] of [
      ['AUTOEXEC.BAT', bytes.autoexec, before.autoexec],
      ['CONFIG.SYS', bytes.config, before.config],
    ] as const) {
      // A file byte for byte the one on record is not stored again.
      if (!data || (current.bytes && sha256(current.bytes) === sha256(data))) continue;
      files.upload(me, st, kind, data, 'user');
      stored.push(kind);
    }
    const plan = plans.createRevision(me, stationId, 'user');
    const told = stored.length ? stored : ['AUTOEXEC.BAT'];
    await userFileReceived(ctx, { id: plan.id, revision: plan.revision, stationName: before.station.name, siteName: before.site.name }, me, told);
    return { planId: plan.id, revision: plan.revision, stored };
  }

  /** Only the user's own station; any other answers 404 like an unknown one. */
  function ownStation(me: SessionUser, stationId: number) {
    const row = assertCanReadStation(ctx, me, stationId);
    if (row.userId !== me.id) throw notFound('That station');
    return row;
  }

  return { summary, check, send };
}
