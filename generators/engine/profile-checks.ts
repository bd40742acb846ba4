/**
 * Checks that need only the profile, so the wizard can show them while the technician types.
 * Browser-safe: imports no Node built-ins and no iconv-lite.
 */
import { profileCheck, type Check } from './check';
import { dosFeatures, formatDosVersion, parseDosVersion } from './dos-version';
import { extensionOf, pathProblems, splitDosPath } from './dos-path';
import type { PortEntry, Profile } from './profile';

/** Ports DOS knows (REFERENCES 1.5, 1.24, 5.4): COM1-COM4, LPT1-LPT3. */
const DOS_PORTS = new Set(['COM1', 'COM2', 'COM3', 'COM4', 'LPT1', 'LPT2', 'LPT3']);

/** COM1/COM3 share IRQ4 and COM2/COM4 share IRQ3 on ISA machines (REFERENCES 4.1, 4.2) [KB-IRQ]. */
const IRQ_PARTNER: Record<string, string> = { COM1: 'COM3', COM3: 'COM1', COM2: 'COM4', COM4: 'COM2' };
const IRQ_OF: Record<string, number> = { COM1: 4, COM3: 4, COM2: 3, COM4: 3 };

/** Every check that needs no startup file. */
export function checkProfile(profile: Profile): Check[] {
  return [
    ...dosChecks(profile),
    ...portListChecks(profile),
    ...networkPortChecks(profile),
    ...redirectChecks(profile),
    ...serialSettingChecks(profile),
    ...nameChecks(profile),
    ...memoryChecks(profile),
  ];
}

function dosChecks(profile: Profile): Check[] {
  const out: Check[] = [];
  const dos = parseDosVersion(profile.dos);
  if (dos === null) {
    out.push(
      profileCheck(
        'dos-unknown',
        'error',
        `"${profile.dos}" is not a DOS version we know (2.0 to 7.10, as VER prints it). ` +
          'The plan uses the syntax every DOS accepts until the version is known.',
      ),
    );
  }
  if (profile.kit) {
    const min = parseDosVersion(profile.kit.minDos);
    if (min === null) {
      out.push(profileCheck('kit-dos-unknown', 'warning', `The kit's lowest DOS "${profile.kit.minDos}" is not a version we know.`));
    } else if (dos !== null && dos < min) {
      out.push(
        profileCheck(
          'dos-below-kit',
          'error',
          `${profile.kit.name} needs DOS ${formatDosVersion(min)} or later; this PC runs ${formatDosVersion(dos)}.`,
        ),
      );
    }
  }
  return out;
}

function portListChecks(profile: Profile): Check[] {
  const out: Check[] = [];
  const seen = new Set<string>();
  for (const port of profile.ports) {
    if (!DOS_PORTS.has(port.name)) {
      out.push(profileCheck('port-not-dos', 'error', `${port.name} is not a port DOS knows (COM1-COM4, LPT1-LPT3).`));
    }
    if (seen.has(port.name)) {
      out.push(profileCheck('port-listed-twice', 'error', `${port.name} is listed more than once; keep one entry per port.`));
    }
    seen.add(port.name);
  }
  return out;
}

function findPort(profile: Profile, name: string): PortEntry | undefined {
  return profile.ports.find((p) => p.name === name);
}

/** port-missing / port-absent / port-not-dos for one port the plan uses. */
function usedPortChecks(profile: Profile, name: string, role: string): Check[] {
  if (!DOS_PORTS.has(name)) {
    return [profileCheck('port-not-dos', 'error', `${role} ${name} is not a port DOS knows (COM1-COM4, LPT1-LPT3).`)];
  }
  const port = findPort(profile, name);
  if (!port) return [profileCheck('port-missing', 'error', `${role} ${name} is not in this PC's port list.`)];
  if (!port.present) return [profileCheck('port-absent', 'error', `${role} ${name} is recorded as not present on this PC.`)];
  return [];
}

function networkPortChecks(profile: Profile): Check[] {
  const name = profile.network.port;
  const out = usedPortChecks(profile, name, 'The network port');
  const port = findPort(profile, name);
  const dos = parseDosVersion(profile.dos);
  if (port && port.present) {
    if (port.attached === 'mouse' || port.attached === 'modem') {
      out.push(profileCheck('port-taken', 'error', `${name} already has a ${port.attached}; the network adapter needs a port of its own.`));
    } else if (port.attached === 'printer' || port.attached === 'other') {
      out.push(profileCheck('port-given-to-other', 'error', `${name} is the network port but is recorded with a ${port.attached} attached.`));
    } else if (port.attached === 'none') {
      out.push(profileCheck('port-no-adapter', 'warning', `${name} is the network port but no adapter is recorded on it.`));
    }
  }
  const others = profile.ports.filter((p) => p.name !== name && p.attached === 'adapter');
  for (const other of others) {
    out.push(profileCheck('adapter-elsewhere', 'warning', `An adapter is recorded on ${other.name}, but the network port is ${name}.`));
  }
  const partner = findPort(profile, IRQ_PARTNER[name] ?? '');
  if (partner && partner.present && partner.attached !== 'none') {
    out.push(
      profileCheck(
        'irq-shared',
        'warning',
        `${name} and ${partner.name} share IRQ ${IRQ_OF[name]}; with a ${partner.attached} on ${partner.name} ` +
          'only one of them can use interrupts at a time.',
      ),
    );
  }
  // [KB40594] DOS before 3.3 does not recognise COM3/COM4 (REFERENCES 1.6).
  if ((name === 'COM3' || name === 'COM4') && dos !== null && !dosFeatures(dos).com34) {
    out.push(profileCheck('com34-before-33', 'error', `DOS ${formatDosVersion(dos)} does not know ${name}; COM3 and COM4 need DOS 3.3 or later.`));
  }
  return out;
}

function redirectChecks(profile: Profile): Check[] {
  const r = profile.redirect;
  if (!r) return [];
  const out = [...usedPortChecks(profile, r.from, 'The printer port'), ...usedPortChecks(profile, r.to, 'The redirect target')];
  const lpt = findPort(profile, r.from);
  if (lpt && lpt.present && lpt.attached === 'printer') {
    out.push(
      profileCheck(
        'printer-on-redirected-lpt',
        'warning',
        `A local printer is on ${r.from}; after the redirection its output goes to ${r.to} instead.`,
      ),
    );
  }
  if (r.to !== profile.network.port) {
    out.push(profileCheck('redirect-not-network', 'warning', `${r.from} is sent to ${r.to}, but the network adapter is on ${profile.network.port}.`));
  }
  const dos = parseDosVersion(profile.dos);
  if ((r.to === 'COM3' || r.to === 'COM4') && r.to !== profile.network.port && dos !== null && !dosFeatures(dos).com34) {
    out.push(profileCheck('com34-before-33', 'error', `DOS ${formatDosVersion(dos)} does not know ${r.to}; COM3 and COM4 need DOS 3.3 or later.`));
  }
  return out;
}

function serialSettingChecks(profile: Profile): Check[] {
  const out: Check[] = [];
  const n = profile.network;
  const dos = parseDosVersion(profile.dos);
  const modern = dos !== null && dos >= 400;
  if (n.baud === 19200) {
    // [PC11] PC-DOS 1.1 MODE has no 19200; [M4] 4.0 takes it only on PS/2 (REFERENCES 1.4, 1.10);
    // [HELP622] "not supported on every machine" (1.9).
    out.push(
      modern
        ? profileCheck('baud-19200', 'note', '19200 baud works only on machines whose BIOS supports it (MS-DOS 4.0 MODE: PS/2 only).')
        : profileCheck('baud-19200', 'warning', 'No source confirms 19200 baud in MODE before DOS 4.0 (PC-DOS 1.1 MODE has no 19200); choose 9600 or lower.'),
    );
  }
  const limited = n.parity === 'M' || n.parity === 'S' || n.dataBits < 7 || n.stopBits === 1.5;
  if (limited) {
    // [M4] MODEPARS.ASM: MARK/SPACE, 5/6 data bits, 1.5 stop bits only on PS/2 (REFERENCES 1.10).
    out.push(profileCheck('serial-setting-limited', 'warning', 'Mark/space parity, 5 or 6 data bits and 1.5 stop bits work only on PS/2-class machines.'));
  }
  return out;
}

function nameChecks(profile: Profile): Check[] {
  const out: Check[] = [];
  for (const [label, path] of [
    ['The resident program path', profile.loader.path],
    ['The DOS folder', profile.dosDir],
  ] as const) {
    for (const p of pathProblems(path)) {
      const slug = p.problem === 'reserved-device' ? 'name-reserved' : 'name-not-83';
      out.push(profileCheck(slug, 'error', `${label} ${path}: "${p.part}": ${p.reason}`));
    }
  }
  const loader = splitDosPath(profile.loader.path);
  if (!loader.absolute) {
    out.push(profileCheck('loader-path-relative', 'warning', `${profile.loader.path} has no full path; DOS finds it only through PATH.`));
  }
  const ext = extensionOf(profile.loader.path);
  const dos = parseDosVersion(profile.dos);
  if (ext === 'BAT' && !dosFeatures(dos).call) {
    // [ENC] / [M4C]: before 3.3 a batch file started from another never returns (REFERENCES 2.2, 2.3).
    out.push(profileCheck('loader-batch-needs-call', 'error', 'The resident program is a batch file; before DOS 3.3 there is no CALL, so AUTOEXEC.BAT would stop there.'));
  } else if (ext !== 'COM' && ext !== 'EXE' && ext !== 'BAT') {
    out.push(profileCheck('loader-extension', 'warning', `${profile.loader.path} does not end in .COM, .EXE or .BAT.`));
  }
  return out;
}

function memoryChecks(profile: Profile): Check[] {
  const free = profile.memory?.freeKB;
  const kit = profile.kit;
  if (free === undefined || !kit) return [];
  // MODE keeps a small resident part for redirection (about 0.5 KB, an estimate: REFERENCES 1.22 [M4]).
  const modeKB = profile.redirect ? 0.5 : 0;
  const left = free - kit.residentKB - modeKB;
  const need = profile.memory?.mainProgramKB;
  if (need !== undefined && left < need) {
    return [profileCheck('memory-low', 'warning', `About ${fmt(left)} KB stays free after ${kit.name}; the main program needs ${fmt(need)} KB.`)];
  }
  return [profileCheck('memory-left', 'note', `About ${fmt(left)} KB of conventional memory stays free after ${kit.name} (if it loads low).`)];
}

function fmt(kb: number): string {
  return Number.isInteger(kb) ? String(kb) : kb.toFixed(1);
}
