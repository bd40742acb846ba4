/**
 * Input of the rollout-bundle builder. Plain data, independent of the database and of the engine: the
 * server (later) maps its approved plan revisions onto these shapes, tests and the bench build them
 * directly (see demo.ts).
 */

/** One device on the site's network, for the station directory (STATIONS.TXT). */
export type BundleStationEntry = {
  name: string;
  number: number;
  kind: 'pc' | 'printer' | 'modem' | 'other';
  location?: string;
};

/** A line of a boot preview: what runs at boot, in order. */
export type BundleBootStep = { line: number; program: string; args: string };

/** One approved plan for one PC, with the bytes it was made from and the bytes it produces. */
export type BundlePc = {
  stationName: string;
  stationNumber: number;
  /** DOS version as the user reads it with VER, "3.30" .. "6.22" (older versions down to 2.0 are accepted). */
  dos: string;
  /** Boot drive letter; C when left out. */
  bootDrive?: string;
  ports: Array<{ name: string; attached: string }>;
  planRevisionId: string;
  planHash: string;
  approvedBy: string;
  approvedAt: string;
  /** The PC's AUTOEXEC.BAT when the plan was made, or null when the PC had none. */
  autoexecOld: Uint8Array | null;
  autoexecNew: Uint8Array;
  /** The PC's CONFIG.SYS when the plan was made, or null when the PC had none. */
  configOld: Uint8Array | null;
  /** The planned CONFIG.SYS; null when the plan leaves CONFIG.SYS as it is. */
  configNew: Uint8Array | null;
  /** Unified diff of the plan (any line ends; written out with CR LF). */
  diff: string;
  changes: Array<{ file: string; line: number; lines: string[]; reason: string }>;
  checks: Array<{ slug: string; severity: string; message: string; reason?: string | null }>;
  bootBefore: BundleBootStep[];
  bootAfter: BundleBootStep[];
};

/** One site (client office) with the approved plans that go into its bundle. */
export type BundleSite = {
  id: string;
  name: string;
  address?: string;
  /** Every station of the site: PCs, printers, modems, other devices. */
  stations: BundleStationEntry[];
  /** The PCs that get a folder, one approved plan each. */
  pcs: BundlePc[];
  /** The wiring survey report (DOS text) when one was recorded. */
  surveyReport?: Uint8Array | null;
  /** Fixed ISO time from the bundle's record; every zip timestamp uses it, so rebuilding gives the same bytes. */
  generatedAt: string;
};

/** Options of buildBundle. */
export type BundleBuildOptions = {
  /** Called after each PC folder has been written into the stream: (folders done, folders in total). */
  onProgress?: (done: number, total: number) => void;
  /**
   * DEFLATE implementation. 'pako' (default): pure JavaScript pinned by the lockfile, the same zip on every
   * machine and Node version. 'node-zlib': Node's C zlib, several times faster, but its bytes may change
   * when Node's bundled zlib does. Both write standard DEFLATE at the same level.
   */
  deflate?: 'pako' | 'node-zlib';
};

/** One planned zip entry: its full name inside the zip and, for station files, the PC it belongs to. */
export type BundleLayoutEntry = {
  name: string;
  folder: string | null;
  stationNumber: number | null;
};
