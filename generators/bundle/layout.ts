/**
 * The bundle's file layout: which entries exist, in which order, under which 8.3 names.
 * Folder names come from the station name through names.ts `to83Base` (station number as fallback);
 * collisions after upper-casing get a deterministic `~2`, `~3`, ... suffix in station order.
 */
import { isValid83Name, to83Base } from '../dos/names';
import type { BundleLayoutEntry, BundlePc, BundleSite } from './types';

export const SITE_FILES = {
  readme: 'README.TXT',
  stations: 'STATIONS.TXT',
  survey: 'SURVEY.TXT',
  manifest: 'MANIFEST.CSV',
} as const;

export const PC_FILES = {
  sheet: 'SHEET.TXT',
  install: 'INSTALL.BAT',
  undo: 'UNDO.BAT',
  restore: 'RESTORE.BAT',
  samefile: 'SAMEFILE.COM',
  autoexec: 'AUTOEXEC.BAT',
  config: 'CONFIG.SYS',
  autoexecOld: 'AUTOEXEC.OLD',
  configOld: 'CONFIG.OLD',
  diff: 'CHANGES.DIF',
} as const;

/** One PC with the folder it gets in the bundle. */
export type PlacedPc = { pc: BundlePc; folder: string };

/** PCs in bundle order: by station number, then name, then input position (stable). */
export function orderPcs(pcs: readonly BundlePc[]): BundlePc[] {
  return pcs
    .map((pc, index) => ({ pc, index }))
    .sort(
      (a, b) =>
        a.pc.stationNumber - b.pc.stationNumber ||
        (a.pc.stationName < b.pc.stationName ? -1 : a.pc.stationName > b.pc.stationName ? 1 : 0) ||
        a.index - b.index,
    )
    .map((x) => x.pc);
}

/** Letters and digits only (accents dropped), so a folder name is also safe on a batch command line. */
function folderStem(stationName: string): string {
  return stationName.normalize('NFD').replace(/[^A-Za-z0-9_-]/g, '');
}

function fallbackBase(stationNumber: number): string {
  const digits = String(Math.abs(Math.trunc(stationNumber)) % 1_000_000);
  return `ST${digits}`;
}

/** Gives every PC a unique 8.3 folder name; same input, same names. */
export function placePcs(site: Pick<BundleSite, 'pcs'>): PlacedPc[] {
  const used = new Set<string>();
  return orderPcs(site.pcs).map((pc) => {
    const base = to83Base(folderStem(pc.stationName), fallbackBase(pc.stationNumber));
    let folder = base;
    for (let n = 2; used.has(folder); n++) {
      const suffix = `~${n}`;
      folder = base.slice(0, 8 - suffix.length) + suffix;
    }
    if (!isValid83Name(folder)) throw new Error(`folder name ${folder} is not a valid 8.3 name`);
    used.add(folder);
    return { pc, folder };
  });
}

/** File names in one PC folder, in zip order. Originals and CONFIG.SYS only when they exist. */
export function pcFileNames(pc: BundlePc): string[] {
  const names: string[] = [PC_FILES.sheet, PC_FILES.install, PC_FILES.undo, PC_FILES.restore, PC_FILES.samefile];
  names.push(PC_FILES.autoexec);
  if (pc.configNew !== null) names.push(PC_FILES.config);
  if (pc.autoexecOld !== null) names.push(PC_FILES.autoexecOld);
  if (pc.configOld !== null) names.push(PC_FILES.configOld);
  names.push(PC_FILES.diff);
  return names;
}

/** Every entry of the bundle in zip order: site files, one folder per PC, the manifest last. */
export function bundleEntries(site: Pick<BundleSite, 'pcs'>): BundleLayoutEntry[] {
  const entries: BundleLayoutEntry[] = [SITE_FILES.readme, SITE_FILES.stations, SITE_FILES.survey].map(
    (name) => ({ name, folder: null, stationNumber: null }),
  );
  for (const { pc, folder } of placePcs(site)) {
    for (const file of pcFileNames(pc)) {
      entries.push({ name: `${folder}/${file}`, folder, stationNumber: pc.stationNumber });
    }
  }
  entries.push({ name: SITE_FILES.manifest, folder: null, stationNumber: null });
  return entries;
}

/** The planned entry names of the bundle, in zip order. */
export function bundleLayout(site: Pick<BundleSite, 'pcs'>): string[] {
  return bundleEntries(site).map((entry) => entry.name);
}
