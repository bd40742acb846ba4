/**
 * Old lines outside our block that the block would duplicate or contradict: another setup of the network
 * port, another redirection of the same printer port (or a cancel after our block: `MODE LPTn` alone cancels
 * in MS-DOS, REFERENCES 1.25 [M4] INVOKE.ASM, [HELP622]), and the same resident program. They are turned
 * into REM lines, each with a check; nothing is deleted.
 */
import { stemOf } from './dos-path';
import type { BatchLine } from './model';
import { programOf } from './programs';
import type { Profile } from './profile';
import type { Severity } from './check';

export type Conflict = { index: number; slug: string; severity: Severity; message: string };

type ModeTarget =
  | { kind: 'serial'; port: string; settings: string }
  | { kind: 'redirect'; lpt: string; com: string }
  | { kind: 'cancel'; lpt: string }
  | null;

/** What a MODE command line does, from its arguments (REFERENCES 1.1, 1.2, 1.23, 1.25, 1.29). */
export function modeTarget(args: string): ModeTarget {
  // Output redirection (`> NUL`) and pipes are not MODE's arguments.
  const a = args.replace(/[<>|].*$/, '').trim().toUpperCase();
  const redirect = /^(LPT\d):?[ \t]*=[ \t]*(COM\d):?[ \t]*$/.exec(a);
  if (redirect) return { kind: 'redirect', lpt: redirect[1], com: redirect[2] };
  const cancel = /^(LPT\d):?[ \t]*$/.exec(a);
  if (cancel) return { kind: 'cancel', lpt: cancel[1] };
  const serial = /^(COM\d)(:?)(.*)$/.exec(a);
  if (serial) {
    const rest = serial[3];
    if (rest.trim() !== '' && (serial[2] === ':' || /^[ \t,]/.test(rest))) {
      return { kind: 'serial', port: serial[1], settings: squeeze(rest) };
    }
  }
  return null;
}

const BAUD_LONG: Record<string, string> = { '11': '110', '15': '150', '30': '300', '60': '600', '12': '1200', '24': '2400', '48': '4800', '96': '9600', '19': '19200', '19.2': '19200', '19.2K': '19200' };

/**
 * Baud, parity, data and stop bits of a serial setup in either form (REFERENCES 1.1 positional, 1.2 keyword,
 * 1.8 abbreviations), or null when a field is missing: then the old line cannot be called the same as ours.
 */
export function serialSettings(settings: string): string | null {
  const s = settings.trim().toUpperCase();
  let fields: (string | undefined)[];
  if (/BAUD\s*=/.test(s)) {
    const get = (k: string) => new RegExp(`\\b${k}\\s*=\\s*([^\\s]+)`).exec(s)?.[1];
    fields = [get('BAUD'), get('PARITY') ?? get('PAR'), get('DATA'), get('STOP')];
  } else {
    fields = s.split(',').map((f) => f.trim());
  }
  const [baud, parity, data, stop] = fields;
  if (!baud || !parity || !data || !stop) return null;
  return [BAUD_LONG[baud] ?? baud, parity[0], data, stop].join(',');
}

function squeeze(text: string): string {
  return text.trim().toUpperCase().replace(/^[:\s]+/, '').replace(/\s+/g, ' ');
}

export type ConflictInput = {
  lines: readonly BatchLine[];
  profile: Profile;
  /** Position (0..n) of our block in `lines`. */
  position: number;
  /** Arguments of the serial setup line we write, e.g. "COM1 BAUD=9600 ...". */
  ourSerialArgs: string;
  reach: readonly boolean[];
};

/** Every conflicting line, in file order. */
export function findConflicts(input: ConflictInput): Conflict[] {
  const out: Conflict[] = [];
  const loaderStem = stemOf(input.profile.loader.path);
  input.lines.forEach((line, i) => {
    const p = programOf(line);
    if (!p) return;
    const stem = stemOf(p.program);
    const found = stem === 'MODE' ? modeConflict(input, i, p.args) : stem === loaderStem ? loaderConflict(input, i, p.args) : null;
    if (found) out.push(found);
  });
  return out;
}

function modeConflict(input: ConflictInput, i: number, args: string): Conflict | null {
  const t = modeTarget(args);
  const { network, redirect } = input.profile;
  const lineNo = input.lines[i].index + 1;
  if (t?.kind === 'serial' && t.port === network.port) {
    const ours = serialSettings(input.ourSerialArgs.replace(/^COM\d:?/i, ''));
    const same = ours !== null && serialSettings(t.settings) === ours;
    return {
      index: i,
      slug: same ? 'serial-setup-duplicate' : 'serial-setup-replaced',
      severity: same ? 'note' : 'warning',
      message: same
        ? `Line ${lineNo} sets ${t.port} up the same way as our block; it is turned into a REM line.`
        : `Line ${lineNo} sets ${t.port} up differently from our block; it is turned into a REM line.`,
    };
  }
  if (!redirect) return null;
  if (t?.kind === 'redirect' && t.lpt === redirect.from) {
    const same = t.com === redirect.to;
    return {
      index: i,
      slug: same ? 'redirect-duplicate' : 'redirect-conflict',
      severity: same ? 'note' : 'warning',
      message: same
        ? `Line ${lineNo} already sends ${t.lpt} to ${t.com}; our block does that now, so it is turned into a REM line.`
        : `Line ${lineNo} sends ${t.lpt} to ${t.com}, but the network needs ${redirect.to}; it is turned into a REM line.`,
    };
  }
  if (t?.kind === 'cancel' && t.lpt === redirect.from && i >= input.position && input.reach[i]) {
    return {
      index: i,
      slug: 'redirect-cancel',
      severity: 'warning',
      message: `Line ${lineNo} cancels the redirection of ${t.lpt} after our block; it is turned into a REM line.`,
    };
  }
  return null;
}

function loaderConflict(input: ConflictInput, i: number, args: string): Conflict {
  const lineNo = input.lines[i].index + 1;
  const same = squeeze(args) === squeeze(input.profile.loader.args);
  const unreachable = input.reach[i] ? '' : ' No boot path reaches it anyway.';
  return {
    index: i,
    slug: same ? 'loader-duplicate' : 'loader-other-options',
    severity: same ? 'note' : 'warning',
    message: same
      ? `Line ${lineNo} already loads the resident program; our block loads it now, so it is turned into a REM line.${unreachable}`
      : `Line ${lineNo} loads the resident program with other options (${args.trim() || 'none'}); it is turned into a REM line.${unreachable}`,
  };
}
