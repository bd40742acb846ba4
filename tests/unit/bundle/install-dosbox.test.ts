/**
 * The bundle's installers in a real DOS shell: DOSBox 0.74 (Debian `dosbox`, headless, REFERENCES §7),
 * all cases in one DOSBox start. Each case's C: drive holds one demo PC's original startup files; the
 * bundle, extracted with Info-ZIP `unzip`, is D:. INSTALL must leave C:\AUTOEXEC.BAT and C:\CONFIG.SYS
 * byte-identical to the bundle's new files, UNDO must bring the originals back byte for byte, a changed
 * file or a wrong folder must change nothing, and a later install must never overwrite an earlier backup.
 * DOSBox ignores CONFIG.SYS (REFERENCES 7.1), so CONFIG.SYS is only compared, never booted.
 * DOSBox quirk seen here: after a `>NUL` inside a batch run as `COMMAND /C X > LOG`, the rest of its output
 * goes to the screen, not the log; messages after a COPY are therefore checked on a test copy whose COPY
 * lines have no `>NUL` (bundle F:), file results always on the real bundle.
 */
import { readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { demoBundleSite } from '@/generators/bundle';
import type { BundlePc } from '@/generators/bundle';
import { driveFiles, requireProgram, runBundleCases } from '@/tests/support/bundle-dosbox';
import type { BundleCase, BundleRunResult } from '@/tests/support/bundle-dosbox';
import { tempDir, unzipInto, writeBundle } from '@/tests/support/bundle-zip';

const site = demoBundleSite();
const pcByName = new Map(site.pcs.map((pc) => [pc.stationName, pc]));
const pc = (name: string): BundlePc => pcByName.get(name)!;
const base = tempDir('bw-bundle-dosbox-');
const bundleDir = join(base, 'bundle');
const quietless = join(base, 'quietless');

/** The C: drive of a PC as the plan found it. */
function originals(p: BundlePc): Record<string, Uint8Array | null> {
  return { 'AUTOEXEC.BAT': p.autoexecOld, 'CONFIG.SYS': p.configOld };
}

function bundleFile(folder: string, name: string): Buffer {
  return readFileSync(join(bundleDir, folder, name));
}

/** Drive state as plain data: each file's bytes as a hex digest of its content for readable diffs. */
function state(files: Map<string, Buffer>, keys: string[]): Record<string, string | null> {
  return Object.fromEntries(keys.map((k) => [k, files.has(k) ? files.get(k)!.toString('latin1') : null]));
}

const text = (b: Uint8Array | null) => (b === null ? null : Buffer.from(b).toString('latin1'));
const changed = (b: Uint8Array | null) => Buffer.concat([Buffer.from(b ?? new Uint8Array(0)), Buffer.from('REM changed by hand\r\n')]);

// Demo PCs used (see demo.ts): RECEPT 6.22 both files; PRINCIPL 3.30 with no CONFIG.SYS (plan adds one);
// DRAFT1 5.00, plan leaves CONFIG.SYS; DRAFT2 4.01 with no AUTOEXEC.BAT; INTERN 6.20; ACCOUNTS 3.30 with
// no CONFIG.SYS and none planned; STUDIO 6.22.
const CASES: BundleCase[] = [
  { id: 'A1', folder: 'RECEPT', drive: originals(pc('RECEPT')), steps: ['INSTALL 101'] },
  { id: 'A2', folder: 'RECEPT', drive: originals(pc('RECEPT')), steps: ['INSTALL 101', 'UNDO'] },
  {
    id: 'A3', folder: 'RECEPT', drive: originals(pc('RECEPT')),
    steps: ['INSTALL 101', 'INSTALL 101', 'UNDO', '!ECHO first > C:\\BWSAVE\\001\\MARK.TXT', 'INSTALL 101'],
  },
  { id: 'B1', folder: 'PRINCIPL', drive: originals(pc('PRINCIPL')), steps: ['INSTALL 102'] },
  { id: 'B2', folder: 'PRINCIPL', drive: originals(pc('PRINCIPL')), steps: ['INSTALL 102', 'UNDO'] },
  { id: 'C1', folder: 'DRAFT1', drive: originals(pc('DRAFT1')), steps: ['INSTALL 104'] },
  { id: 'C2', folder: 'DRAFT1', drive: originals(pc('DRAFT1')), steps: ['INSTALL 104', 'UNDO'] },
  { id: 'D1', folder: 'DRAFT2', drive: originals(pc('DRAFT2')), steps: ['INSTALL 105'] },
  { id: 'D2', folder: 'DRAFT2', drive: originals(pc('DRAFT2')), steps: ['INSTALL 105', 'UNDO'] },
  { id: 'E1', folder: 'INTERN', drive: { ...originals(pc('INTERN')), 'AUTOEXEC.BAT': changed(pc('INTERN').autoexecOld) }, steps: ['INSTALL 107'] },
  { id: 'E2', folder: 'INTERN', drive: { ...originals(pc('INTERN')), 'CONFIG.SYS': changed(pc('INTERN').configOld) }, steps: ['INSTALL 107'] },
  { id: 'E3', folder: 'PRINCIPL', drive: { ...originals(pc('PRINCIPL')), 'CONFIG.SYS': Buffer.from('FILES=20\r\n') }, steps: ['INSTALL 102'] },
  { id: 'F1', folder: 'ACCOUNTS', drive: originals(pc('ACCOUNTS')), steps: ['INSTALL 108'] },
  { id: 'F2', folder: 'ACCOUNTS', drive: originals(pc('ACCOUNTS')), steps: ['INSTALL 108', 'UNDO'] },
  { id: 'G1', folder: 'STUDIO', drive: originals(pc('STUDIO')), steps: ['INSTALL', 'INSTALL 108'] },
  { id: 'G2', folder: 'STUDIO', drive: originals(pc('STUDIO')), steps: ['~D:\\STUDIO\\INSTALL 109'] },
  { id: 'H1', folder: 'RECEPT', drive: originals(pc('RECEPT')), folders: ['BWSAVE/001'], steps: ['INSTALL 101', 'UNDO'] },
  {
    id: 'H2', folder: 'RECEPT', drive: originals(pc('RECEPT')),
    folders: ['001', '002', '003', '004', '005', '006', '007', '008', '009'].map((n) => `BWSAVE/${n}`), steps: ['INSTALL 101'],
  },
  { id: 'I1', folder: 'RECEPT', drive: originals(pc('RECEPT')), steps: ['INSTALL 101 005'] },
  { id: 'I2', folder: 'RECEPT', drive: originals(pc('STUDIO')), steps: ['D:\\STUDIO\\INSTALL 109'] },
  { id: 'Q1', folder: 'RECEPT', drive: originals(pc('RECEPT')), steps: ['INSTALL 101', 'UNDO'] },
];

let run: BundleRunResult;

beforeAll(async () => {
  requireProgram('dosbox', 'dosbox');
  const zip = join(base, 'demo.zip');
  await writeBundle(site, zip);
  unzipInto(zip, bundleDir);
  // The test copy for messages: same bundle, COPY lines without >NUL (see the DOSBox quirk above).
  unzipInto(zip, quietless);
  for (const folder of readdirSync(quietless)) {
    for (const name of ['INSTALL.BAT', 'UNDO.BAT', 'RESTORE.BAT']) {
      const file = join(quietless, folder, name);
      try {
        writeFileSync(file, readFileSync(file, 'latin1').replace(/ >NUL\r\n/g, '\r\n'), 'latin1');
      } catch {
        // site-level files have no batch files
      }
    }
  }
  // Real bundle on D: for every case but Q1, which runs from the test copy on F:, in the same start.
  run = runBundleCases(base, { D: bundleDir, F: quietless }, CASES.filter((c) => !c.id.startsWith('Q')));
  const q = runBundleCases(join(base, 'q'), { F: quietless }, CASES.filter((c) => c.id.startsWith('Q')), 'F');
  for (const [k, v] of q.roots) run.roots.set(k, v);
  for (const [k, v] of q.logs) run.logs.set(k, v);
  run.timedOut ||= q.timedOut;
}, 120_000);

const files = (id: string) => driveFiles(run.roots.get(id)!);
// Messages wrap at 80 columns: compare them with line breaks turned into blanks.
const log = (id: string, step: number) => (run.logs.get(`${id}:${step}`) ?? '').replace(/\s+/g, ' ');
const ROOT = ['AUTOEXEC.BAT', 'CONFIG.SYS'];

describe('bundle installers in DOSBox', () => {
  it('finished within the time limit', () => {
    expect(run.timedOut).toBe(false);
  });

  it('INSTALL copies the new files in and keeps the originals in C:\\BWSAVE\\001 (DOS 6.22)', () => {
    const f = files('A1');
    expect(state(f, ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('RECEPT').autoexecNew), 'CONFIG.SYS': text(pc('RECEPT').configNew) });
    expect(f.get('AUTOEXEC.BAT')!.equals(bundleFile('RECEPT', 'AUTOEXEC.BAT'))).toBe(true);
    expect(f.get('CONFIG.SYS')!.equals(bundleFile('RECEPT', 'CONFIG.SYS'))).toBe(true);
    expect(state(f, ['BWSAVE/001/AUTOEXEC.BAT', 'BWSAVE/001/CONFIG.SYS'])).toEqual({
      'BWSAVE/001/AUTOEXEC.BAT': text(pc('RECEPT').autoexecOld),
      'BWSAVE/001/CONFIG.SYS': text(pc('RECEPT').configOld),
    });
    expect(f.get('BWSAVE/001/RESTORE.BAT')!.equals(bundleFile('RECEPT', 'RESTORE.BAT'))).toBe(true);
    expect(f.get('BWSAVE/001/SLOT.TXT')!.equals(bundleFile('RECEPT', 'SHEET.TXT'))).toBe(true);
  });

  it('UNDO brings the originals back byte for byte', () => {
    expect(state(files('A2'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('RECEPT').autoexecOld), 'CONFIG.SYS': text(pc('RECEPT').configOld) });
    expect(log('A2', 1)).toContain('Putting back the files kept in C:\\BWSAVE\\001');
  });

  it('a second install changes nothing, and a later one uses a new backup folder without touching the first', () => {
    expect(log('A3', 1)).toContain('already has the new startup files');
    const f = files('A3');
    expect(state(f, ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('RECEPT').autoexecNew), 'CONFIG.SYS': text(pc('RECEPT').configNew) });
    expect(f.get('BWSAVE/001/MARK.TXT')!.toString('latin1')).toMatch(/^first/);
    for (const slot of ['001', '002']) {
      expect(state(f, [`BWSAVE/${slot}/AUTOEXEC.BAT`, `BWSAVE/${slot}/CONFIG.SYS`])).toEqual({
        [`BWSAVE/${slot}/AUTOEXEC.BAT`]: text(pc('RECEPT').autoexecOld),
        [`BWSAVE/${slot}/CONFIG.SYS`]: text(pc('RECEPT').configOld),
      });
    }
    expect([...f.keys()].filter((k) => k.startsWith('BWSAVE/003'))).toEqual([]);
  });

  it('DOS 3.30 PC that had no CONFIG.SYS: INSTALL adds it, UNDO removes it again', () => {
    const p = pc('PRINCIPL');
    expect(p.dos).toBe('3.30');
    expect(state(files('B1'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(p.autoexecNew), 'CONFIG.SYS': text(p.configNew) });
    expect(files('B1').has('BWSAVE/001/CONFIG.SYS')).toBe(false);
    expect(state(files('B2'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(p.autoexecOld), 'CONFIG.SYS': null });
  });

  it('a plan that leaves CONFIG.SYS alone never writes it', () => {
    const p = pc('DRAFT1');
    expect(state(files('C1'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(p.autoexecNew), 'CONFIG.SYS': text(p.configOld) });
    expect(state(files('C2'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(p.autoexecOld), 'CONFIG.SYS': text(p.configOld) });
    const q = pc('ACCOUNTS');
    expect(state(files('F1'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(q.autoexecNew), 'CONFIG.SYS': null });
    expect(state(files('F2'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(q.autoexecOld), 'CONFIG.SYS': null });
  });

  it('a PC with no AUTOEXEC.BAT gets one, and UNDO removes it again', () => {
    const p = pc('DRAFT2');
    expect(p.autoexecOld).toBeNull();
    expect(state(files('D1'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(p.autoexecNew), 'CONFIG.SYS': text(p.configNew) });
    expect(state(files('D2'), ROOT)).toEqual({ 'AUTOEXEC.BAT': null, 'CONFIG.SYS': text(p.configOld) });
  });

  it('with a changed AUTOEXEC.BAT or CONFIG.SYS, or a CONFIG.SYS that appeared, INSTALL changes nothing', () => {
    for (const [id, name] of [['E1', 'INTERN'], ['E2', 'INTERN'], ['E3', 'PRINCIPL']]) {
      const c = CASES.find((x) => x.id === id)!;
      const f = files(id);
      expect(state(f, ROOT)).toEqual({ 'AUTOEXEC.BAT': text(c.drive['AUTOEXEC.BAT']), 'CONFIG.SYS': text(c.drive['CONFIG.SYS']) });
      expect([...f.keys()].sort()).toEqual(ROOT.filter((k) => c.drive[k]).sort());
      expect(log(id, 0)).toContain(`not station ${name}. Nothing was changed.`);
    }
  });

  it('without the right station number, or outside the bundle folder, INSTALL changes nothing', () => {
    for (const id of ['G1', 'G2']) {
      expect(state(files(id), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('STUDIO').autoexecOld), 'CONFIG.SYS': text(pc('STUDIO').configOld) });
      expect([...files(id).keys()].filter((k) => k.startsWith('BWSAVE'))).toEqual([]);
    }
    expect(log('G1', 0)).toContain('If this PC is station 109, type: INSTALL 109');
    expect(log('G1', 1)).toContain('This folder installs station STUDIO, number 109.');
    expect(log('G2', 0)).toContain("Run INSTALL from this station's bundle folder");
  });

  it('never writes into a backup folder that already exists, and refuses when all nine are taken', () => {
    const h1 = files('H1');
    expect([...h1.keys()].filter((k) => k.startsWith('BWSAVE/001'))).toEqual([]);
    expect(h1.get('BWSAVE/002/AUTOEXEC.BAT')!.equals(Buffer.from(pc('RECEPT').autoexecOld!))).toBe(true);
    expect(state(h1, ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('RECEPT').autoexecOld), 'CONFIG.SYS': text(pc('RECEPT').configOld) });
    const h2 = files('H2');
    expect([...h2.keys()].filter((k) => k.startsWith('BWSAVE'))).toEqual([]);
    expect(state(h2, ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('RECEPT').autoexecOld), 'CONFIG.SYS': text(pc('RECEPT').configOld) });
    expect(log('H2', 0)).toContain('All 9 backup folders in C:\\BWSAVE are used. Nothing was changed.');
  });

  it('a backup folder number typed by hand is ignored: the first free one is used', () => {
    const f = files('I1');
    expect([...f.keys()].filter((k) => k.startsWith('BWSAVE/')).map((k) => k.split('/')[1])).toEqual(Array(5).fill('001'));
    expect(state(f, ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('RECEPT').autoexecNew), 'CONFIG.SYS': text(pc('RECEPT').configNew) });
  });

  it("another station's INSTALL run from this folder hands over to this folder's INSTALL, which refuses the number", () => {
    // STUDIO and RECEPT have the same original files (same demo shape), so only the station number tells them apart.
    expect(Buffer.from(pc('STUDIO').autoexecOld!).equals(Buffer.from(pc('RECEPT').autoexecOld!))).toBe(true);
    const f = files('I2');
    expect([...f.keys()].sort()).toEqual(['AUTOEXEC.BAT', 'CONFIG.SYS']);
    expect(state(f, ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('STUDIO').autoexecOld), 'CONFIG.SYS': text(pc('STUDIO').configOld) });
    expect(log('I2', 0)).toContain('This folder installs station RECEPT, number 101.');
  });

  it('tells the technician what to do next and what to watch for (test copy without >NUL)', () => {
    const install = log('Q1', 0);
    expect(install).toContain('The new startup files of station RECEPT (number 101) are in place.');
    expect(install).toContain('restart the PC with Ctrl+Alt+Del');
    expect(install).toContain('C:\\THREAD\\TLRES.COM /S:101 /Q');
    expect(log('Q1', 1)).toContain('The startup files from before the install are back.');
    expect(state(files('Q1'), ROOT)).toEqual({ 'AUTOEXEC.BAT': text(pc('RECEPT').autoexecOld), 'CONFIG.SYS': text(pc('RECEPT').configOld) });
  });
});
