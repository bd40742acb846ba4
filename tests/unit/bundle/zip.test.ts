/**
 * The bundle as a zip, checked with Info-ZIP (Debian `unzip`): `unzip -t` accepts it, the entries are the
 * planned ones in order, every entry is DEFLATE-compressed and stamped with the record's time, the same
 * input gives the same bytes, and MANIFEST.CSV holds the SHA-256 of every other entry.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildBundle, bundleLayout, demoBundleSite, SAMEFILE_COM } from '@/generators/bundle';
import type { BundleSite } from '@/generators/bundle';
import { decodeCp437 } from '@/generators/dos/cp437';
import { bundleBuffer, tempDir, unzipNames, unzipTest, zipEntries } from '@/tests/support/bundle-zip';

const dir = tempDir('bw-bundle-zip-');

function saved(name: string, buffer: Buffer): string {
  const file = join(dir, name);
  writeFileSync(file, buffer);
  return file;
}

/** Minimal RFC 4180 reader for the manifest (quoted fields with doubled quotes). */
function parseCsv(text: string): string[][] {
  return text
    .split('\r\n')
    .filter((l) => l !== '')
    .map((line) => {
      const cells: string[] = [];
      let cell = '';
      let quoted = false;
      for (let i = 0; i < line.length; i++) {
        const ch = line[i];
        if (quoted) {
          if (ch === '"' && line[i + 1] === '"') (cell += '"'), i++;
          else if (ch === '"') quoted = false;
          else cell += ch;
        } else if (ch === '"') quoted = true;
        else if (ch === ',') cells.push(cell), (cell = '');
        else cell += ch;
      }
      cells.push(cell);
      return cells;
    });
}

describe('bundle zip', () => {
  const site = demoBundleSite();
  let buffer: Buffer;
  let file: string;

  beforeAll(async () => {
    buffer = await bundleBuffer(site);
    file = saved('demo.zip', buffer);
  });

  it('passes unzip -t and lists exactly the planned entries in order', () => {
    const verdict = unzipTest(file);
    expect(verdict.output).toContain('No errors detected');
    expect(verdict.status).toBe(0);
    expect(unzipNames(file)).toEqual(bundleLayout(site));
  });

  it('stamps every entry with the record time and DEFLATEs it (Info-ZIP zipinfo: defN = normal level)', () => {
    const res = spawnSync('unzip', ['-Z', '-T', '-l', file], { encoding: 'utf8', env: { ...process.env, TZ: 'UTC' } });
    const rows = res.stdout.split('\n').filter((l) => /^-/.test(l));
    expect(rows).toHaveLength(bundleLayout(site).length);
    for (const row of rows) {
      expect(row).toContain('20260310.143000');
      expect(row).toMatch(/\bdefN\b/);
    }
  });

  it('gives the same bytes for the same input, whatever the order of the PCs and stations', async () => {
    expect((await bundleBuffer(site)).equals(buffer)).toBe(true);
    const shuffled: BundleSite = { ...site, pcs: [...site.pcs].reverse(), stations: [...site.stations].reverse() };
    expect((await bundleBuffer(shuffled)).equals(buffer)).toBe(true);
    const later: BundleSite = { ...site, generatedAt: '2026-03-11T09:00:00.000Z' };
    expect((await bundleBuffer(later)).equals(buffer)).toBe(false);
  });

  it('carries the startup files byte for byte and SAMEFILE.COM in every PC folder', async () => {
    const entries = await zipEntries(buffer);
    for (const pc of site.pcs) {
      const f = pc.stationName;
      expect(Buffer.from(entries.get(`${f}/AUTOEXEC.BAT`)!).equals(Buffer.from(pc.autoexecNew))).toBe(true);
      if (pc.autoexecOld) expect(Buffer.from(entries.get(`${f}/AUTOEXEC.OLD`)!).equals(Buffer.from(pc.autoexecOld))).toBe(true);
      if (pc.configOld) expect(Buffer.from(entries.get(`${f}/CONFIG.OLD`)!).equals(Buffer.from(pc.configOld))).toBe(true);
      if (pc.configNew) expect(Buffer.from(entries.get(`${f}/CONFIG.SYS`)!).equals(Buffer.from(pc.configNew))).toBe(true);
      expect(Buffer.from(entries.get(`${f}/SAMEFILE.COM`)!).equals(Buffer.from(SAMEFILE_COM))).toBe(true);
    }
  });

  it('lists every other entry in MANIFEST.CSV with its station, plan and SHA-256', async () => {
    const entries = await zipEntries(buffer);
    const [head, ...rows] = parseCsv(decodeCp437(entries.get('MANIFEST.CSV')!));
    expect(head).toEqual(['station_number', 'station_name', 'folder', 'file', 'plan_revision', 'plan_hash', 'approved_by', 'approved_at', 'sha256']);
    const names = bundleLayout(site).filter((n) => n !== 'MANIFEST.CSV');
    expect(rows.map((r) => (r[2] ? `${r[2]}/${r[3]}` : r[3]))).toEqual(names);
    for (const row of rows) {
      const name = row[2] ? `${row[2]}/${row[3]}` : row[3];
      expect(row[8]).toBe(createHash('sha256').update(entries.get(name)!).digest('hex'));
      if (row[2]) {
        const pc = site.pcs.find((p) => String(p.stationNumber) === row[0])!;
        expect([row[1], row[4], row[5], row[6], row[7]]).toEqual([pc.stationName, pc.planRevisionId, pc.planHash, pc.approvedBy, pc.approvedAt]);
      }
    }
  });

  it('puts the survey report in when there is one, else a placeholder that says none was recorded', async () => {
    const plain = await zipEntries(buffer);
    expect(decodeCp437(plain.get('SURVEY.TXT')!)).toContain('No wiring survey was recorded');
    const report = Buffer.from('WIRING SURVEY\r\nPair 2 free at every jack.\r\n', 'latin1');
    const withSurvey = await zipEntries(await bundleBuffer({ ...site, surveyReport: report }));
    expect(Buffer.from(withSurvey.get('SURVEY.TXT')!).equals(report)).toBe(true);
  });

  it('reports progress per PC folder up to the total', async () => {
    const seen: Array<[number, number]> = [];
    await bundleBuffer(site, { onProgress: (done, total) => seen.push([done, total]) });
    expect(seen).toEqual(site.pcs.map((_, i) => [i + 1, site.pcs.length]));
  });

  it('builds a valid zip for a site with no PC plans, and refuses a time a zip cannot hold', async () => {
    const empty = saved('empty.zip', await bundleBuffer({ ...site, pcs: [] }));
    expect(unzipTest(empty).status).toBe(0);
    expect(unzipNames(empty)).toEqual(['README.TXT', 'STATIONS.TXT', 'SURVEY.TXT', 'MANIFEST.CSV']);
    expect(() => buildBundle({ ...site, generatedAt: '1975-01-01T00:00:00Z' })).toThrow(/1980-2107/);
    expect(() => buildBundle({ ...site, generatedAt: 'yesterday' })).toThrow(RangeError);
  });

  it("with Node's zlib as the deflater still writes a zip Info-ZIP accepts, with the same entries and contents", async () => {
    const fast = await bundleBuffer(site, { deflate: 'node-zlib' });
    const fastFile = saved('zlib.zip', fast);
    expect(unzipTest(fastFile).status).toBe(0);
    expect(unzipNames(fastFile)).toEqual(bundleLayout(site));
    const a = await zipEntries(fast);
    const b = await zipEntries(buffer);
    expect([...a.keys()]).toEqual([...b.keys()]);
    for (const [name, bytes] of a) expect(Buffer.from(bytes).equals(Buffer.from(b.get(name)!))).toBe(true);
  });

  it('fails the stream, not the process, when a plan cannot be rendered', async () => {
    const bad: BundleSite = { ...site, pcs: [{ ...site.pcs[0], bootDrive: '1' }] };
    await expect(bundleBuffer(bad)).rejects.toThrow(/drive letter/);
  });
});
