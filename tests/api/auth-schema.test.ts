// db/auth-schema.ts is written by hand; this compares it with what better-auth itself expects for our
// options (its getAuthTables), so an upgrade that adds a field fails here instead of at sign-in.
import { getAuthTables } from 'better-auth/db';
import { getTableColumns } from 'drizzle-orm';
import * as authSchema from '@/db/auth-schema';
import { makeTestApp } from '../support/test-app';

it('has every table and field better-auth asks for', async () => {
  const t = await makeTestApp({ seed: false });
  try {
    const tables = getAuthTables(t.ctx.auth.options);
    for (const [key, table] of Object.entries(tables)) {
      const ours = (authSchema as Record<string, unknown>)[table.modelName ?? key];
      expect(ours).toBeDefined();
      const columns = Object.keys(getTableColumns(ours as never));
      const wanted = Object.entries(table.fields).map(([name, f]) => (f as { fieldName?: string }).fieldName ?? name);
      expect(columns).toEqual(expect.arrayContaining([...wanted, 'id']));
    }
  } finally {
    await t.close();
  }
});
