/**
 * Every text file the bundle writes is DOS text: CR LF line ends only (REFERENCES 5.1), code page 437
 * (REFERENCES 5.6; checked through iconv-lite's cp437 table: an accented station name is one CP437 byte,
 * never UTF-8), no control characters (a Ctrl-Z would end the file for TYPE, REFERENCES 2.15), and at most
 * 80 columns. MANIFEST.CSV is the one exception to the width (a SHA-256 alone is 64 characters); the
 * PCs' own startup files are passed through as they are and not checked here.
 */
import iconv from 'iconv-lite';
import { demoBundleSite } from '@/generators/bundle';
import type { BundleSite } from '@/generators/bundle';
import { bundleBuffer, zipEntries } from '@/tests/support/bundle-zip';

const OURS = /(^|\/)(README\.TXT|STATIONS\.TXT|SURVEY\.TXT|MANIFEST\.CSV|SHEET\.TXT|INSTALL\.BAT|UNDO\.BAT|RESTORE\.BAT|CHANGES\.DIF)$/;

function problems(name: string, bytes: Uint8Array): string[] {
  const out: string[] = [];
  const b = Buffer.from(bytes);
  for (let i = 0; i < b.length; i++) {
    if (b[i] === 0x0a && b[i - 1] !== 0x0d) out.push(`${name}: LF without CR at ${i}`);
    if (b[i] === 0x0d && b[i + 1] !== 0x0a) out.push(`${name}: CR without LF at ${i}`);
    if (b[i] < 0x20 && b[i] !== 0x0d && b[i] !== 0x0a) out.push(`${name}: control byte ${b[i]} at ${i}`);
  }
  if (b.length > 0 && !b.subarray(-2).equals(Buffer.from('\r\n'))) out.push(`${name}: last line has no CR LF`);
  // 0xC3 followed by a continuation byte is how UTF-8 writes é and friends: never in CP437 text here.
  if (/\xc3[\x80-\xbf]/.test(b.toString('latin1'))) out.push(`${name}: looks like UTF-8`);
  if (!name.endsWith('MANIFEST.CSV')) {
    const text = iconv.decode(b, 'cp437');
    text.split('\r\n').forEach((line, i) => {
      if (line.length > 80) out.push(`${name}: line ${i + 1} has ${line.length} columns`);
    });
  }
  return out;
}

describe('bundle text files', () => {
  // A site that makes every text file: the demo office plus desks with accented names, and a long address.
  const site: BundleSite = { ...demoBundleSite(40), address: 'Unit 4, 14 Kiln Yard, Eastbridge, a rather long address line for the sheet header that must wrap' };
  let entries: Map<string, Uint8Array>;

  beforeAll(async () => {
    entries = await zipEntries(await bundleBuffer(site));
  });

  it('writes CR LF only, CP437, no control bytes and at most 80 columns', () => {
    const texts = [...entries.keys()].filter((n) => OURS.test(n));
    expect(texts.length).toBeGreaterThan(site.pcs.length * 5);
    expect(texts.flatMap((n) => problems(n, entries.get(n)!))).toEqual([]);
  });

  it('the check itself fails on LF, UTF-8, a Ctrl-Z and a long line', () => {
    expect(problems('X.TXT', Buffer.from('a\nb\r\n'))).toEqual(['X.TXT: LF without CR at 1']);
    expect(problems('X.TXT', Buffer.from('Réception\r\n', 'utf8'))).toEqual(['X.TXT: looks like UTF-8']);
    expect(problems('X.TXT', Buffer.from('a\x1a\r\n'))).toEqual(['X.TXT: control byte 26 at 1']);
    expect(problems('X.TXT', Buffer.from(`${'x'.repeat(81)}\r\n`))).toEqual(['X.TXT: line 1 has 81 columns']);
  });

  it('writes an accented station name as its CP437 byte (é = 82h)', () => {
    const stations = Buffer.from(entries.get('STATIONS.TXT')!);
    expect(site.stations.some((s) => s.name.startsWith('Réception annex'))).toBe(true);
    expect(stations.includes(Buffer.from([0x52, 0x82, 0x63]))).toBe(true); // "Réc"
    expect(iconv.decode(stations, 'cp437')).toContain('Réception annex 1');
  });
});
