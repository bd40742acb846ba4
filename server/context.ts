// Everything a route needs, built once at start (or once per test with a temporary database).
import { createAudit, type Audit } from './audit/audit';
import { createAuth, type Auth } from './auth';
import { openDatabase, type Db } from './db';
import { appUrl, type Env } from './env';
import { makeRequireRole, type RequireRole } from './http/require-role';
import { createMailer, type Mailer } from './mail/mailer';

export type Logger = (msg: string, err?: unknown) => void;

export type AppContext = {
  env: Env;
  db: Db;
  auth: Auth;
  mailer: Mailer;
  audit: Audit;
  requireRole: RequireRole;
  log: Logger;
  /** Public origin for links in mail. */
  appUrl: string;
  close(): Promise<void>;
};

export function makeLogger(level: Env['LOG_LEVEL']): Logger {
  return (msg, err) => {
    if (level === 'silent') return;
    if (err) console.error(`[bootwright] ${msg}`, err);
    else if (level === 'info') console.log(`[bootwright] ${msg}`);
  };
}

export async function createContext(env: Env): Promise<AppContext> {
  const log = makeLogger(env.LOG_LEVEL);
  const db = openDatabase(env.DATABASE_URL);
  const auth = createAuth(db, env);
  const mailer = await createMailer({ smtpUrl: env.SMTP_URL, fakePort: env.MAIL_FAKE_PORT, from: env.MAIL_FROM, log });
  return {
    env,
    db,
    auth,
    mailer,
    audit: createAudit(db),
    requireRole: makeRequireRole(auth),
    log,
    appUrl: appUrl(env),
    async close() {
      await mailer.close();
      db.$client.close();
    },
  };
}
