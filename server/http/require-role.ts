// The one middleware that guards every non-public route: a session (401 without) and a role (403 if wrong).
import { fromNodeHeaders } from 'better-auth/node';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { Auth } from '../auth';
import { isRole, type Role } from '../roles';

export type SessionUser = { id: string; email: string; name: string; role: Role };

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      user?: SessionUser;
    }
  }
}

export function makeRequireRole(auth: Auth) {
  return function requireRole(...allowed: Role[]): RequestHandler {
    return async (req: Request, res: Response, next: NextFunction) => {
      const session = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
      if (!session) {
        res.status(401).json({ error: { code: 'unauthenticated', message: 'Please sign in.' } });
        return;
      }
      const role = session.user.role;
      if (!isRole(role) || session.user.banned) {
        res.status(403).json({ error: { code: 'forbidden', message: 'This account has no access.' } });
        return;
      }
      if (allowed.length > 0 && !allowed.includes(role)) {
        res.status(403).json({ error: { code: 'forbidden', message: 'Your role may not use this.' } });
        return;
      }
      req.user = { id: session.user.id, email: session.user.email, name: session.user.name, role };
      next();
    };
  };
}

export type RequireRole = ReturnType<typeof makeRequireRole>;

/** The signed-in user; only call after requireRole. */
export function currentUser(req: Request): SessionUser {
  if (!req.user) throw new Error('currentUser() called on a route without requireRole');
  return req.user;
}
