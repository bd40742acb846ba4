/**
 * Registers our DEFLATE worker with JSZip 3.10 (pinned in package.json): JSZip looks compression methods
 * up by name in its `lib/compressions` table, and an entry there with DEFLATE's method id (08 00) makes
 * ordinary DEFLATE entries that any unzip reads. The worker collects an entry's bytes and compresses them
 * in one go with the shared RawDeflater (deflate.ts).
 */
import { dirname } from 'node:path';
import { NodeZlibDeflater, RawDeflater } from './deflate';
import type { Deflater, DeflateEngine } from './deflate';

type Chunk = { data: Uint8Array; meta: unknown };
type Worker = {
  push(chunk: Chunk): void;
};
type GenericWorkerClass = {
  new (name: string): Worker;
  prototype: { flush(this: Worker): void };
};
type Compression = { magic: string; compressWorker(options: { level?: number }): Worker; uncompressWorker(): Worker };

const jszipDir = dirname(require.resolve('jszip/package.json'));
export const compressions = require(`${jszipDir}/lib/compressions`) as Record<string, Compression>;
const GenericWorker = require(`${jszipDir}/lib/stream/GenericWorker`) as GenericWorkerClass;

/** The name to pass as JSZip's `compression` option for each engine. */
export const JSZIP_METHOD: Record<DeflateEngine, string> = {
  pako: 'BOOTWRIGHT-DEFLATE',
  'node-zlib': 'BOOTWRIGHT-DEFLATE-ZLIB',
};

const deflaters = new Map<string, Deflater>();

export function deflaterFor(engine: DeflateEngine, level: number): Deflater {
  const key = `${engine}:${level}`;
  let d = deflaters.get(key);
  if (!d) deflaters.set(key, (d = engine === 'pako' ? new RawDeflater(level) : new NodeZlibDeflater(level)));
  return d;
}

/** A JSZip worker that buffers one entry and emits it compressed when the entry ends. */
function createWorker(engine: DeflateEngine, level: number): Worker {
  const worker = new GenericWorker('shared DEFLATE') as Worker & {
    processChunk(chunk: Chunk): void;
    flush(): void;
  };
  const parts: Uint8Array[] = [];
  let meta: unknown = {};
  worker.processChunk = (chunk) => {
    meta = chunk.meta;
    parts.push(chunk.data);
  };
  worker.flush = function flush() {
    GenericWorker.prototype.flush.call(worker);
    const input = parts.length === 1 ? parts[0] : Buffer.concat(parts);
    parts.length = 0;
    worker.push({ data: deflaterFor(engine, level).deflate(input), meta });
  };
  return worker;
}

for (const engine of Object.keys(JSZIP_METHOD) as DeflateEngine[]) {
  const name = JSZIP_METHOD[engine];
  if (compressions[name]) continue;
  const deflate = compressions.DEFLATE;
  if (!deflate || deflate.magic !== '\x08\x00') throw new Error('JSZip has no DEFLATE method to stand beside');
  compressions[name] = {
    magic: deflate.magic,
    compressWorker: (options) => createWorker(engine, options.level ?? 6),
    uncompressWorker: () => deflate.uncompressWorker(),
  };
}
