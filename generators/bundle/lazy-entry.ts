/**
 * One zip entry whose bytes are made, checksummed and DEFLATEd only when JSZip reaches it (with
 * `streamFiles` JSZip resumes one entry at a time), so a 1,000-station bundle renders each station while
 * it is being zipped and never holds every file at once.
 *
 * Why not a stream source: JSZip gives a stream entry a chain of five workers (stream adapter, CRC-32
 * probe, two length probes, compressor), and that chain and its garbage cost about as much CPU as
 * DEFLATE itself on a bundle of 8,000+ small entries. JSZip takes an entry that is already compressed
 * (its CompressedObject, how it copies entries out of a loaded zip) as one worker; this is that, made
 * lazily. JSZip writes the same headers and data descriptors from the same stream info, so the zip is
 * the same bytes (tests/unit/bundle/deflate.test.ts compares with JSZip's own DEFLATE).
 *
 * Identical inputs (SAMEFILE.COM in every folder, the few distinct original CONFIG.SYS files) are
 * compressed once per bundle: a deflater reset before each input gives the same bytes for the same input.
 */
import { dirname } from 'node:path';
import * as zlib from 'node:zlib';
import { compressions, deflaterFor, JSZIP_METHOD } from './jszip-deflate';
import type { DeflateEngine } from './deflate';

type Chunk = { data: Uint8Array; meta: unknown };
type WorkerBase = {
  streamInfo: Record<string, unknown>;
  isPaused: boolean;
  isFinished: boolean;
  push(chunk: Chunk): void;
  end(): void;
  resume(): boolean;
  error(e: unknown): void;
  withStreamInfo(key: string, value: unknown): WorkerBase;
};
type GenericWorkerClass = {
  new (name: string): WorkerBase;
  prototype: { resume(this: WorkerBase): boolean };
};

const jszipDir = dirname(require.resolve('jszip/package.json'));
const GenericWorker = require(`${jszipDir}/lib/stream/GenericWorker`) as GenericWorkerClass;
const CompressedObject = require(`${jszipDir}/lib/compressedObject`) as { prototype: object };
const jszipCrc32 = require(`${jszipDir}/lib/crc32`) as (input: Uint8Array, crc?: number) => number;

/** CRC-32 (ISO 3309, the zip checksum): Node's zlib where it has one (Node 20.15+), else JSZip's. */
const crc32: (input: Uint8Array) => number =
  typeof (zlib as { crc32?: unknown }).crc32 === 'function'
    ? (input) => (zlib as unknown as { crc32(d: Uint8Array): number }).crc32(input)
    : (input) => jszipCrc32(input) >>> 0;

/** Inputs up to this size are looked up in the per-bundle cache: the repeated files are all small (SAMEFILE.COM
 * is about 200 bytes) and the larger, unique files would only cost a key string each. */
const CACHE_MAX_INPUT = 512;
const CACHE_MAX_ENTRIES = 64;

/** Compressed bytes by input, per bundle, most recently used last; bounded so memory stays flat. */
export class DeflateCache {
  private readonly map = new Map<string, Uint8Array>();

  constructor(
    readonly engine: DeflateEngine,
    readonly level: number,
  ) {}

  compress(input: Uint8Array): Uint8Array {
    const deflater = deflaterFor(this.engine, this.level);
    if (input.length > CACHE_MAX_INPUT) return deflater.deflate(input);
    const key = Buffer.from(input.buffer, input.byteOffset, input.byteLength).toString('latin1');
    const hit = this.map.get(key);
    if (hit) {
      this.map.delete(key);
      this.map.set(key, hit);
      return hit;
    }
    const out = deflater.deflate(input);
    if (this.map.size >= CACHE_MAX_ENTRIES) this.map.delete(this.map.keys().next().value as string);
    this.map.set(key, out);
    return out;
  }
}

/** The one worker of a lazy entry: on its first resume, next turn, makes, checks and compresses the bytes. */
function entryWorker(produce: () => Uint8Array, cache: DeflateCache, compression: unknown): WorkerBase {
  const worker = new GenericWorker('lazy entry');
  let started = false;
  const run = () => {
    if (worker.isFinished) return;
    let input: Uint8Array;
    let data: Uint8Array;
    try {
      input = produce();
      data = cache.compress(input);
    } catch (error) {
      worker.error(error);
      return;
    }
    worker.streamInfo.crc32 = input.length === 0 ? 0 : crc32(input);
    worker.streamInfo.uncompressedSize = input.length;
    worker.streamInfo.compressedSize = data.length;
    worker.push({ data: Buffer.from(data.buffer, data.byteOffset, data.byteLength), meta: { percent: 100 } });
    worker.end();
  };
  worker.resume = function resume() {
    const resumed = GenericWorker.prototype.resume.call(worker);
    // Emitting inside resume() would re-enter JSZip's zip worker before it finished resuming; next turn
    // instead (setImmediate, so a server answering other requests gets its turn between entries).
    if (resumed && !started) {
      started = true;
      setImmediate(run);
    }
    return resumed;
  };
  return worker.withStreamInfo('compression', compression);
}

/**
 * A value for `zip.file(name, value)` that JSZip treats as an already-compressed entry (DEFLATE, method 8)
 * and whose bytes `produce` makes when the entry's turn comes.
 */
export function lazyEntry(produce: () => Uint8Array, cache: DeflateCache): object {
  const compression = compressions[JSZIP_METHOD[cache.engine]];
  const entry = Object.create(CompressedObject.prototype) as Record<string, unknown>;
  entry.compression = compression;
  entry.getCompressedWorker = () => entryWorker(produce, cache, compression);
  entry.getContentWorker = () => {
    throw new Error('a bundle entry is written once and cannot be read back');
  };
  return entry;
}
