/**
 * Gathers JSZip's many small output chunks (every header and data descriptor is its own chunk) into
 * blocks of 64 KB, so a file or socket gets a few large writes instead of tens of thousands of tiny ones.
 * Also turns JSZip's readable-stream 2 output into a current Node stream (async iteration, pipeline()).
 */
import { Transform } from 'node:stream';
import type { TransformCallback } from 'node:stream';

const BLOCK = 64 * 1024;

export class Coalesce extends Transform {
  private parts: Buffer[] = [];
  private size = 0;

  override _transform(chunk: Buffer, _encoding: BufferEncoding, done: TransformCallback): void {
    this.parts.push(chunk);
    this.size += chunk.length;
    if (this.size >= BLOCK) this.release();
    done();
  }

  override _flush(done: TransformCallback): void {
    if (this.size > 0) this.release();
    done();
  }

  private release(): void {
    this.push(this.parts.length === 1 ? this.parts[0] : Buffer.concat(this.parts, this.size));
    this.parts = [];
    this.size = 0;
  }
}
