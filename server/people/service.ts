// People: list, change role, deactivate, invite by e-mail, accept an invitation (set the password once).
import { and, asc, count, eq, gt, isNull } from 'drizzle-orm';
import { createHash, randomBytes } from 'node:crypto';
import { invitation, station, user } from '@/db/schema';
import type { InviteInput } from '@/db/requests/people';
import type { AppContext } from '../context';
import { badRequest, conflict, HttpError, notFound } from '../http/errors';
import type { SessionUser } from '../http/require-role';
import { composeMail } from '../mail/templates';
import type { Role } from '../roles';

export const INVITATION_HOURS = 72;

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

export function createPeopleService(ctx: AppContext) {
  const { db, auth, audit } = ctx;

  function list(limit: number, offset: number) {
    const rows = db
      .select({
        id: user.id,
        name: user.name,
        email: user.email,
        role: user.role,
        banned: user.banned,
        createdAt: user.createdAt,
      })
      .from(user)
      .orderBy(asc(user.name))
      .limit(limit)
      .offset(offset)
      .all();
    const total = db.select({ n: count() }).from(user).get()!.n;
    const pending = new Set(
      db
        .select({ userId: invitation.userId })
        .from(invitation)
        .where(isNull(invitation.usedAt))
        .all()
        .map((r) => r.userId),
    );
    return { items: rows.map((r) => ({ ...r, invitationPending: pending.has(r.id) })), total, limit, offset };
  }

  function findUser(id: string) {
    const row = db.select().from(user).where(eq(user.id, id)).get();
    if (!row) throw notFound('That person');
    return row;
  }

  function setRole(actor: SessionUser, id: string, role: Role) {
    const target = findUser(id);
    if (target.id === actor.id && role !== 'admin') throw badRequest('You cannot take the admin role from yourself.');
    db.update(user).set({ role, updatedAt: new Date() }).where(eq(user.id, id)).run();
    audit.record(actor, { action: 'role.change', entity: 'user', entityId: id, details: { from: target.role, to: role } });
    return { id, role };
  }

  async function setActive(actor: SessionUser, id: string, active: boolean, headers: Headers) {
    const target = findUser(id);
    if (target.id === actor.id) throw badRequest('You cannot deactivate yourself.');
    if (active) await auth.api.unbanUser({ headers, body: { userId: id } });
    else await auth.api.banUser({ headers, body: { userId: id, banReason: 'Deactivated by an admin' } });
    audit.record(actor, { action: active ? 'user.reactivate' : 'user.deactivate', entity: 'user', entityId: id });
    return { id, banned: !active };
  }

  async function invite(actor: SessionUser, input: InviteInput) {
    const email = input.email.toLowerCase();
    if (input.stationId && !db.select({ id: station.id }).from(station).where(eq(station.id, input.stationId)).get()) {
      throw badRequest('That station does not exist.', { stationId: 'Pick an existing station.' });
    }
    if (db.select({ id: user.id }).from(user).where(eq(user.email, email)).get()) {
      throw conflict('Someone with that e-mail address already has an account.', 'email_taken');
    }
    // No password yet: the person sets it through the link.
    const created = await auth.api.createUser({ body: { email, name: input.name, role: input.role } });
    const token = randomBytes(32).toString('base64url');
    const now = Date.now();
    db.insert(invitation)
      .values({
        email,
        name: input.name,
        role: input.role,
        tokenHash: hashToken(token),
        invitedBy: actor.id,
        stationId: input.stationId ?? null,
        createdAt: new Date(now),
        expiresAt: new Date(now + INVITATION_HOURS * 3600_000),
        userId: created.user.id,
      })
      .run();
    const url = `${ctx.appUrl}/accept-invite?token=${encodeURIComponent(token)}`;
    await ctx.mailer.send(
      composeMail({
        to: email,
        subject: 'You are invited to Bootwright',
        paragraphs: [
          `Hello ${input.name},`,
          `${actor.name} invited you to Bootwright as ${input.role}. Open the link to choose your password.`,
          `The link works once and expires in ${INVITATION_HOURS} hours.`,
        ],
        link: { label: 'Choose your password', url },
      }),
    );
    audit.record(actor, { action: 'user.invite', entity: 'user', entityId: created.user.id, details: { email, role: input.role } });
    return { id: created.user.id, email, role: input.role };
  }

  function openInvitation(token: string) {
    const row = db
      .select()
      .from(invitation)
      .where(and(eq(invitation.tokenHash, hashToken(token)), isNull(invitation.usedAt), gt(invitation.expiresAt, new Date())))
      .get();
    if (!row) throw new HttpError(410, 'invitation_invalid', 'This invitation link has expired or was already used. Ask your admin for a new one.');
    return row;
  }

  async function accept(token: string, password: string) {
    const row = openInvitation(token);
    const authCtx = await auth.$context;
    const hash = await authCtx.password.hash(password);
    const claimed = db
      .update(invitation)
      .set({ usedAt: new Date() })
      .where(and(eq(invitation.id, row.id), isNull(invitation.usedAt)))
      .run();
    if (claimed.changes !== 1) throw new HttpError(410, 'invitation_invalid', 'This invitation link was already used.');
    await authCtx.internalAdapter.linkAccount({ providerId: 'credential', accountId: row.userId!, userId: row.userId!, password: hash });
    // An office user invited for a station becomes that station's user.
    if (row.role === 'user' && row.stationId) {
      db.update(station).set({ userId: row.userId, updatedAt: new Date() }).where(eq(station.id, row.stationId)).run();
    }
    audit.record({ id: row.userId!, email: row.email }, { action: 'user.accept-invite', entity: 'user', entityId: row.userId });
    return { email: row.email };
  }

  return { list, setRole, setActive, invite, openInvitation, accept };
}
