// Loads the demo scenario into an empty database (or on `npm run seed`).
import { count } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import { kit, profile, site, startupFile, station, user } from '@/db/schema';
import type { AppContext } from '../context';
import { seedDemoSurvey } from '../survey/seed';
import { DEMO_FILES } from './demo-files';
import { seedDemoPlans } from './demo-plans';
import { DEMO_ACCOUNTS, DEMO_KIT, DEMO_OTHER_STATIONS, DEMO_PASSWORD, DEMO_PCS, DEMO_RANGES, DEMO_SITE, demoProfile } from './demo-data';

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

/** Seeds when there is no user yet; returns true when it did. */
export async function seedIfEmpty(ctx: AppContext): Promise<boolean> {
  const users = ctx.db.select({ n: count() }).from(user).get()!.n;
  if (users > 0) return false;
  await seedDemo(ctx);
  if (ctx.env.SEED_DEMO_PLANS) await seedDemoPlans(ctx);
  return true;
}

export async function seedDemo(ctx: AppContext) {
  const ids: Record<string, string> = {};
  for (const a of DEMO_ACCOUNTS) {
    const existing = await ctx.auth.api.createUser({ body: { email: a.email, name: a.name, role: a.role, password: DEMO_PASSWORD } });
    ids[a.role === 'user' ? 'user' : a.email] = existing.user.id;
  }
  const now = new Date();
  const db = ctx.db;
  db.transaction((tx) => {
    const [s] = tx.insert(site).values({ ...DEMO_SITE, numberRanges: DEMO_RANGES, createdAt: now, updatedAt: now }).returning().all();
    const [k] = tx.insert(kit).values({ ...DEMO_KIT, createdAt: now, updatedAt: now }).returning().all();
    const techId = ids['tech@bootwright.test'];
    for (const pc of DEMO_PCS) {
      const [st] = tx
        .insert(station)
        .values({
          siteId: s.id,
          kind: 'pc',
          name: pc.name,
          number: pc.number,
          location: pc.location,
          userId: pc.name === 'RECEPT' ? ids.user : null,
          createdAt: now,
          updatedAt: now,
        })
        .returning()
        .all();
      tx.insert(profile).values({ stationId: st.id, data: demoProfile(pc), kitId: k.id, wizardStep: 'preview', updatedBy: techId, updatedAt: now }).run();
      const files = DEMO_FILES[pc.name];
      for (const kind of ['AUTOEXEC.BAT', 'CONFIG.SYS'] as const) {
        const text = kind === 'AUTOEXEC.BAT' ? files.autoexec : files.config;
        const content = Buffer.from(text ?? '', 'latin1');
        tx.insert(startupFile)
          .values({
            stationId: st.id,
            kind,
            absent: text === null,
            content,
            sha256: sha256(content),
            size: content.length,
            source: text === null ? 'none' : 'seed',
            uploadedBy: techId,
            uploadedAt: now,
          })
          .run();
      }
    }
    for (const o of DEMO_OTHER_STATIONS) {
      tx.insert(station).values({ siteId: s.id, ...o, createdAt: now, updatedAt: now }).run();
    }
  });
  seedDemoSurvey(ctx);
  ctx.audit.record(null, { action: 'seed', entity: 'system', details: { accounts: DEMO_ACCOUNTS.length, pcs: DEMO_PCS.length } });
}
