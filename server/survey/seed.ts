// The demo site's wiring survey (generators/survey/demo.ts) written into the survey tables, so the demo
// starts with its two flagged problems: the spoke to the model shop over 500 ft and no terminator.
import { eq } from 'drizzle-orm';
import { site, surveyJack, surveyNode, surveyPairTest, surveyRun, surveySettings, surveyTerminator, user } from '@/db/schema';
import { demoSurvey } from '@/generators/survey';
import type { AppContext } from '../context';

/** "2026-03-02T09:15" in the demo is read as UTC, the way the report prints reading times. */
const demoTime = (at: string | undefined, fallback: Date) => (at ? new Date(`${at}:00Z`) : fallback);

export function seedDemoSurvey(ctx: Pick<AppContext, 'db'>): void {
  const survey = demoSurvey();
  const db = ctx.db;
  const target = db.select({ id: site.id }).from(site).where(eq(site.name, survey.siteName)).get();
  if (!target) return;
  const siteId = target.id;
  const now = new Date();
  const stamps = { createdAt: now, updatedAt: now };
  db.transaction((tx) => {
    const jackIds = new Map<string, number>();
    for (const j of survey.jacks) {
      const row = tx.insert(surveyJack).values({ siteId, ref: j.id, label: j.label, room: j.room ?? '', station: j.station ?? '', ...stamps }).returning().get();
      jackIds.set(j.id, row.id);
    }
    const testers = new Map(tx.select({ id: user.id, name: user.name }).from(user).all().map((u) => [u.name, u.id]));
    for (const t of survey.pairTests) {
      tx.insert(surveyPairTest).values({
        siteId,
        jackId: jackIds.get(t.jackId)!,
        pair: t.pair,
        vdcVolts: t.vdc === null ? null : String(t.vdc),
        vacVolts: t.vac === null ? null : String(t.vac),
        continuity: t.continuity,
        testedBy: (t.by && testers.get(t.by)) || null,
        testedByName: t.by ?? '',
        testedAt: demoTime(t.at, now),
        ...stamps,
      }).run();
    }
    const nodeIds = new Map<string, number>();
    for (const n of survey.nodes) {
      const row = tx.insert(surveyNode).values({
        siteId, ref: n.id, kind: n.kind, label: n.label, jackId: n.jackId ? jackIds.get(n.jackId)! : null, ...stamps,
      }).returning().get();
      nodeIds.set(n.id, row.id);
    }
    for (const r of survey.runs) {
      tx.insert(surveyRun).values({
        siteId, ref: r.id, fromNodeId: nodeIds.get(r.from)!, toNodeId: nodeIds.get(r.to)!, lengthFt: r.lengthFt, gauge: r.gauge,
        reverses: r.reverses, kind: r.kind ?? null, ...stamps,
      }).run();
    }
    for (const t of survey.terminators) {
      tx.insert(surveyTerminator).values({ siteId, nodeId: nodeIds.get(t.nodeId)!, ohms: t.ohms, ...stamps }).run();
    }
    tx.insert(surveySettings).values({
      siteId, centreNodeId: survey.centreNodeId ? nodeIds.get(survey.centreNodeId)! : null, networkPair: survey.networkPair ?? '', ...stamps,
    }).run();
  });
}
