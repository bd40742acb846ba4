/**
 * Rollout bundles: one zip per site with, for every PC that has an approved plan, the new and the
 * original startup files, the diff, an installer, an undo and an install sheet, plus the station
 * directory, a manifest of hashes and the survey report. Pure TypeScript, no database or server.
 */
export type { BundleBootStep, BundleBuildOptions, BundlePc, BundleSite, BundleStationEntry } from './types';

/** Streams the site's bundle zip; same input, same bytes. `onProgress(done, total)` counts PC folders. */
export { buildBundle, bundleDate, BUNDLE_DEFLATE_LEVEL } from './build';

/** The entry names the bundle of `site` will hold, in zip order, without building it. */
export { bundleLayout, bundleEntries, placePcs, PC_FILES, SITE_FILES } from './layout';

/** The bytes of SAMEFILE.COM (source samefile.asm). */
export { SAMEFILE_COM } from './samefile';

/** Synthetic sites in the demo scenario, for tests, the bench and the demo seed. */
export { demoBundleSite, DEMO_GENERATED_AT, DEMO_SITE_NAME } from './demo';
