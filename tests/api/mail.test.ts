// The plan loop's mail, read from the local fake: plan sent for review (to the leads), approved and
// returned (to its technician), a user's file received (to the technicians). Each is a plain-text and HTML
// pair whose link opens a route of the app that the recipient may read.
import { existsSync } from 'node:fs';
import path from 'node:path';
import type request from 'supertest';
import type { StoredMail } from '@/server/mail/fake-smtp';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import { createPlan, stationIdOf, submitPlan, type PlanBody } from '../support/plan-helpers';

let t: TestApp;
let tech: request.Agent;
let lead: request.Agent;
beforeAll(async () => {
  t = await makeTestApp();
  tech = await t.signIn(DEMO.technician);
  lead = await t.signIn(DEMO.lead);
});
afterAll(async () => {
  await t.close();
});

const mails = () => t.ctx.mailer.fake!.list();
const newest = (subject: RegExp) => mails().filter((m) => subject.test(m.subject));

/** The one link in the message: the same URL in the text and the HTML. */
function linkOf(m: StoredMail): URL {
  const inText = m.text.match(/https?:\/\/\S+/g) ?? [];
  const inHtml = [...m.html.matchAll(/href="([^"]+)"/g)].map((x) => x[1]!);
  expect(inText).toHaveLength(1);
  expect(inHtml).toEqual(inText);
  const url = new URL(inText[0]!);
  expect(url.origin).toBe(new URL(t.ctx.appUrl).origin);
  return url;
}

/** The app has a route file for the link's path (Expo Router: a [id].tsx under some groups). */
function routeExists(urlPath: string): boolean {
  const [, section, id] = urlPath.split('/');
  expect(id).toMatch(/^\d+$/);
  const candidates = { review: 'app/(app)/(lead)/review/[id].tsx', plans: 'app/(app)/plans/[id].tsx' } as Record<string, string>;
  return !!candidates[section!] && existsSync(path.join(__dirname, '..', '..', candidates[section!]!));
}

async function opens(agent: request.Agent, url: URL, planId: number) {
  expect(url.pathname.endsWith(`/${planId}`)).toBe(true);
  expect(routeExists(url.pathname)).toBe(true);
  expect((await agent.get(`/api/plans/${planId}`)).status).toBe(200);
}

describe('plan mail', () => {
  let sent: PlanBody;

  it('tells every lead when a plan is sent for review', async () => {
    const p = await createPlan(tech, stationIdOf(t, 'STUDIO'));
    sent = (await submitPlan(tech, p)).body;
    const got = newest(/^Plan for STUDIO waits for your review$/);
    expect(got).toHaveLength(1);
    expect(got[0]!.to.sort()).toEqual([DEMO.lead, DEMO.lead2].sort());
    expect(got[0]!.text).toMatch(/Tess Varga sent revision 1/);
    expect(got[0]!.html).toMatch(/<p>Tess Varga sent revision 1/);
    const url = linkOf(got[0]!);
    expect(url.pathname).toBe(`/review/${p.plan.id}`);
    await opens(lead, url, p.plan.id);
  });

  it('tells the technician who sent it when a lead approves', async () => {
    await lead.post(`/api/plans/${sent.plan.id}/approve`).send({ version: sent.plan.version, planHash: sent.plan.planHash });
    const got = newest(/^Plan for STUDIO approved$/);
    expect(got).toHaveLength(1);
    expect(got[0]!.to).toEqual([DEMO.technician]);
    const url = linkOf(got[0]!);
    expect(url.pathname).toBe(`/plans/${sent.plan.id}`);
    await opens(tech, url, sent.plan.id);
  });

  it('tells the technician with the lead’s comment when a lead returns a plan', async () => {
    const tech2 = await t.signIn(DEMO.technician2);
    const p = await createPlan(tech, stationIdOf(t, 'DRAFT2'));
    const s = (await submitPlan(tech2, p)).body as PlanBody;
    await lead.post(`/api/plans/${p.plan.id}/return`).send({ version: s.plan.version, comment: 'Confirm that MENU is the final program.' });
    const got = newest(/^Plan for DRAFT2 returned$/);
    expect(got).toHaveLength(1);
    expect(got[0]!.to).toEqual([DEMO.technician2]);
    expect(got[0]!.text).toContain('Comment: Confirm that MENU is the final program.');
    await opens(tech2, linkOf(got[0]!), p.plan.id);
  });

  it('tells the technicians when an office user sends their file', async () => {
    const user = await t.signIn(DEMO.user);
    const recept = stationIdOf(t, 'RECEPT');
    const res = await user.post(`/api/my-station/${recept}/send`).send({ autoexec: { encoding: 'text', data: '@ECHO OFF\nPATH C:\\DOS\nWP\n' } });
    expect(res.status).toBe(201);
    const got = newest(/^Priya Nair sent the startup files of RECEPT$/);
    expect(got).toHaveLength(1);
    expect(got[0]!.to.sort()).toEqual([DEMO.technician, DEMO.technician2].sort());
    expect(got[0]!.text).toMatch(/sent AUTOEXEC\.BAT from RECEPT/);
    const url = linkOf(got[0]!);
    expect(url.pathname).toBe(`/plans/${res.body.planId}`);
    await opens(tech, url, res.body.planId);
  });
});
