// Helpers for the survey API tests: the demo site's survey and a second, empty site.
import type request from 'supertest';
import { site } from '@/db/schema';
import type { SurveyView } from '@/db/requests/survey';
import type { TestApp } from './test-app';

export const DEMO_SITE_NAME = 'Halvorsen & Pike Architects';

export async function demoSiteId(agent: request.Agent): Promise<number> {
  const res = await agent.get('/api/survey/sites');
  const found = (res.body.items as Array<{ id: number; name: string }>).find((s) => s.name === DEMO_SITE_NAME);
  if (!found) throw new Error(`demo site missing: ${res.status} ${JSON.stringify(res.body)}`);
  return found.id;
}

export async function getView(agent: request.Agent, siteId: number): Promise<SurveyView> {
  const res = await agent.get(`/api/sites/${siteId}/survey`);
  if (res.status !== 200) throw new Error(`survey view: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as SurveyView;
}

/** A second site with nothing surveyed, written straight into the database. */
export function addEmptySite(t: TestApp, name = 'Okonkwo Dental Group'): number {
  const now = new Date();
  const row = t.ctx.db
    .insert(site)
    .values({ name, numberRanges: { pc: [1, 99], printer: [100, 149], modem: [150, 199], other: [200, 254] }, createdAt: now, updatedAt: now })
    .returning()
    .get();
  return row.id;
}

export function byRef<T extends { ref: string }>(rows: T[], ref: string): T {
  const row = rows.find((r) => r.ref === ref);
  if (!row) throw new Error(`no row ${ref}`);
  return row;
}
