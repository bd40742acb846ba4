/**
 * Renders every file of one PC folder. Called once per PC while the zip streams, so only one PC's files
 * exist at a time.
 */
import { installBatLines } from './install-bat';
import { PC_FILES, pcFileNames } from './layout';
import type { PlacedPc } from './layout';
import { restoreBatLines } from './restore-bat';
import { SAMEFILE_COM } from './samefile';
import { sheetLines } from './sheet';
import { dosLines, dosTextAnyLength } from './text';
import type { BundleSite } from './types';
import { undoBatLines } from './undo-bat';

export type BundleFile = { name: string; bytes: Uint8Array };

type SiteHead = Pick<BundleSite, 'name' | 'address' | 'generatedAt'>;

function render(site: SiteHead, placed: PlacedPc, name: string): Uint8Array {
  const { pc } = placed;
  switch (name) {
    case PC_FILES.sheet:
      return dosLines(sheetLines(site, placed));
    case PC_FILES.install:
      return dosLines(installBatLines(placed));
    case PC_FILES.undo:
      return dosLines(undoBatLines(placed));
    case PC_FILES.restore:
      return dosLines(restoreBatLines(placed));
    case PC_FILES.samefile:
      return SAMEFILE_COM;
    case PC_FILES.autoexec:
      return pc.autoexecNew;
    case PC_FILES.config:
      return pc.configNew ?? new Uint8Array(0);
    case PC_FILES.autoexecOld:
      return pc.autoexecOld ?? new Uint8Array(0);
    case PC_FILES.configOld:
      return pc.configOld ?? new Uint8Array(0);
    case PC_FILES.diff:
      return dosTextAnyLength(pc.diff);
    default:
      throw new Error(`no renderer for ${name}`);
  }
}

/** The files of one PC folder in zip order. The startup files are passed through byte for byte. */
export function stationFiles(site: SiteHead, placed: PlacedPc): BundleFile[] {
  return pcFileNames(placed.pc).map((name) => ({ name, bytes: render(site, placed, name) }));
}
