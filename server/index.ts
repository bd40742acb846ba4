// Starts Bootwright: reads the environment, migrates, seeds an empty database, listens, shuts down cleanly.
import { createApp } from './app';
import { createContext } from './context';
import { readEnv } from './env';
import { seedIfEmpty } from './seed/seed';

async function main() {
  const env = readEnv();
  const ctx = await createContext(env);
  if (env.SEED_ON_EMPTY && (await seedIfEmpty(ctx))) ctx.log('loaded the demo data into the empty database');
  const server = createApp(ctx).listen(env.PORT, env.HOST, () => {
    ctx.log(`Bootwright listening on ${ctx.appUrl} (database ${env.DATABASE_URL})`);
  });
  const stop = () => {
    server.close(() => {
      void ctx.close().then(() => process.exit(0));
    });
    setTimeout(() => process.exit(0), 3000).unref();
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
