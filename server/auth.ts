// better-auth: e-mail and password, sessions in our SQLite database through the Drizzle adapter,
// the admin plugin for roles and deactivation, and its rate limit on sign-in.
import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { admin } from 'better-auth/plugins';
import { createAccessControl } from 'better-auth/plugins/access';
import { adminAc, defaultStatements, userAc } from 'better-auth/plugins/admin/access';
import { PASSWORD_MAX, PASSWORD_MIN } from '@/db/requests/people';
import * as schema from '@/db/schema';
import type { Db } from './db';
import { appUrl, type Env } from './env';

/** Header the server sets from the socket address so the rate limit counts per client. */
export const CLIENT_IP_HEADER = 'x-bootwright-client-ip';

const ac = createAccessControl(defaultStatements);
const roles = {
  admin: ac.newRole(adminAc.statements),
  lead: ac.newRole(userAc.statements),
  technician: ac.newRole(userAc.statements),
  user: ac.newRole(userAc.statements),
};

export function createAuth(db: Db, env: Env) {
  const origin = appUrl(env);
  return betterAuth({
    appName: 'Bootwright',
    baseURL: origin,
    basePath: '/api/auth',
    secret: env.BETTER_AUTH_SECRET,
    trustedOrigins: [origin, `http://localhost:${env.PORT}`, `http://127.0.0.1:${env.PORT}`],
    database: drizzleAdapter(db, { provider: 'sqlite', schema }),
    emailAndPassword: {
      enabled: true,
      // People join by invitation only (server/people): no public sign-up.
      disableSignUp: true,
      minPasswordLength: PASSWORD_MIN,
      maxPasswordLength: PASSWORD_MAX,
    },
    session: { expiresIn: 60 * 60 * 24 * 7, updateAge: 60 * 60 * 24 },
    rateLimit: {
      enabled: true,
      storage: 'memory',
      window: 60,
      max: 300,
      customRules: { '/sign-in/email': { window: 60, max: env.SIGNIN_RATE_MAX } },
    },
    advanced: { ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] } },
    plugins: [admin({ ac, roles, defaultRole: 'user', adminRoles: ['admin'] })],
    telemetry: { enabled: false },
    logger: { disabled: env.LOG_LEVEL === 'silent' },
  });
}

export type Auth = ReturnType<typeof createAuth>;
export type AuthSession = NonNullable<Awaited<ReturnType<Auth['api']['getSession']>>>;
