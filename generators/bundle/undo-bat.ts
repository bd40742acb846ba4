/**
 * UNDO.BAT of one PC: finds the newest complete backup folder (highest number holding RESTORE.BAT) and
 * hands over to the RESTORE.BAT inside it, which knows what that install changed. Hand-over is a plain
 * batch chain (no CALL, REFERENCES 2.3: control never comes back, which is what we want).
 */
import { BACKUP_ROOT, BACKUP_SLOTS, echo, pcFacts, rem, slotName } from './batch';
import { batchDialect } from './dialect';
import { PC_FILES } from './layout';
import type { PlacedPc } from './layout';

export function undoBatLines(placed: PlacedPc): string[] {
  const { pc } = placed;
  const { drive } = pcFacts(pc);
  const root = `${drive}\\${BACKUP_ROOT}`;
  const lines = [
    batchDialect(pc.dos).echoOff,
    ...rem(`UNDO.BAT for station ${pc.stationName}, number ${pc.stationNumber}.`),
    ...rem(
      `Puts back the startup files kept in the newest backup folder ${root}\\nnn that INSTALL made, ` +
        'by running the RESTORE.BAT kept in that folder.',
    ),
  ];
  for (let n = BACKUP_SLOTS; n >= 1; n--) {
    lines.push(`IF EXIST ${root}\\${slotName(n)}\\${PC_FILES.restore} GOTO UNDO${n}`);
  }
  lines.push('GOTO NONE');
  for (let n = BACKUP_SLOTS; n >= 1; n--) {
    lines.push(`:UNDO${n}`, ...echo(`Putting back the files kept in ${root}\\${slotName(n)}.`));
    lines.push(drive, `CD \\${BACKUP_ROOT}\\${slotName(n)}`, 'RESTORE');
  }
  lines.push(':NONE', ...echo(`No backup made by INSTALL was found in ${root}. Nothing was changed.`));
  return lines;
}
