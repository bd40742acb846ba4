// Startup-file revisions: bytes kept exactly, nothing overwritten, bad uploads refused clearly, pasted text
// encoded to code page 437 with line and column for what it cannot hold, and "this machine has none".
import { createHash } from 'node:crypto';
import iconv from 'iconv-lite';
import { DEMO, makeTestApp, type TestApp } from '../support/test-app';
import type request from 'supertest';

let t: TestApp;
let tech: request.Agent;
let stationId: number;
beforeAll(async () => {
  t = await makeTestApp();
  tech = await t.signIn(DEMO.technician);
  stationId = (await tech.post('/api/stations').send({ siteId: 1, kind: 'pc', name: 'UPLOADS', number: 40, kitId: 1 })).body.id;
});
afterAll(async () => {
  await t.close();
});

const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const upload = (bytes: Buffer, kind = 'AUTOEXEC.BAT', filename = 'AUTOEXEC.BAT') =>
  tech.post(`/api/stations/${stationId}/files`).field('kind', kind).attach('file', bytes, { filename, contentType: 'application/octet-stream' });
const raw = async (fileId: number) => {
  const res = await tech.get(`/api/stations/${stationId}/files/${fileId}/raw`).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
  return res.body as Buffer;
};

describe('uploading a startup file', () => {
  // Mixed line ends, a box-drawing byte (B3h, code page 437 "│"), no final CR LF, and a Ctrl-Z with bytes after it.
  const original = Buffer.concat([Buffer.from('@ECHO OFF\r\nECHO '), Buffer.from([0xb3]), Buffer.from(' Studio\nPATH C:\\DOS\rC:\\MENU\\MENU.EXE\x1aJUNK')]);

  it('keeps the bytes exactly and records size, SHA-256, who and when', async () => {
    const res = await upload(original);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'AUTOEXEC.BAT', size: original.length, sha256: sha(original), source: 'upload', absent: false });
    expect(res.body.content).toBeUndefined();
    expect((await raw(res.body.id)).equals(original)).toBe(true);
    const read = (await tech.get(`/api/stations/${stationId}/files/${res.body.id}`)).body;
    // Decoded as code page 437 by iconv-lite, the reference decoder [REFERENCES 5.6].
    expect(read.text).toBe(iconv.decode(original, 'cp437'));
    expect(read.text).toContain('│ Studio');
  });

  it('never overwrites: a second upload is a new revision and the first stays readable', async () => {
    const second = Buffer.from('@ECHO OFF\r\nC:\\MENU\\MENU.EXE\r\n');
    const res = await upload(second);
    const list = (await tech.get(`/api/stations/${stationId}/files`)).body.items as Array<{ id: number; sha256: string }>;
    expect(list[0]).toMatchObject({ id: res.body.id, sha256: sha(second) });
    expect(list[1].sha256).toBe(sha(original));
    expect((await raw(list[1].id)).equals(original)).toBe(true);
    const detail = (await tech.get(`/api/stations/${stationId}`)).body;
    expect(detail.files.autoexec.id).toBe(res.body.id);
  });

  it('refuses a program file with NUL bytes, naming the byte', async () => {
    const exe = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(30, 0), Buffer.from('This program cannot be run')]);
    const res = await upload(exe, 'AUTOEXEC.BAT', 'TLRES.EXE');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('not_text');
    expect(res.body.error.message).toMatch(/NUL byte at byte 3/);
  });

  it('refuses a file of mostly control bytes (not text) even without NUL', async () => {
    const res = await upload(Buffer.from(Array.from({ length: 200 }, (_, i) => 1 + (i % 7))));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/not a text file/);
  });

  it('refuses an empty file and points to “this machine has none”', async () => {
    const res = await upload(Buffer.alloc(0));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/empty.*this machine has none/);
  });

  it('refuses a file over 64 KB with 413 and stores nothing', async () => {
    const before = (await tech.get(`/api/stations/${stationId}/files`)).body.items.length;
    const big = Buffer.from('REM '.padEnd(78, 'x') + '\r\n').toString().repeat(1000);
    expect(Buffer.byteLength(big)).toBeGreaterThan(64 * 1024);
    const res = await upload(Buffer.from(big));
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/larger than 64 KB/);
    expect((await tech.get(`/api/stations/${stationId}/files`)).body.items.length).toBe(before);
    // Exactly 64 KB is still accepted.
    const edge = Buffer.from('REM x\r\n'.repeat(9362) + 'REM').subarray(0, 64 * 1024);
    expect(edge.length).toBe(65536);
    expect((await upload(edge)).status).toBe(201);
  });

  it('refuses an upload without a file, with two files, or with an unknown kind', async () => {
    const none = await tech.post(`/api/stations/${stationId}/files`).field('kind', 'AUTOEXEC.BAT');
    expect(none.status).toBe(400);
    expect(none.body.error.message).toMatch(/No file arrived/);
    const two = await tech
      .post(`/api/stations/${stationId}/files`)
      .field('kind', 'AUTOEXEC.BAT')
      .attach('file', Buffer.from('A\r\n'), 'A.BAT')
      .attach('file', Buffer.from('B\r\n'), 'B.BAT');
    expect(two.status).toBe(400);
    const kind = await upload(Buffer.from('FILES=30\r\n'), 'WIN.INI');
    expect(kind.status).toBe(400);
    expect(kind.body.error.fields.kind).toBeDefined();
  });

  it('refuses uploads from a lead and an office user', async () => {
    for (const email of [DEMO.lead, DEMO.user]) {
      const agent = await t.signIn(email);
      const res = await agent.post(`/api/stations/1/files`).field('kind', 'AUTOEXEC.BAT').attach('file', Buffer.from('@ECHO OFF\r\n'), 'AUTOEXEC.BAT');
      expect(res.status).toBe(403);
    }
  });
});

describe('pasting a startup file', () => {
  const paste = (text: string, kind = 'CONFIG.SYS') => tech.post(`/api/stations/${stationId}/files/paste`).send({ kind, text });

  it('encodes to code page 437 with CR LF line ends, the same bytes iconv-lite gives [REFERENCES 5.6]', async () => {
    const text = 'FILES=30\nBUFFERS=20\r\nREM Büro café ─ ░\n';
    const res = await paste(text);
    expect(res.status).toBe(201);
    const bytes = await raw(res.body.id);
    const expected = iconv.encode('FILES=30\r\nBUFFERS=20\r\nREM Büro café ─ ░\r\n', 'cp437');
    expect(bytes.equals(expected)).toBe(true);
    // ü is 81h and é is 82h in code page 437 (iconv-lite's table; REFERENCES 5.6 names 437 the US page).
    expect(bytes.indexOf(Buffer.from([0x42, 0x81]))).toBeGreaterThan(0);
    expect(bytes.indexOf(Buffer.from([0x63, 0x61, 0x66, 0x82]))).toBeGreaterThan(0);
    expect(res.body.source).toBe('paste');
  });

  it('refuses characters code page 437 cannot hold, with their line and column', async () => {
    const res = await paste('FILES=30\nREM costs 5 €\nREM “quoted” 😀\n');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('not_cp437');
    expect(res.body.error.message).toContain('line 2, column 13: “€” (U+20AC)');
    expect(res.body.error.message).toContain('line 3, column 5: ““” (U+201C)');
    // An emoji is one column, not two UTF-16 halves.
    expect(res.body.error.message).toContain('line 3, column 14: “😀” (U+1F600)');
    // Cross-check: iconv-lite itself cannot round-trip these characters.
    for (const ch of ['€', '“', '😀']) expect(iconv.decode(iconv.encode(ch, 'cp437'), 'cp437')).not.toBe(ch);
  });

  it('refuses pasted NUL characters and empty text', async () => {
    const nul = await paste('FILES=30\nBUF\u0000FERS=10\n');
    expect(nul.status).toBe(400);
    expect(nul.body.error.message).toContain('line 2, column 4: “NUL” (U+0000)');
    expect((await paste('')).status).toBe(400);
  });
});

describe('“this machine has none”', () => {
  it('records an absent file as its own revision, and the plan then creates AUTOEXEC.BAT', async () => {
    const res = await tech.post(`/api/stations/${stationId}/files/none`).send({ kind: 'AUTOEXEC.BAT' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ absent: true, size: 0, source: 'none' });
    expect((await tech.get(`/api/stations/${stationId}/files/${res.body.id}`)).body.text).toBeNull();
    expect((await tech.get(`/api/stations/${stationId}/files/${res.body.id}/raw`)).status).toBe(404);
    const audit = t.ctx.audit.list({ action: 'file.none', limit: 1, offset: 0 });
    expect(audit[0]).toMatchObject({ entityId: String(res.body.id) });

    const data = { dos: '6.22', bootDrive: 'C', dosDir: 'C:\\DOS', ports: [{ name: 'COM1', present: true, attached: 'adapter' }, { name: 'LPT1', present: true, attached: 'none' }], network: { port: 'COM1' }, redirect: { from: 'LPT1', to: 'COM1' }, loader: { args: '/S:40' }, finalProgram: 'auto', loadHigh: 'auto' };
    await tech.put(`/api/stations/${stationId}/profile`).send({ version: 1, kitId: 1, wizardStep: 'preview', data });
    const plan = (await tech.post(`/api/stations/${stationId}/plan`).send({})).body;
    expect(plan.profileError).toBeNull();
    expect(plan.plan.files.autoexec.beforeText).toBeNull();
    expect(plan.plan.files.autoexec.afterText).toContain('C:\\THREAD\\TLRES.COM /S:40 /Q');
  });
});
