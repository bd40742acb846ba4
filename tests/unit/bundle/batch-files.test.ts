/**
 * The installers, undo and restore files read as batch files for their DOS version, without running them:
 * only commands COMMAND.COM 2.0 already had (REFERENCES 2.4, [M2] TDATA.ASM COMTAB) plus our own
 * SAMEFILE/UNDO/RESTORE and drive changes; no CALL ever (REFERENCES 2.2, [ENC]: new in 3.3); no `@` on
 * the 3.30 station (REFERENCES 2.1: `@` is 3.3+ and the bundle keeps 3.3x @-less); labels of at most
 * 8 characters (REFERENCES 2.8, [M4C] TBATCH2.ASM: only 8 count) that every GOTO finds; lines of at most
 * 127 characters (REFERENCES 2.10, [M4C] COMEQU.ASM COMBUFLEN); REM without < > | (REFERENCES 2.6).
 */
import { demoBundleSite } from '@/generators/bundle';
import { bundleBuffer, zipEntries } from '@/tests/support/bundle-zip';
import { DOS2_COMMANDS, gotoTargets, readBatch } from '@/tests/support/bundle-batch-lint';

const OUR_PROGRAMS = new Set(['SAMEFILE', 'UNDO', 'RESTORE', 'INSTALL.BAT']);
const DRIVE = /^[A-Z]:$/;

let entries: Map<string, Uint8Array>;
const demo = demoBundleSite();
// The demo office plus two awkward plans: a station name full of batch metacharacters and a PC that
// boots from D:.
const site = {
  ...demo,
  pcs: [
    ...demo.pcs,
    { ...demo.pcs[0], stationName: 'Plot >room| 100% & "back"', stationNumber: 150, planRevisionId: 'rev<150>|%1' },
    { ...demo.pcs[1], stationName: 'DBOOT', stationNumber: 151, bootDrive: 'd' },
  ],
};

beforeAll(async () => {
  entries = await zipEntries(await bundleBuffer(site));
});

const batchNames = () => [...entries.keys()].filter((n) => /\/(INSTALL|UNDO|RESTORE)\.BAT$/.test(n));

describe('bundle batch files', () => {
  it('has an INSTALL, UNDO and RESTORE for every PC', () => {
    expect(batchNames()).toHaveLength(site.pcs.length * 3);
  });

  it('uses only DOS 2.0 internal commands, our own programs and drive changes; never CALL or FOR', () => {
    const unknown: string[] = [];
    for (const name of batchNames()) {
      for (const line of readBatch(entries.get(name)!)) {
        const cmd = line.command;
        if (cmd === null) continue;
        const ok = (DOS2_COMMANDS.has(cmd) && cmd !== 'FOR') || OUR_PROGRAMS.has(cmd) || DRIVE.test(cmd);
        if (!ok) unknown.push(`${name}: ${line.text}`);
      }
    }
    expect(unknown).toEqual([]);
    const all = batchNames().map((n) => Buffer.from(entries.get(n)!).toString('latin1')).join('\n');
    expect(all).not.toMatch(/^\s*(IF\s.*\s)?CALL\s/im);
  });

  it('writes @ECHO OFF from DOS 4.0 on and plain ECHO OFF on 3.30, with no @ anywhere else', () => {
    for (const pc of demo.pcs) {
      const folder = pc.stationName;
      for (const file of ['INSTALL.BAT', 'UNDO.BAT', 'RESTORE.BAT']) {
        const lines = readBatch(entries.get(`${folder}/${file}`)!);
        const major = Number(pc.dos.split('.')[0]);
        expect(lines[0].text).toBe(major >= 4 ? '@ECHO OFF' : 'ECHO OFF');
        expect(lines.slice(1).filter((l) => l.text.trimStart().startsWith('@'))).toEqual([]);
      }
    }
    expect(site.pcs.some((pc) => pc.dos === '3.30')).toBe(true);
  });

  it('has short unique labels, and a label for every GOTO', () => {
    for (const name of batchNames()) {
      const lines = readBatch(entries.get(name)!);
      const labels = lines.flatMap((l) => (l.label ? [l.label] : []));
      expect(labels.every((l) => l.length <= 8)).toBe(true);
      expect(new Set(labels.map((l) => l.slice(0, 8))).size).toBe(labels.length);
      const missing = gotoTargets(lines).filter((t) => !labels.includes(t));
      expect({ name, missing }).toEqual({ name, missing: [] });
    }
  });

  it('keeps lines under the 127-character batch buffer and REM lines free of < > |', () => {
    for (const name of batchNames()) {
      for (const line of readBatch(entries.get(name)!)) {
        expect(line.text.length).toBeLessThanOrEqual(127);
        if (line.command === 'REM' || line.command === 'ECHO') expect(line.text).not.toMatch(/[<>|]/);
      }
    }
  });

  it('keeps batch metacharacters of a station name out of every command, ECHO and REM line', () => {
    const lines = ['INSTALL.BAT', 'UNDO.BAT', 'RESTORE.BAT'].flatMap((f) => readBatch(entries.get(`PLOTROOM/${f}`)!));
    const redirects = lines.filter((l) => /[<>|]/.test(l.text) && !/ >NUL$/.test(l.text));
    expect(redirects).toEqual([]);
    const percents = lines.filter((l) => l.text.includes('%') && !/%[12]/.test(l.text));
    expect(percents).toEqual([]);
    expect(lines.some((l) => l.text.includes('Plot room 100 & "back"'))).toBe(true);
  });

  it('writes every path on the boot drive the plan names (D: here), never C:', () => {
    const lines = ['INSTALL.BAT', 'UNDO.BAT', 'RESTORE.BAT'].flatMap((f) => readBatch(entries.get(`DBOOT/${f}`)!));
    const text = lines.map((l) => l.text);
    expect(text).toContain('SAMEFILE D:\\AUTOEXEC.BAT AUTOEXEC.OLD');
    expect(text).toContain('IF NOT EXIST D:\\BWSAVE\\001\\NUL GOTO SLOT1');
    expect(text).toContain('D:');
    // Only the boot preview (the PC's own program paths, shown with ECHO) may name C:.
    expect(lines.filter((l) => l.command !== 'ECHO' && /C:/i.test(l.text))).toEqual([]);
  });

  it('asks for the station number and stops on every failed check before it writes anything', () => {
    const lines = readBatch(entries.get('RECEPT/INSTALL.BAT')!).map((l) => l.text);
    const firstWrite = lines.findIndex((l) => /^(IF .* )?(MD|COPY|DEL)\s/i.test(l));
    const before = lines.slice(0, firstWrite).join('\n');
    expect(before).toContain('IF NOT "%1"=="101" GOTO ASKNUM');
    expect(before).toContain('SAMEFILE C:\\AUTOEXEC.BAT AUTOEXEC.OLD');
    expect(before).toContain('SAMEFILE C:\\CONFIG.SYS CONFIG.OLD');
    expect(before).toContain('IF NOT EXIST SHEET.TXT GOTO NOTHERE');
    // PRINCIPL had no CONFIG.SYS: the installer insists there is still none.
    expect(readBatch(entries.get('PRINCIPL/INSTALL.BAT')!).map((l) => l.text)).toContain('IF EXIST C:\\CONFIG.SYS GOTO NOTORIG');
  });
});
