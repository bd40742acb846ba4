/**
 * The command lines the block writes, in the syntax the station's DOS accepts.
 * - Serial setup: keyword form `MODE COMn BAUD= PARITY= DATA= STOP=` only from 4.0 ([M4] MODEPARS.ASM,
 *   REFERENCES 1.2); positional `MODE COMn b,p,d,s` before 4.0 ([HELP622], [M4] com_parmsx, 1.1), with the
 *   two-digit baud abbreviations every MODE version lists (1.4 [PC11], 1.8 [M4], 1.9 [HELP622]).
 *   Every field is written, because what MODE does with an omitted field differs between sources (1.13).
 * - Redirection `MODE LPTn:=COMm:` ([HELP622] MODE (Redirect Printing), 1.23), after the serial setup (1.26).
 * - The loader, with `LH` only from 5.0 and only when CONFIG.SYS has DOS=UMB (2.24, 3.10), and CALL for a
 *   batch loader from 3.3 (2.2); `@` hides each line from 3.3 (2.1).
 */
import type { DosFeatures } from './dos-version';
import { extensionOf } from './dos-path';
import type { Profile } from './profile';

const BAUD_SHORT: Record<number, string> = {
  110: '11', 150: '15', 300: '30', 600: '60', 1200: '12', 2400: '24', 4800: '48', 9600: '96', 19200: '19',
};

/** How MODE is named on the line: bare when PATH holds the DOS folder at that point, else by full path. */
export function modeCommand(dosDir: string, pathHasDosDir: boolean): string {
  return pathHasDosDir ? 'MODE' : `${dosDir.replace(/\\+$/, '')}\\MODE`;
}

/** Serial setup of the network port. */
export function serialSetupCommand(profile: Profile, features: DosFeatures, mode: string): string {
  const n = profile.network;
  if (features.modeKeywords) {
    return `${mode} ${n.port} BAUD=${n.baud} PARITY=${n.parity} DATA=${n.dataBits} STOP=${n.stopBits}`;
  }
  return `${mode} ${n.port} ${BAUD_SHORT[n.baud]},${n.parity},${n.dataBits},${n.stopBits}`;
}

/** Printer redirection, or null when the profile asks for none. */
export function redirectCommand(profile: Profile, mode: string): string | null {
  const r = profile.redirect;
  return r ? `${mode} ${r.from}:=${r.to}:` : null;
}

/** The resident loader line. */
export function loaderCommand(profile: Profile, features: DosFeatures, upperMemory: boolean): string {
  const { path, args } = profile.loader;
  const tail = args.trim() === '' ? '' : ` ${args.trim()}`;
  if (extensionOf(path) === 'BAT') return features.call ? `CALL ${path}${tail}` : `${path}${tail}`;
  return `${useLoadHigh(profile, features, upperMemory) ? 'LH ' : ''}${path}${tail}`;
}

/** LH is written only from DOS 5.0, with DOS=UMB in CONFIG.SYS, and when the profile allows it. */
export function useLoadHigh(profile: Profile, features: DosFeatures, upperMemory: boolean): boolean {
  return features.loadHigh && upperMemory && profile.loadHigh === 'auto' && extensionOf(profile.loader.path) !== 'BAT';
}
