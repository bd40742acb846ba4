/**
 * INSTALL.BAT of one PC. Order of work, each step stopping with a message and no change when it fails:
 * run from the station's bundle folder; the technician confirms the station number (`INSTALL 12`);
 * SAMEFILE.COM answers both ways; the PC's startup files are still the plan's originals; a new backup
 * folder C:\BWSAVE\nnn is written and verified (never an existing one, see slotChoice); the new files are
 * copied and verified. Only DOS 2.0 commands and our SAMEFILE.COM are used (see dialect.ts).
 */
import { BACKUP_ROOT, BACKUP_SLOTS, echo, pcFacts, rem, samefile, slotName, SLOT_RECORD } from './batch';
import type { PcFacts } from './batch';
import { batchDialect } from './dialect';
import { PC_FILES } from './layout';
import type { PlacedPc } from './layout';

/** Files the installer needs beside itself in the bundle folder. */
function requiredFiles(facts: PcFacts): string[] {
  const files: string[] = [PC_FILES.sheet, PC_FILES.undo, PC_FILES.restore, PC_FILES.samefile, PC_FILES.autoexec];
  if (facts.writesConfig) files.push(PC_FILES.config);
  if (facts.hasAutoexecOld) files.push(PC_FILES.autoexecOld);
  if (facts.hasConfigOld) files.push(PC_FILES.configOld);
  return files;
}

function header(placed: PlacedPc): string[] {
  const { pc, folder } = placed;
  const dialect = batchDialect(pc.dos);
  const drive = pcFacts(pc).drive;
  return [
    dialect.echoOff,
    ...rem(`INSTALL.BAT for station ${pc.stationName}, number ${pc.stationNumber} (bundle folder ${folder}).`),
    ...rem(`Made by Bootwright for ${dialect.label} from plan revision ${pc.planRevisionId}.`),
    ...rem(
      `Type INSTALL ${pc.stationNumber} in this folder. It checks that ${drive}\\AUTOEXEC.BAT and ` +
        `${drive}\\CONFIG.SYS are the files the plan was made from, keeps them in a new backup folder ` +
        `${drive}\\${BACKUP_ROOT}\\nnn and copies the new files in. UNDO puts the newest backup back.`,
    ),
  ];
}

/** Stops unless the bundle folder is the current folder and the technician named this station. */
function preconditions(placed: PlacedPc, facts: PcFacts): string[] {
  return [
    ...requiredFiles(facts).map((file) => `IF NOT EXIST ${file} GOTO NOTHERE`),
    `IF NOT "%1"=="${placed.pc.stationNumber}" GOTO ASKNUM`,
    ...rem('SAMEFILE must answer both ways before its answers are trusted.'),
    samefile(PC_FILES.sheet, PC_FILES.sheet),
    'IF ERRORLEVEL 1 GOTO NOTOOL',
    samefile(PC_FILES.sheet, PC_FILES.undo),
    'IF NOT ERRORLEVEL 1 GOTO NOTOOL',
  ];
}

/** Jumps to NOTORIG unless the PC's files are the plan's originals (or absent where the PC had none). */
function originalsCheck(facts: PcFacts): string[] {
  const { drive } = facts;
  const lines = rem('Are the startup files still the ones the plan was made from?');
  lines.push(
    ...(facts.hasAutoexecOld
      ? [samefile(`${drive}\\AUTOEXEC.BAT`, PC_FILES.autoexecOld), 'IF ERRORLEVEL 1 GOTO NOTORIG']
      : [`IF EXIST ${drive}\\AUTOEXEC.BAT GOTO NOTORIG`]),
    ...(facts.hasConfigOld
      ? [samefile(`${drive}\\CONFIG.SYS`, PC_FILES.configOld), 'IF ERRORLEVEL 1 GOTO NOTORIG']
      : [`IF EXIST ${drive}\\CONFIG.SYS GOTO NOTORIG`]),
  );
  return lines;
}

/**
 * Picks the first backup folder that does not exist yet; an existing one is never written to. The folder
 * number reaches the shared SAVE part as %2: INSTALL hands over to itself as `INSTALL.BAT <number> nnn`
 * (a plain batch chain, REFERENCES 2.3), runs every check again, and only a %2 equal to the free folder
 * it finds itself leads on to SAVE, so a number typed by hand can never pick a used folder.
 */
function slotChoice(placed: PlacedPc, facts: PcFacts): string[] {
  const root = `${facts.drive}\\${BACKUP_ROOT}`;
  const lines = [
    ...rem(`Find the first free backup folder in ${root}; earlier backups are never touched.`),
  ];
  for (let n = 1; n <= BACKUP_SLOTS; n++) lines.push(`IF NOT EXIST ${root}\\${slotName(n)}\\NUL GOTO SLOT${n}`);
  lines.push('GOTO FULL');
  for (let n = 1; n <= BACKUP_SLOTS; n++) {
    lines.push(`:SLOT${n}`, `IF "%2"=="${slotName(n)}" GOTO SAVE`, `${PC_FILES.install} ${placed.pc.stationNumber} ${slotName(n)}`);
  }
  return lines;
}

/** Copy `from` to `to` and jump to `fail` unless the copy has the same bytes. */
function verifiedCopy(from: string, to: string, fail: string): string[] {
  return [`COPY ${from} ${to} >NUL`, samefile(from, to), `IF ERRORLEVEL 1 GOTO ${fail}`];
}

/** Writes backup folder %2: the record, SAMEFILE.COM, the originals, and RESTORE.BAT last (it marks it complete). */
function save(facts: PcFacts): string[] {
  const root = `${facts.drive}\\${BACKUP_ROOT}`;
  const dir = `${root}\\%2`;
  const lines = [':SAVE', `IF NOT EXIST ${root}\\NUL MD ${root}`, `MD ${dir}`, `IF NOT EXIST ${dir}\\NUL GOTO NOSAVE`];
  lines.push(...verifiedCopy(PC_FILES.sheet, `${dir}\\${SLOT_RECORD}`, 'NOSAVE'));
  lines.push(...verifiedCopy(PC_FILES.samefile, `${dir}\\${PC_FILES.samefile}`, 'NOSAVE'));
  if (facts.hasAutoexecOld) lines.push(...verifiedCopy(`${facts.drive}\\AUTOEXEC.BAT`, `${dir}\\AUTOEXEC.BAT`, 'NOSAVE'));
  if (facts.hasConfigOld) lines.push(...verifiedCopy(`${facts.drive}\\CONFIG.SYS`, `${dir}\\CONFIG.SYS`, 'NOSAVE'));
  lines.push(...verifiedCopy(PC_FILES.restore, `${dir}\\${PC_FILES.restore}`, 'NOSAVE'));
  return lines;
}

/** What the technician sees at the next start: the boot order after the change. */
function nextSteps(placed: PlacedPc, facts: PcFacts): string[] {
  const { pc, folder } = placed;
  const lines = [
    ...echo(`The new startup files of station ${pc.stationName} (number ${pc.stationNumber}) are in place.`),
    ...echo(`The old ones are kept in ${facts.drive}\\${BACKUP_ROOT}.`),
    ...echo('Next: keep the boot floppy at hand and restart the PC with Ctrl+Alt+Del.'),
  ];
  if (pc.bootAfter.length > 0) {
    lines.push(...echo('While it starts you should see these run, in this order:'));
    pc.bootAfter.slice(0, 12).forEach((step, i) => {
      lines.push(...echo(`${i + 1}. ${step.program} ${step.args}`.slice(0, 74)));
    });
    if (pc.bootAfter.length > 12) lines.push(...echo(`... and ${pc.bootAfter.length - 12} more (see SHEET.TXT).`));
  }
  lines.push(
    ...echo(
      `If the PC does not start as it should, start it from the boot floppy, go to this folder ` +
        `(${folder}) and type UNDO.`,
    ),
  );
  return lines;
}

function newFiles(placed: PlacedPc, facts: PcFacts): string[] {
  const lines: string[] = [];
  lines.push(...verifiedCopy(PC_FILES.autoexec, `${facts.drive}\\AUTOEXEC.BAT`, 'BADCOPY'));
  if (facts.writesConfig) lines.push(...verifiedCopy(PC_FILES.config, `${facts.drive}\\CONFIG.SYS`, 'BADCOPY'));
  lines.push(...nextSteps(placed, facts), 'GOTO END');
  lines.push(':BADCOPY', ...echo('A new file did not copy correctly. UNDO now puts the backup back.'), 'UNDO');
  return lines;
}

/** After a mismatch: tells "already installed" apart from "changed since the plan". */
function notOriginal(placed: PlacedPc, facts: PcFacts): string[] {
  const { drive } = facts;
  const lines = [':NOTORIG', samefile(`${drive}\\AUTOEXEC.BAT`, PC_FILES.autoexec), 'IF ERRORLEVEL 1 GOTO CHANGED'];
  if (facts.writesConfig) lines.push(samefile(`${drive}\\CONFIG.SYS`, PC_FILES.config), 'IF ERRORLEVEL 1 GOTO CHANGED');
  else if (facts.hasConfigOld) lines.push(samefile(`${drive}\\CONFIG.SYS`, PC_FILES.configOld), 'IF ERRORLEVEL 1 GOTO CHANGED');
  else lines.push(`IF EXIST ${drive}\\CONFIG.SYS GOTO CHANGED`);
  lines.push(...echo('This PC already has the new startup files of this plan. Nothing was changed.'), 'GOTO END');
  lines.push(
    ':CHANGED',
    ...echo(
      `${drive}\\AUTOEXEC.BAT or ${drive}\\CONFIG.SYS is not the file this plan was made from: it changed ` +
        `after the plan, or this is not station ${placed.pc.stationName}. Nothing was changed.`,
    ),
    ...echo("Record the PC's current startup files in Bootwright and have a new plan approved."),
    'GOTO END',
  );
  return lines;
}

function stops(placed: PlacedPc, facts: PcFacts): string[] {
  const { pc, folder } = placed;
  return [
    ':ASKNUM',
    ...echo(`This folder installs station ${pc.stationName}, number ${pc.stationNumber}.`),
    ...echo(`If this PC is station ${pc.stationNumber}, type: INSTALL ${pc.stationNumber}`),
    'GOTO END',
    ':NOTHERE',
    ...echo(
      `Run INSTALL from this station's bundle folder, for example from a floppy: A: then CD \\${folder} ` +
        `then INSTALL ${pc.stationNumber}. Nothing was changed.`,
    ),
    'GOTO END',
    ':NOTOOL',
    ...echo('SAMEFILE.COM does not work here, so the files cannot be checked. Nothing was changed.'),
    'GOTO END',
    ':NOSAVE',
    ...echo(
      `The backup could not be written in ${facts.drive}\\${BACKUP_ROOT} (disk full or write-protected?). ` +
        'The startup files were not changed.',
    ),
    'GOTO END',
    ':FULL',
    ...echo(
      `All ${BACKUP_SLOTS} backup folders in ${facts.drive}\\${BACKUP_ROOT} are used. Nothing was changed. ` +
        `Copy ${facts.drive}\\${BACKUP_ROOT} to a floppy for safe keeping and empty it before installing again.`,
    ),
    ':END',
  ];
}

/** The lines of INSTALL.BAT (encode with dosLines). */
export function installBatLines(placed: PlacedPc): string[] {
  const facts = pcFacts(placed.pc);
  const lines = [...header(placed), ...preconditions(placed, facts), ...originalsCheck(facts), ...slotChoice(placed, facts)];
  lines.push(...save(facts), ...newFiles(placed, facts), ...notOriginal(placed, facts), ...stops(placed, facts));
  return lines;
}
