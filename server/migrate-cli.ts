// `npm run db:migrate`: applies drizzle-kit's migrations to the database named by DATABASE_URL.
import { openDatabase } from './db';
import { readEnv } from './env';

const env = readEnv();
openDatabase(env.DATABASE_URL).$client.close();
console.log(`Migrated ${env.DATABASE_URL}.`);
