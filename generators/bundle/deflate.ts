/**
 * Raw DEFLATE for the bundle's entries. Default: one pako state kept for every entry of a bundle. JSZip's own DEFLATE builds a fresh
 * pako Deflate per entry, which allocates and zeroes about 256 KB of tables each time: for a 1,000-station
 * bundle (8,000+ small entries) that allocation, not the compression, was the largest cost measured.
 * `deflateReset` gives a state equal to a new one (zlib's contract, kept by the pako port), so the output
 * is the same bytes JSZip's DEFLATE writes at the same level (checked in tests/unit/bundle/deflate.test.ts).
 * pako, not Node's zlib: pako is pure JavaScript pinned by the lockfile, so the same input gives the same
 * zip on every machine and Node version; Node's bundled zlib may change its output between builds.
 * The pako used is the one JSZip itself depends on.
 */
import { dirname } from 'node:path';
import { deflateRawSync } from 'node:zlib';

type ZStream = {
  input: Uint8Array | null;
  next_in: number;
  avail_in: number;
  output: Uint8Array | null;
  next_out: number;
  avail_out: number;
};

type PakoDeflate = {
  deflateInit2(strm: ZStream, level: number, method: number, windowBits: number, memLevel: number, strategy: number): number;
  deflate(strm: ZStream, flush: number): number;
  deflateReset(strm: ZStream): number;
  deflateResetKeep(strm: ZStream): number;
};

/** The fields of pako's deflate state that its lm_init() sets (pako 1.0, as zlib's). */
type LmState = {
  w_size: number;
  window_size: number;
  head: Uint16Array;
  max_lazy_match: number;
  good_match: number;
  nice_match: number;
  max_chain_length: number;
  strstart: number;
  block_start: number;
  lookahead: number;
  insert: number;
  match_length: number;
  prev_length: number;
  match_available: number;
  ins_h: number;
};
type LmParams = Pick<LmState, 'max_lazy_match' | 'good_match' | 'nice_match' | 'max_chain_length'>;

const Z_OK = 0;
const Z_STREAM_END = 1;
const Z_FINISH = 4;
const Z_DEFLATED = 8;
const CHUNK = 64 * 1024;
const MIN_MATCH = 3;

const jszipDir = dirname(require.resolve('jszip/package.json'));
const pakoDeflate = require(require.resolve('pako/lib/zlib/deflate', { paths: [jszipDir] })) as PakoDeflate;
const ZStreamClass = require(require.resolve('pako/lib/zlib/zstream', { paths: [jszipDir] })) as new () => ZStream;

/** A raw (no header) DEFLATE compressor at a fixed level that reuses its tables between inputs. */
export class RawDeflater implements Deflater {
  private readonly strm: ZStream;
  private readonly out = new Uint8Array(CHUNK);
  private readonly params: LmParams;

  constructor(readonly level: number) {
    this.strm = new ZStreamClass();
    // Same parameters as pako's Deflate with { raw: true, level }: window 2^15, memLevel 8, default strategy.
    const status = pakoDeflate.deflateInit2(this.strm, level, Z_DEFLATED, -15, 8, 0);
    if (status !== Z_OK) throw new Error(`pako deflateInit2 failed (${status})`);
    const s = (this.strm as ZStream & { state: LmState }).state;
    this.params = { max_lazy_match: s.max_lazy_match, good_match: s.good_match, nice_match: s.nice_match, max_chain_length: s.max_chain_length };
  }

  /**
   * pako's deflateReset(), with the hash table cleared by fill(0): pako clears it (64 KB) in a JavaScript
   * loop, which for thousands of small entries cost more than compressing them. Same fields, same values
   * as lm_init() in pako 1.0's deflate.js (zlib's), so the state equals a fresh one.
   */
  private reset(): void {
    const status = pakoDeflate.deflateResetKeep(this.strm);
    if (status !== Z_OK) throw new Error(`pako deflateResetKeep failed (${status})`);
    const s = (this.strm as ZStream & { state: LmState }).state;
    s.window_size = 2 * s.w_size;
    s.head.fill(0);
    s.max_lazy_match = this.params.max_lazy_match;
    s.good_match = this.params.good_match;
    s.nice_match = this.params.nice_match;
    s.max_chain_length = this.params.max_chain_length;
    s.strstart = 0;
    s.block_start = 0;
    s.lookahead = 0;
    s.insert = 0;
    s.match_length = s.prev_length = MIN_MATCH - 1;
    s.match_available = 0;
    s.ins_h = 0;
  }

  /** Compresses one whole input; synchronous, so one deflater can serve many bundles in turn. */
  deflate(input: Uint8Array): Uint8Array {
    const strm = this.strm;
    strm.input = input;
    strm.next_in = 0;
    strm.avail_in = input.length;
    const parts: Uint8Array[] = [];
    let status: number;
    do {
      strm.output = this.out;
      strm.next_out = 0;
      strm.avail_out = CHUNK;
      status = pakoDeflate.deflate(strm, Z_FINISH);
      if (status !== Z_OK && status !== Z_STREAM_END) throw new Error(`pako deflate failed (${status})`);
      parts.push(this.out.slice(0, strm.next_out));
    } while (status !== Z_STREAM_END);
    strm.input = null;
    this.reset();
    return parts.length === 1 ? parts[0] : concat(parts);
  }
}

function concat(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

/** Which DEFLATE implementation compresses the entries (both write standard DEFLATE, method 8). */
export type DeflateEngine = 'pako' | 'node-zlib';

/** The interface both engines share: one whole input in, its raw DEFLATE stream out. */
export type Deflater = { deflate(input: Uint8Array): Uint8Array };

/**
 * Node's zlib (C): several times faster than pako, but its bytes are only as stable as the zlib that
 * Node bundles, which has changed between Node releases; use it where speed matters more than getting
 * the identical zip back after an upgrade.
 */
export class NodeZlibDeflater implements Deflater {
  constructor(readonly level: number) {}

  deflate(input: Uint8Array): Uint8Array {
    return deflateRawSync(input, { level: this.level });
  }
}
