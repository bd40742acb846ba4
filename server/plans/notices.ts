// The mail the plan loop sends, each a short plain-text and HTML pair with one link into the app. A failed
// send is logged and never undoes the decision it reports.
import { and, eq, or, isNull } from 'drizzle-orm';
import { user } from '@/db/schema';
import type { AppContext } from '../context';
import { composeMail } from '../mail/templates';
import type { Role } from '../roles';

type Who = { name: string };
type PlanRef = { id: number; revision: number; stationName: string; siteName: string };

/** E-mail addresses of every active account with `role`. */
export function addressesOf(ctx: AppContext, role: Role): string[] {
  return ctx.db
    .select({ email: user.email })
    .from(user)
    .where(and(eq(user.role, role), or(isNull(user.banned), eq(user.banned, false))))
    .all()
    .map((r) => r.email);
}

export const reviewUrl = (ctx: AppContext, planId: number) => `${ctx.appUrl}/review/${planId}`;
export const planUrl = (ctx: AppContext, planId: number) => `${ctx.appUrl}/plans/${planId}`;

async function send(ctx: AppContext, mail: ReturnType<typeof composeMail>) {
  try {
    await ctx.mailer.send(mail);
  } catch (err) {
    ctx.log(`mail "${mail.subject}" was not sent`, err);
  }
}

/** To the leads: a plan waits for review. */
export function sentForReview(ctx: AppContext, plan: PlanRef, by: Who) {
  return send(
    ctx,
    composeMail({
      to: addressesOf(ctx, 'lead'),
      subject: `Plan for ${plan.stationName} waits for your review`,
      paragraphs: [
        `${by.name} sent revision ${plan.revision} of the startup-file plan for ${plan.stationName} (${plan.siteName}) for review.`,
        'Read the diff and the checks, then approve the exact change or return it with comments.',
      ],
      link: { label: 'Open the review', url: reviewUrl(ctx, plan.id) },
    }),
  );
}

/** To the plan's technician: the lead approved or returned it. */
export function decided(ctx: AppContext, plan: PlanRef, to: string, by: Who, outcome: 'approved' | 'returned', comment: string | null) {
  const paragraphs =
    outcome === 'approved'
      ? [`${by.name} approved revision ${plan.revision} of the plan for ${plan.stationName} (${plan.siteName}).`, 'It can go into the rollout bundle as long as the station’s files, profile and kit stay as they are.']
      : [`${by.name} returned revision ${plan.revision} of the plan for ${plan.stationName} (${plan.siteName}).`, 'Read the comments, change what is needed and make a new revision.'];
  if (comment) paragraphs.push(`Comment: ${comment}`);
  return send(
    ctx,
    composeMail({
      to,
      subject: `Plan for ${plan.stationName} ${outcome}`,
      paragraphs,
      link: { label: 'Open the plan', url: planUrl(ctx, plan.id) },
    }),
  );
}

/** To the technicians: an office user sent their startup files. */
export function userFileReceived(ctx: AppContext, plan: PlanRef, from: Who, files: string[]) {
  return send(
    ctx,
    composeMail({
      to: addressesOf(ctx, 'technician'),
      subject: `${from.name} sent the startup files of ${plan.stationName}`,
      paragraphs: [
        `${from.name} sent ${files.join(' and ')} from ${plan.stationName} (${plan.siteName}). They are stored as a new revision of the station's files.`,
        `A draft plan (revision ${plan.revision}) was made from them. Check it, give a reason for each warning, and send it for review.`,
      ],
      link: { label: 'Open the draft plan', url: planUrl(ctx, plan.id) },
    }),
  );
}
