// A real Bootwright app on a fresh temporary database, with the local mail fake, for supertest.
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '@/server/app';
import { createContext, type AppContext } from '@/server/context';
import { readEnv } from '@/server/env';
import { seedDemo } from '@/server/seed/seed';
import { DEMO_PASSWORD } from '@/server/seed/demo-data';

export const ORIGIN = 'http://localhost:3000';

export type TestApp = {
  ctx: AppContext;
  app: Express;
  /** A supertest agent signed in as the given demo e-mail (cookies kept). */
  signIn(email: string, password?: string): Promise<request.Agent>;
  close(): Promise<void>;
};

export async function makeTestApp(opts: { seed?: boolean; env?: Record<string, string> } = {}): Promise<TestApp> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'bootwright-test-'));
  const env = readEnv({
    DATABASE_URL: path.join(dir, 'test.db'),
    PORT: '3000',
    LOG_LEVEL: 'silent',
    SIGNIN_RATE_MAX: '50',
    WEB_DIR: path.join(dir, 'no-web'),
    ...opts.env,
  });
  const ctx = await createContext(env);
  if (opts.seed !== false) await seedDemo(ctx);
  const app = createApp(ctx);
  return {
    ctx,
    app,
    async signIn(email, password = DEMO_PASSWORD) {
      const agent = request.agent(app);
      const res = await agent.post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email, password });
      if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
      return agent;
    },
    async close() {
      await ctx.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export const DEMO = {
  admin: 'admin@bootwright.test',
  lead: 'lead@bootwright.test',
  lead2: 'lead2@bootwright.test',
  technician: 'tech@bootwright.test',
  technician2: 'tech2@bootwright.test',
  user: 'user@bootwright.test',
} as const;
