/**
 * The install sheet of a PC holds what the technician needs at the desk: station and number, ports,
 * the lines added and why, the checks and the reasons given, the boot order before and after, how to
 * install and undo, the cautions (startup files, backups, telephone voltages REFERENCES 6.5/6.7, local
 * codes and licensed practice) and lines to sign off.
 */
import { demoBundleSite } from '@/generators/bundle';
import { decodeCp437 } from '@/generators/dos/cp437';
import { bundleBuffer, zipEntries } from '@/tests/support/bundle-zip';

describe('install sheet', () => {
  const site = demoBundleSite();
  let sheets: Map<string, string>;

  beforeAll(async () => {
    const entries = await zipEntries(await bundleBuffer(site));
    sheets = new Map(site.pcs.map((pc) => [pc.stationName, decodeCp437(entries.get(`${pc.stationName}/SHEET.TXT`)!)]));
  });

  it('names the station, its number, DOS version, plan and approver', () => {
    const sheet = sheets.get('PRINCIPL')!;
    expect(sheet).toContain('Station:     PRINCIPL (number 102)');
    expect(sheet).toContain('DOS:         MS-DOS 3.30, boot drive C:');
    expect(sheet).toContain('revision rev-102-1');
    expect(sheet).toContain('by Mara Lindqvist on 2026-03-09T16:05:00.000Z');
    expect(sheet).toContain('INSTALL 102');
  });

  it('lists ports, the added lines with their reason, checks with reasons, and both boot orders', () => {
    const pc = site.pcs.find((p) => p.stationName === 'DRAFT1')!;
    const sheet = sheets.get('DRAFT1')!;
    expect(sheet).toMatch(/COM1 +mouse/);
    expect(sheet).toMatch(/COM2 +network adapter/);
    for (const line of pc.changes[0].lines) expect(sheet).toContain(`+ ${line}`);
    expect(sheet).toContain('Why: Sets COM2 up');
    expect(sheet).toContain('[warning] port-taken: COM1 has a mouse');
    expect(sheet).toContain('Reason given: Mouse stays on COM1 as the user asked.');
    const before = sheet.slice(sheet.indexOf('BOOT ORDER BEFORE'), sheet.indexOf('BOOT ORDER AFTER'));
    const after = sheet.slice(sheet.indexOf('BOOT ORDER AFTER'), sheet.indexOf('HOW TO INSTALL'));
    expect(before).not.toContain('TLRES.COM');
    expect(after).toContain('C:\\THREAD\\TLRES.COM /S:104 /Q');
    expect(after.indexOf('TLRES.COM')).toBeLessThan(after.indexOf(' WIN'));
  });

  it('says when the PC had no startup file and that the installer handles it', () => {
    const flat = (name: string) => sheets.get(name)!.replace(/\s+/g, ' ');
    expect(flat('DRAFT2')).toContain('the PC had no AUTOEXEC.BAT when the plan was made; INSTALL adds one (UNDO removes it again)');
    expect(flat('PRINCIPL')).toContain('the PC had no CONFIG.SYS when the plan was made; INSTALL adds one (UNDO removes it again)');
    expect(flat('ACCOUNTS')).toContain('the PC has no CONFIG.SYS and this plan adds none');
    expect(flat('DRAFT1')).toContain('CONFIG.SYS not changed by this plan');
  });

  it('carries the cautions and a place to sign off', () => {
    for (const sheet of sheets.values()) {
      const flat = sheet.replace(/\s+/g, ' ');
      expect(flat).toContain('A bad startup file can leave the PC unable to start');
      expect(flat).toContain('boot floppy');
      expect(flat).toContain('never overwrites an earlier backup');
      expect(flat).toContain('about 48 V DC and ringing voltage near 90 V AC');
      expect(flat).toContain('follow local codes and licensed practice');
      expect(sheet).toMatch(/Installed by: _{20,}/);
      expect(sheet).toMatch(/Date: _{10,} +Signature: _{10,}/);
    }
  });
});
