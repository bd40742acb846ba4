/**
 * Builds a site's rollout bundle as a zip stream (JSZip `generateNodeStream`, `streamFiles`, DEFLATE at a
 * fixed level, compressed by one reused pako state: deflate.ts). Entries are declared up front in a fixed order with the record's fixed time; their bytes
 * are made lazily, one PC folder at a time, so the same input always gives the same zip, byte for byte,
 * and a large site never sits whole in memory. MANIFEST.CSV comes last: it lists the SHA-256 of every
 * file made before it.
 */
import JSZip from 'jszip';
import { Coalesce } from './coalesce';
import { JSZIP_METHOD } from './jszip-deflate';
import { bundleEntries, placePcs, SITE_FILES } from './layout';
import type { PlacedPc } from './layout';
import { DeflateCache, lazyEntry } from './lazy-entry';
import { manifestBytes, sha256Hex } from './manifest';
import type { ManifestRow } from './manifest';
import { readmeLines, stationsLines, surveyPlaceholderLines } from './site-files';
import { stationFiles } from './station-files';
import { dosLines } from './text';
import type { BundleBuildOptions, BundleSite } from './types';

/** DEFLATE level of every entry; Info-ZIP's default (-6) too, which the bench compares against. */
export const BUNDLE_DEFLATE_LEVEL = 6;

/** The record's time as the zip timestamp. DOS dates run from 1980 to 2107 and are stored in UTC by JSZip. */
export function bundleDate(generatedAt: string): Date {
  const date = new Date(generatedAt);
  const year = date.getUTCFullYear();
  if (Number.isNaN(date.getTime()) || year < 1980 || year > 2107) {
    throw new RangeError(`generatedAt ${JSON.stringify(generatedAt)} is not a time a zip can hold (1980-2107)`);
  }
  return date;
}

/** Renders PC folders on demand, one at a time, and writes their manifest rows. */
class FolderCursor {
  private current = -1;
  private files = new Map<string, Uint8Array>();
  private readonly done = new Set<number>();

  constructor(
    private readonly site: BundleSite,
    private readonly placed: readonly PlacedPc[],
    private readonly rows: Map<string, ManifestRow>,
    private readonly onProgress?: BundleBuildOptions['onProgress'],
  ) {}

  take(index: number, file: string): Uint8Array {
    if (index !== this.current) this.render(index);
    const bytes = this.files.get(file);
    if (!bytes) throw new Error(`${this.placed[index].folder}/${file} was not rendered`);
    this.files.delete(file);
    if (this.files.size === 0 && !this.done.has(index)) {
      this.done.add(index);
      this.onProgress?.(this.done.size, this.placed.length);
    }
    return bytes;
  }

  private render(index: number): void {
    const placed = this.placed[index];
    const { pc, folder } = placed;
    this.current = index;
    this.files = new Map();
    for (const { name, bytes } of stationFiles(this.site, placed)) {
      this.files.set(name, bytes);
      this.rows.set(`${folder}/${name}`, {
        stationNumber: pc.stationNumber,
        stationName: pc.stationName,
        folder,
        file: name,
        planRevisionId: pc.planRevisionId,
        planHash: pc.planHash,
        approvedBy: pc.approvedBy,
        approvedAt: pc.approvedAt,
        sha256: sha256Hex(bytes),
      });
    }
  }
}

function siteFile(site: BundleSite, placed: readonly PlacedPc[], name: string): Uint8Array {
  switch (name) {
    case SITE_FILES.readme:
      return dosLines(readmeLines(site, placed));
    case SITE_FILES.stations:
      return dosLines(stationsLines(site, placed));
    case SITE_FILES.survey:
      return site.surveyReport ?? dosLines(surveyPlaceholderLines(site));
    default:
      throw new Error(`no renderer for ${name}`);
  }
}

function siteRow(name: string, bytes: Uint8Array): ManifestRow {
  return {
    stationNumber: null, stationName: '', folder: '', file: name,
    planRevisionId: '', planHash: '', approvedBy: '', approvedAt: '', sha256: sha256Hex(bytes),
  };
}

/**
 * Streams the bundle of `site`. Throws at once on input that cannot make a valid bundle (bad time, bad
 * boot drive); errors while rendering surface as an 'error' event on the returned stream.
 */
export function buildBundle(site: BundleSite, opts: BundleBuildOptions = {}): NodeJS.ReadableStream {
  const date = bundleDate(site.generatedAt);
  const placed = placePcs(site);
  const entries = bundleEntries(site);
  const rows = new Map<string, ManifestRow>();
  const cursor = new FolderCursor(site, placed, rows, opts.onProgress);
  const indexOfFolder = new Map(placed.map((p, i) => [p.folder, i]));
  const engine = opts.deflate ?? 'pako';
  const cache = new DeflateCache(engine, BUNDLE_DEFLATE_LEVEL);
  const zip = new JSZip();
  const add = (name: string, produce: () => Uint8Array) => {
    // JSZip's types do not list its CompressedObject, which lazyEntry is (lazy-entry.ts).
    zip.file(name, lazyEntry(produce, cache) as unknown as Uint8Array, { binary: true, date, createFolders: false });
  };

  for (const entry of entries) {
    if (entry.name === SITE_FILES.manifest) {
      add(entry.name, () => manifestBytes(entries.filter((e) => e.name !== SITE_FILES.manifest).map((e) => rowOf(rows, e.name))));
    } else if (entry.folder === null) {
      add(entry.name, () => {
        const bytes = siteFile(site, placed, entry.name);
        rows.set(entry.name, siteRow(entry.name, bytes));
        return bytes;
      });
    } else {
      const index = indexOfFolder.get(entry.folder) as number;
      const file = entry.name.slice(entry.folder.length + 1);
      add(entry.name, () => cursor.take(index, file));
    }
  }
  if (placed.length === 0) opts.onProgress?.(0, 0);
  const zipped = zip.generateNodeStream({
    type: 'nodebuffer',
    streamFiles: true,
    // DEFLATE (method 8) through our deflater (deflate.ts); JSZip's types list only its own method names.
    compression: JSZIP_METHOD[engine] as 'DEFLATE',
    compressionOptions: { level: BUNDLE_DEFLATE_LEVEL },
    platform: 'DOS',
  });
  const out = new Coalesce();
  zipped.on('error', (error: Error) => out.destroy(error));
  zipped.pipe(out);
  return out;
}

function rowOf(rows: Map<string, ManifestRow>, name: string): ManifestRow {
  const row = rows.get(name);
  if (!row) throw new Error(`manifest: ${name} was never written`);
  return row;
}
