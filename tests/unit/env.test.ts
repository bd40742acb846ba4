import { readEnv } from '@/server/env';

describe('environment', () => {
  it('has embedded defaults for a fresh machine', () => {
    const env = readEnv({});
    expect(env).toMatchObject({ PORT: 3000, DATABASE_URL: 'data/bootwright.db', SEED_ON_EMPTY: true, SEED_DEMO_PLANS: true, WEB_DIR: 'dist' });
    expect(env.SMTP_URL).toBeUndefined();
  });

  it('refuses bad values with one readable message', () => {
    expect(() => readEnv({ PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => readEnv({ BETTER_AUTH_SECRET: 'short' })).toThrow(/BETTER_AUTH_SECRET/);
  });
});
