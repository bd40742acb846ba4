// The survey report download: code page 437 bytes (checked by decoding with iconv-lite's cp437 table),
// CR LF line ends only, at most 80 columns, the demo's readings as entered, the checks and cautions; the
// same bytes from surveyReportForSite for the rollout bundle; the download audited.
import iconv from 'iconv-lite';
import { and, eq } from 'drizzle-orm';
import { auditEvent } from '@/db/schema';
import { analyzeSurvey, renderSurveyReport } from '@/generators/survey';
import { surveyReportForSite } from '@/server/survey/report';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import { addEmptySite, demoSiteId, getView } from '../support/survey';

let t: TestApp;
let siteId: number;

beforeAll(async () => {
  t = await makeTestApp();
  siteId = await demoSiteId(await t.signIn(DEMO.lead));
});
afterAll(async () => {
  await t.close();
});

/** supertest buffers a body of an unknown charset only when told to. */
async function download(path: string) {
  const agent = await t.signIn(DEMO.lead);
  return agent.get(path).buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });
}

describe('GET /api/sites/:id/survey/report.txt', () => {
  let bytes: Buffer;
  let text: string;
  beforeAll(async () => {
    const res = await download(`/api/sites/${siteId}/survey/report.txt`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/plain; charset=IBM437');
    expect(res.headers['content-disposition']).toBeUndefined();
    bytes = res.body as Buffer;
    text = iconv.decode(bytes, 'cp437');
  });

  it('ends every line with CR LF and has no bare CR or LF', () => {
    expect(bytes.length).toBeGreaterThan(2000);
    expect(bytes.subarray(-2).toString('latin1')).toBe('\r\n');
    for (let i = 0; i < bytes.length; i++) {
      if (bytes[i] === 0x0a) expect(bytes[i - 1]).toBe(0x0d);
      if (bytes[i] === 0x0d) expect(bytes[i + 1]).toBe(0x0a);
    }
  });

  it('keeps every line within 80 columns (one byte is one column in CP437)', () => {
    const lines = bytes.toString('latin1').split('\r\n');
    expect(lines.length).toBeGreaterThan(50);
    expect(Math.max(...lines.map((l) => l.length))).toBeLessThanOrEqual(80);
  });

  it('decodes as code page 437 and encodes back to the same bytes (iconv-lite cp437)', () => {
    expect(Buffer.compare(iconv.encode(text, 'cp437'), bytes)).toBe(0);
    // Ω is 0xEA in code page 437 (iconv-lite's table); the report prints loop resistance in ohms.
    expect(bytes.includes(0xea)).toBe(true);
    expect(text).toContain('Ω');
    expect(text).not.toContain('\uFFFD');
  });

  it('carries the readings as entered, the runs, the checks and the cautions', () => {
    expect(text).toContain('BOOTWRIGHT WIRING SURVEY REPORT');
    expect(text).toContain('Site: Halvorsen & Pike Architects');
    expect(text).toMatch(/Generated: \d{4}-\d\d-\d\d \d\d:\d\d UTC/);
    expect(text).toContain('47.85'); // J-05 pair 1, as seeded
    expect(text).toContain('tested by Tess Varga, 2026-03-02 09:15');
    expect(text).toMatch(/r-09\s+wall\s+540\s+22/);
    expect(text).toContain('ERROR spoke-too-long');
    expect(text).toContain('ERROR terminator-missing');
    expect(text).toContain('48 V DC');
    expect(text).toContain('NEC Article 800');
  });

  it('is recorded in the audit trail as a download', () => {
    const events = t.ctx.db.select().from(auditEvent)
      .where(and(eq(auditEvent.action, 'survey.report.download'), eq(auditEvent.siteId, siteId))).all();
    expect(events.length).toBeGreaterThanOrEqual(1);
    expect(events[0]).toMatchObject({ actorEmail: DEMO.lead, details: expect.objectContaining({ bytes: bytes.length }) });
  });

  it('names a file when asked to download', async () => {
    const res = await download(`/api/sites/${siteId}/survey/report.txt?download=1`);
    expect(res.headers['content-disposition']).toBe(`attachment; filename="SURVEY${siteId}.TXT"`);
  });
});

describe('surveyReportForSite (for the rollout bundle)', () => {
  it('gives the same bytes as rendering the view the API serves', async () => {
    const view = await getView(await t.signIn(DEMO.technician), siteId);
    const fromBundle = surveyReportForSite(t.ctx, siteId, { generatedAt: '2026-03-04 10:00 UTC' });
    const expected = renderSurveyReport(view.input, analyzeSurvey(view.input), { generatedAt: '2026-03-04 10:00 UTC' });
    expect(fromBundle).not.toBeNull();
    expect(Buffer.from(fromBundle!).equals(Buffer.from(expected))).toBe(true);
  });

  it('answers null for an unknown site and for a site with nothing surveyed', () => {
    expect(surveyReportForSite(t.ctx, 424242)).toBeNull();
    expect(surveyReportForSite(t.ctx, addEmptySite(t))).toBeNull();
  });
});
