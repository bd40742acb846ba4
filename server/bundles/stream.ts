// Streams a bundle zip into an HTTP response while hashing it, and says how it ended: every byte handed
// to the connection, or stopped early (the client went away, or the builder failed). Nothing here touches
// the database; the service decides what an ending means.
import type { Response } from 'express';
import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import { buildBundle, type BundleSite } from '@/generators/bundle';

export type Progress = (done: number, total: number) => void;

export type StreamOutcome = { ok: true; sha256: string; size: number } | { ok: false; reason: string };

/** Builds the zip and pipes it into `res` (headers must be set); resolves once the response has ended. */
export function pipeBundle(site: BundleSite, res: Response, progress: Progress): Promise<StreamOutcome> {
  const hash = createHash('sha256');
  let size = 0;
  let done = 0;
  const total = site.pcs.length;
  const zip = buildBundle(site, {
    onProgress: (d, t) => {
      done = d;
      progress(d, t);
    },
  }) as Readable;
  return new Promise((resolve) => {
    let settled = false;
    const settle = (outcome: StreamOutcome) => {
      if (settled) return;
      settled = true;
      resolve(outcome);
    };
    zip.on('data', (chunk: Buffer) => {
      hash.update(chunk);
      size += chunk.length;
    });
    zip.on('error', (err: Error) => {
      settle({ ok: false, reason: `The zip could not be made: ${err.message}` });
      res.destroy(err);
    });
    // 'close' comes after the last byte went to the connection, or when the client stopped reading first.
    res.on('close', () => {
      if (res.writableFinished) return settle({ ok: true, sha256: hash.digest('hex'), size });
      zip.unpipe(res);
      zip.destroy();
      settle({ ok: false, reason: `The download was cancelled or cut off after ${done} of ${total} stations.` });
    });
    zip.pipe(res);
  });
}

/** Builds the zip only to hash it (a refetch checks the rebuilt bytes before sending any). */
export async function hashBundle(site: BundleSite, progress: Progress): Promise<{ sha256: string; size: number }> {
  const hash = createHash('sha256');
  let size = 0;
  for await (const chunk of buildBundle(site, { onProgress: progress }) as AsyncIterable<Buffer>) {
    hash.update(chunk);
    size += chunk.length;
  }
  return { sha256: hash.digest('hex'), size };
}
