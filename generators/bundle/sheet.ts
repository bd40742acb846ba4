/**
 * SHEET.TXT: the install sheet of one PC, 80 columns, for the screen (TYPE SHEET.TXT) and for paper.
 * Station, ports, what the plan changes and why, the checks and their reasons, boot order before and
 * after, how to install and undo, cautions, and lines to sign off.
 */
import { BACKUP_ROOT, pcFacts } from './batch';
import { CAUTIONS } from './cautions';
import { batchDialect } from './dialect';
import type { PlacedPc } from './layout';
import { DOS_COLUMNS } from './text';
import type { BundleBootStep, BundlePc, BundleSite } from './types';
import { hardWrap, wrapLabelled, wrapWords } from './wrap';

const W = DOS_COLUMNS;
const RULE = '-'.repeat(W);

function section(title: string, body: string[]): string[] {
  return [RULE, title.toUpperCase(), ...body];
}

function identity(site: Pick<BundleSite, 'name' | 'address' | 'generatedAt'>, placed: PlacedPc): string[] {
  const { pc, folder } = placed;
  const facts = pcFacts(pc);
  return [
    '='.repeat(W),
    'BOOTWRIGHT INSTALL SHEET',
    '='.repeat(W),
    ...wrapLabelled('Site:        ', site.name + (site.address ? `, ${site.address}` : ''), W),
    ...wrapLabelled('Station:     ', `${pc.stationName} (number ${pc.stationNumber})`, W),
    `Folder:      ${folder}`,
    `DOS:         ${batchDialect(pc.dos).label}, boot drive ${facts.drive}`,
    ...wrapLabelled('Plan:        ', `revision ${pc.planRevisionId}`, W),
    ...wrapLabelled('Plan hash:   ', pc.planHash, W),
    ...wrapLabelled('Approved:    ', `by ${pc.approvedBy} on ${pc.approvedAt}`, W),
    `Bundle made: ${site.generatedAt}`,
  ];
}

function ports(pc: BundlePc): string[] {
  if (pc.ports.length === 0) return ['  No ports were recorded.'];
  return pc.ports.flatMap((port) => wrapWords(port.attached, W, `  ${port.name.padEnd(6)} `, ' '.repeat(9)));
}

function fileState(pc: BundlePc): string[] {
  const drive = pcFacts(pc).drive;
  const autoexec = pc.autoexecOld
    ? `replaced by the new AUTOEXEC.BAT; the original is kept here as AUTOEXEC.OLD.`
    : `the PC had no AUTOEXEC.BAT when the plan was made; INSTALL adds one (UNDO removes it again).`;
  const config =
    pc.configNew === null
      ? pc.configOld
        ? 'not changed by this plan; INSTALL still checks it is the original (CONFIG.OLD).'
        : 'the PC has no CONFIG.SYS and this plan adds none; INSTALL checks there is still none.'
      : pc.configOld
        ? 'replaced by the new CONFIG.SYS; the original is kept here as CONFIG.OLD.'
        : 'the PC had no CONFIG.SYS when the plan was made; INSTALL adds one (UNDO removes it again).';
  return [
    ...wrapLabelled(`  ${drive}\\AUTOEXEC.BAT  `, autoexec, W),
    ...wrapLabelled(`  ${drive}\\CONFIG.SYS    `, config, W),
    ...wrapWords('The full change is in CHANGES.DIF (unified diff).', W, '  ', '  '),
  ];
}

function changes(pc: BundlePc): string[] {
  if (pc.changes.length === 0) return ['  This plan adds no lines.'];
  return pc.changes.flatMap((change) => [
    `  ${change.file}, at line ${change.line}:`,
    ...change.lines.flatMap((line) => hardWrap(line, W, '    + ', '      ')),
    ...wrapLabelled('    Why: ', change.reason, W),
  ]);
}

function checks(pc: BundlePc): string[] {
  if (pc.checks.length === 0) return ['  No checks fired for this plan.'];
  return pc.checks.flatMap((check) => [
    ...wrapLabelled(`  [${check.severity}] ${check.slug}: `, check.message, W),
    ...(check.reason ? wrapLabelled('    Reason given: ', check.reason, W) : []),
  ]);
}

function bootOrder(steps: BundleBootStep[]): string[] {
  if (steps.length === 0) return ['  Nothing runs from AUTOEXEC.BAT.'];
  return steps.flatMap((step, i) => {
    const lead = `  ${String(i + 1).padStart(2)}. line ${String(step.line).padEnd(4)} `;
    return hardWrap(`${step.program} ${step.args}`.trimEnd(), W, lead, ' '.repeat(lead.length));
  });
}

function howTo(placed: PlacedPc): string[] {
  const { pc, folder } = placed;
  const { drive } = pcFacts(pc);
  const steps = [
    `Copy this station's folder to a floppy disk as A:\\${folder} (or use the bundle where it is).`,
    'Have the boot floppy of this PC at hand.',
    `At the PC type: A: then CD \\${folder} then INSTALL ${pc.stationNumber}`,
    `INSTALL stops and changes nothing when ${drive}\\AUTOEXEC.BAT or ${drive}\\CONFIG.SYS is not the file ` +
      'this plan was made from.',
    'Restart the PC with Ctrl+Alt+Del and watch the boot order after the change (above).',
    `To go back: from this folder type UNDO; or, without the bundle, type ${drive} then ` +
      `CD \\${BACKUP_ROOT}\\nnn (the newest backup folder) then RESTORE.`,
  ];
  return steps.flatMap((text, i) => wrapWords(text, W, `  ${i + 1}. `, '     '));
}

function signOff(): string[] {
  return [
    '',
    '  Installed by: ______________________________________________',
    '',
    '  Date: ____________________   Signature: _______________________',
    '',
    '  PC starts and the network program loads:   [ ] yes    [ ] no',
    '',
    '  Notes: _____________________________________________________________',
    '',
    '  ____________________________________________________________________',
  ];
}

/** The lines of SHEET.TXT (encode with dosLines). */
export function sheetLines(site: Pick<BundleSite, 'name' | 'address' | 'generatedAt'>, placed: PlacedPc): string[] {
  const { pc } = placed;
  return [
    ...identity(site, placed),
    ...section('Ports', ports(pc)),
    ...section('Startup files', fileState(pc)),
    ...section('Lines added and why', changes(pc)),
    ...section('Checks', checks(pc)),
    ...section('Boot order before the change', bootOrder(pc.bootBefore)),
    ...section('Boot order after the change', bootOrder(pc.bootAfter)),
    ...section('How to install', howTo(placed)),
    ...section('Cautions', CAUTIONS.flatMap((text) => wrapWords(text, W, '  - ', '    '))),
    ...section('Sign-off', signOff()),
    '='.repeat(W),
  ];
}
