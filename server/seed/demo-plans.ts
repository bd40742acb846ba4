// Puts the demo site's plans in every state a demo wants to show: two approved (ready for a bundle), one
// waiting for review, one returned with a comment on a line, one draft whose warning still needs a reason.
// Runs through the same services as the API, so every step is checked, audited and mailed as usual.
// Only `npm start` / `npm run seed` call it; tests seed without plans.
import { and, eq } from 'drizzle-orm';
import { station, user } from '@/db/schema';
import type { AppContext } from '../context';
import type { SessionUser } from '../http/require-role';
import { createPlanService } from '../plans/service';
import { createReviewService } from '../review/service';
import { isRole } from '../roles';

function actor(ctx: AppContext, email: string): SessionUser {
  const row = ctx.db.select().from(user).where(eq(user.email, email)).get();
  if (!row || !isRole(row.role)) throw new Error(`demo account ${email} is missing`);
  return { id: row.id, email: row.email, name: row.name, role: row.role };
}

function stationId(ctx: AppContext, name: string): number {
  const row = ctx.db.select({ id: station.id }).from(station).where(and(eq(station.name, name), eq(station.kind, 'pc'))).get();
  if (!row) throw new Error(`demo station ${name} is missing`);
  return row.id;
}

export async function seedDemoPlans(ctx: AppContext) {
  const tech = actor(ctx, 'tech@bootwright.test');
  const lead = actor(ctx, 'lead@bootwright.test');
  const plans = createPlanService(ctx);
  const review = createReviewService(ctx);

  const send = async (name: string) => {
    const made = plans.createRevision(tech, stationId(ctx, name));
    return plans.submit(tech, made.id, made.version);
  };

  for (const name of ['RECEPT', 'DRAFT1']) {
    const sent = await send(name);
    await review.approve(lead, sent.id, { version: sent.version, planHash: sent.planHash, comment: 'Checked against the survey: COM1 has the adapter.' });
  }

  await send('STUDIO');

  const returned = await send('DRAFT2');
  const loaderLine = (returned.result as { changes?: Array<{ file: string; line: number }> }).changes?.find((c) => c.file === 'AUTOEXEC.BAT')?.line ?? null;
  review.comment(lead, returned.id, { body: 'The drafting program needs 9600 baud confirmed with the office before we roll this out.', file: 'AUTOEXEC.BAT', line: loaderLine });
  await review.returnPlan(lead, returned.id, { version: returned.version, comment: 'Please confirm the baud rate with the office first.' });

  // ACCOUNTS redirects LPT1 already: its warning waits for the technician's reason, so it stays a draft.
  plans.createRevision(tech, stationId(ctx, 'ACCOUNTS'));
}
