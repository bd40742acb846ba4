// What every survey write shares: the site and row lookups (another site's row answers 404 like an
// unknown id), the stale-version answer, the questions gate and the audit entry.
import type { Questions } from '@/db/requests/survey';
import type { AppContext } from '../context';
import { conflict, HttpError, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { createSurveyRepository, type Row, type SurveyEntity } from './repository';

const WHAT: Record<SurveyEntity, string> = {
  jack: 'That jack',
  reading: 'That reading',
  node: 'That point of the network',
  run: 'That cable run',
  terminator: 'That terminator',
};

export function createSurveyKit(ctx: AppContext) {
  const repo = createSurveyRepository(ctx.db);

  function siteOr404(siteId: number) {
    const s = repo.site(siteId);
    if (!s) throw notFound('That site');
    return s;
  }

  function owned<E extends SurveyEntity>(entity: E, siteId: number, id: number): Row<E> {
    const row = repo.get(entity, id);
    if (!row || row.siteId !== siteId) throw notFound(WHAT[entity]);
    return row;
  }

  function stale(): never {
    throw conflict('Someone changed this since you opened it. Reload and try again.', 'stale');
  }

  /** Values the schema accepts but a person should look at twice: refused until sent with confirmed. */
  function ask(questions: Questions, confirmed: boolean) {
    if (Object.keys(questions).length > 0 && !confirmed) {
      throw new HttpError(400, 'needs_confirmation', 'Some values look unlikely. Check them, then confirm to keep them.', questions);
    }
  }

  function refFree(entity: 'jack' | 'node' | 'run', siteId: number, ref: string, current?: string) {
    if (ref.toLowerCase() === current?.toLowerCase()) return;
    if (repo.refsIn(entity, siteId).some((r) => r.toLowerCase() === ref.toLowerCase())) {
      throw new HttpError(409, 'ref_taken', `The short name ${ref} is already used in this survey.`, { ref: 'Already used in this survey.' });
    }
  }

  function record(actor: SessionUser, action: string, entity: SurveyEntity | 'settings' | 'report', siteId: number, entityId: number | string | null, details: Record<string, unknown> = {}) {
    ctx.audit.record(actor, { action: `survey.${entity}.${action}`, entity: `survey_${entity}`, entityId, siteId, details });
  }

  return { ctx, repo, siteOr404, owned, stale, ask, refFree, record };
}

export type SurveyKit = ReturnType<typeof createSurveyKit>;
