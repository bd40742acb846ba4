// `npm run seed`: loads the demo scenario into the database named by DATABASE_URL, if it has no users yet.
import { createContext } from './context';
import { readEnv } from './env';
import { seedIfEmpty } from './seed/seed';

async function main() {
  const ctx = await createContext({ ...readEnv(), SMTP_URL: undefined });
  const seeded = await seedIfEmpty(ctx);
  console.log(seeded ? 'Loaded the demo data.' : 'The database already has people in it; nothing was loaded.');
  await ctx.close();
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
