/**
 * Helpers for the bundle tests: build a bundle into memory or a file, check it with Info-ZIP
 * (Debian `unzip`), extract it, and read its entries back with JSZip.
 */
import { spawnSync } from 'node:child_process';
import { createWriteStream, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import JSZip from 'jszip';
import { buildBundle } from '@/generators/bundle';
import type { BundleBuildOptions, BundleSite } from '@/generators/bundle';
import { requireProgram } from './bundle-dosbox';

/** The whole bundle as one buffer (small sites only). */
export async function bundleBuffer(site: BundleSite, opts?: BundleBuildOptions): Promise<Buffer> {
  const chunks: Buffer[] = [];
  const stream = buildBundle(site, opts);
  for await (const chunk of stream as AsyncIterable<Buffer>) chunks.push(chunk);
  return Buffer.concat(chunks);
}

/** Streams the bundle into a file and resolves when it is written. */
export function writeBundle(site: BundleSite, file: string, opts?: BundleBuildOptions): Promise<void> {
  return new Promise((resolve, reject) => {
    const out = createWriteStream(file);
    const stream = buildBundle(site, opts);
    stream.on('error', reject);
    out.on('error', reject);
    out.on('finish', () => resolve());
    stream.pipe(out);
  });
}

export function tempDir(prefix: string): string {
  return mkdtempSync(join(tmpdir(), prefix));
}

/** Info-ZIP's verdict on a zip file: `unzip -t` output and exit status (0 = no errors). */
export function unzipTest(file: string): { status: number | null; output: string } {
  requireProgram('unzip', 'unzip');
  const res = spawnSync('unzip', ['-t', file], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  return { status: res.status, output: `${res.stdout}${res.stderr}` };
}

/** Entry names as Info-ZIP lists them (`unzip -Z1`), in archive order. */
export function unzipNames(file: string): string[] {
  requireProgram('unzip', 'unzip');
  const res = spawnSync('unzip', ['-Z1', file], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  if (res.status !== 0) throw new Error(`unzip -Z1 failed: ${res.stderr}`);
  return res.stdout.split('\n').filter((l) => l !== '');
}

/** Extracts with Info-ZIP into `dir`. */
export function unzipInto(file: string, dir: string): void {
  requireProgram('unzip', 'unzip');
  const res = spawnSync('unzip', ['-q', '-o', file, '-d', dir], { encoding: 'utf8' });
  if (res.status !== 0) throw new Error(`unzip failed: ${res.stderr}`);
}

/** Every entry of a zip buffer with its bytes, read back with JSZip. */
export async function zipEntries(buffer: Buffer): Promise<Map<string, Uint8Array>> {
  const zip = await JSZip.loadAsync(buffer);
  const out = new Map<string, Uint8Array>();
  for (const name of Object.keys(zip.files)) {
    const file = zip.files[name];
    if (!file.dir) out.set(name, await file.async('uint8array'));
  }
  return out;
}
