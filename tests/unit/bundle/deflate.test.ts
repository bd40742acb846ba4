/**
 * The shared-state DEFLATE (generators/bundle/deflate.ts) writes exactly what a fresh pako state writes,
 * input after input, and so the bundle equals, byte for byte, the zip JSZip makes with its own DEFLATE
 * from the same entries at the same level.
 */
import fc from 'fast-check';
import JSZip from 'jszip';
import { BUNDLE_DEFLATE_LEVEL, bundleDate, demoBundleSite } from '@/generators/bundle';
import { RawDeflater } from '@/generators/bundle/deflate';
import { bundleBuffer } from '@/tests/support/bundle-zip';

// pako is JSZip's own dependency (no types installed): the same copy JSZip's DEFLATE uses.
const pako = require(require.resolve('pako', { paths: [require.resolve('jszip')] })) as {
  deflateRaw(data: Uint8Array, options: { level: number }): Uint8Array;
};

describe('shared DEFLATE state', () => {
  it('compresses every input like a fresh pako state, in any order', () => {
    const deflater = new RawDeflater(6);
    fc.assert(
      fc.property(fc.array(fc.uint8Array({ maxLength: 70_000 }), { minLength: 1, maxLength: 6 }), (inputs) =>
        inputs.every((input) => Buffer.from(deflater.deflate(input)).equals(Buffer.from(pako.deflateRaw(input, { level: 6 })))),
      ),
      { numRuns: 40 },
    );
    const text = Buffer.from('REM Bootwright\r\n'.repeat(9000));
    expect(Buffer.from(deflater.deflate(text)).equals(Buffer.from(pako.deflateRaw(text, { level: 6 })))).toBe(true);
  });

  it('gives the bundle JSZip would write with its own DEFLATE', async () => {
    const site = demoBundleSite(30);
    const ours = await bundleBuffer(site);
    const loaded = await JSZip.loadAsync(ours);
    const again = new JSZip();
    const date = bundleDate(site.generatedAt);
    for (const name of Object.keys(loaded.files)) {
      again.file(name, await loaded.files[name].async('uint8array'), { binary: true, date, createFolders: false });
    }
    const stock = await again.generateAsync({
      type: 'nodebuffer', streamFiles: true, compression: 'DEFLATE', compressionOptions: { level: BUNDLE_DEFLATE_LEVEL }, platform: 'DOS',
    });
    expect(stock.length).toBe(ours.length);
    expect(stock.equals(ours)).toBe(true);
  });
});
