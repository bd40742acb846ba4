// better-auth keeps its rate-limit counters in module memory, so this runs in a file of its own
// (Jest gives every test file its own module registry).
import request from 'supertest';
import { DEMO, makeTestApp, ORIGIN } from '../support/test-app';

describe('sign-in rate limit', () => {
  it('rate-limits repeated sign-ins from one address', async () => {
    const limited = await makeTestApp({ seed: true, env: { SIGNIN_RATE_MAX: '3' } });
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 5; i++) {
        statuses.push((await request(limited.app).post('/api/auth/sign-in/email').set('Origin', ORIGIN).send({ email: DEMO.admin, password: 'wrong-password-1' })).status);
      }
      expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
      expect(statuses[4]).toBe(429);
    } finally {
      await limited.close();
    }
  });

  it('still answers other routes while sign-in is limited', async () => {
    const t = await makeTestApp({ seed: false });
    try {
      expect((await request(t.app).get('/api/health')).status).toBe(200);
    } finally {
      await t.close();
    }
  });
});
