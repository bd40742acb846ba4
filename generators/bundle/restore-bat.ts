/**
 * RESTORE.BAT, copied by INSTALL into each backup folder it makes (C:\BWSAVE\nnn) together with the
 * originals and SAMEFILE.COM, so a backup can be put back even without the bundle: boot from the floppy,
 * `C:`, `CD \BWSAVE\001`, `RESTORE`. It is written for the PC's plan, so it knows which files that install
 * replaced and which the PC did not have before (those it deletes). In the bundle folder it refuses to
 * run: only a backup folder holds SLOT.TXT.
 */
import { BACKUP_ROOT, echo, pcFacts, rem, samefile, SLOT_RECORD } from './batch';
import type { PcFacts } from './batch';
import { batchDialect } from './dialect';
import { PC_FILES } from './layout';
import type { PlacedPc } from './layout';

function putBack(facts: PcFacts, name: 'AUTOEXEC.BAT' | 'CONFIG.SYS', had: boolean): string[] {
  const target = `${facts.drive}\\${name}`;
  if (had) return [`COPY ${name} ${target} >NUL`, samefile(name, target), 'IF ERRORLEVEL 1 GOTO FAILED'];
  return [`IF EXIST ${target} DEL ${target}`, `IF EXIST ${target} GOTO FAILED`];
}

/** What the FAILED message tells the technician to copy by hand. */
function keptFiles(facts: PcFacts): string {
  const kept = [facts.hasAutoexecOld ? 'AUTOEXEC.BAT' : null, facts.writesConfig && facts.hasConfigOld ? 'CONFIG.SYS' : null]
    .filter((name): name is string => name !== null);
  return kept.length > 0 ? `copy ${kept.join(' and ')} from here to ${facts.drive}\\ by hand, ` : '';
}

export function restoreBatLines(placed: PlacedPc): string[] {
  const { pc } = placed;
  const facts = pcFacts(pc);
  const lines = [
    batchDialect(pc.dos).echoOff,
    ...rem(`RESTORE.BAT for station ${pc.stationName}, number ${pc.stationNumber}, plan ${pc.planRevisionId}.`),
    ...rem('Puts back the startup files kept in this backup folder. Run it from inside the folder.'),
    `IF NOT EXIST ${SLOT_RECORD} GOTO NOTSLOT`,
    `IF NOT EXIST ${PC_FILES.samefile} GOTO NOTSLOT`,
  ];
  if (facts.hasAutoexecOld) lines.push('IF NOT EXIST AUTOEXEC.BAT GOTO NOTSLOT');
  if (facts.writesConfig && facts.hasConfigOld) lines.push('IF NOT EXIST CONFIG.SYS GOTO NOTSLOT');
  lines.push(
    samefile(SLOT_RECORD, SLOT_RECORD),
    'IF ERRORLEVEL 1 GOTO NOTOOL',
    samefile(SLOT_RECORD, PC_FILES.restore),
    'IF NOT ERRORLEVEL 1 GOTO NOTOOL',
  );
  lines.push(...putBack(facts, 'AUTOEXEC.BAT', facts.hasAutoexecOld));
  // A plan that left CONFIG.SYS alone never replaced it, so undoing it leaves CONFIG.SYS alone too.
  if (facts.writesConfig) lines.push(...putBack(facts, 'CONFIG.SYS', facts.hasConfigOld));
  lines.push(
    ...echo('The startup files from before the install are back. Restart the PC with Ctrl+Alt+Del.'),
    `CD \\`,
    'GOTO END',
    ':NOTSLOT',
    ...echo(
      `RESTORE only works inside a backup folder made by INSTALL, such as ${facts.drive}\\${BACKUP_ROOT}\\001. ` +
        'Nothing was changed.',
    ),
    'GOTO END',
    ':NOTOOL',
    ...echo('SAMEFILE.COM does not work here, so nothing was changed.'),
    'GOTO END',
    ':FAILED',
    ...echo(
      `A file could not be put back. The backup is still in this folder: ${keptFiles(facts)}` +
        'or start the PC from the boot floppy.',
    ),
    ':END',
  );
  return lines;
}
