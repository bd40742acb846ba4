// Everything the engine needs for one station, read from the database in one place, so the plan preview
// (issue 4), plan revisions and the user's checked edit (issue 5) all plan from the same inputs and hashes.
import { and, desc, eq } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import { kit, profile, site, startupFile, station } from '@/db/schema';
import { plan, profileSchema, type PlanResult, type Profile } from '@/generators/engine';
import type { Db } from '../db';
import { notFound } from '../http/errors';

export type StationRow = typeof station.$inferSelect;
export type SiteRow = typeof site.$inferSelect;
export type KitRow = typeof kit.$inferSelect;
export type ProfileRow = typeof profile.$inferSelect;
export type StartupFileRow = typeof startupFile.$inferSelect;
/** A file revision without its bytes (what lists and JSON answers carry). */
export type StartupFileMeta = Omit<StartupFileRow, 'content'>;

/** The current revision of one startup file. `file` null: never recorded; `bytes` null: none on the machine. */
export type FileInput = { file: StartupFileMeta | null; bytes: Uint8Array | null };

export type PlanInputBundle = {
  station: StationRow;
  site: SiteRow;
  profileRow: ProfileRow | null;
  /**
   * The engine profile with the kit merged in (loader path and options, serial defaults, minimum DOS,
   * resident size, CONFIG.SYS needs). Typed as Profile, but only `profileError === null` means it passed
   * the engine's schema; plan() itself answers an invalid profile with a `profile-invalid` check.
   */
  profile: Profile;
  profileError: string | null;
  kit: KitRow | null;
  autoexec: FileInput;
  config: FileInput;
  /** SHA-256 of the canonical profile and kit JSON and of the input file bytes (null when there is none). */
  hashes: { profile: string; kit: string | null; autoexecIn: string | null; configIn: string | null };
};

type DbOrCtx = Db | { db: Db };
const dbOf = (x: DbOrCtx): Db => ('db' in x && !('select' in x) ? x.db : (x as Db));

/** Reads station, site, profile, kit and the newest file revisions; unknown or archived-away ids are 404. */
export function loadPlanInput(source: DbOrCtx, stationId: number): PlanInputBundle {
  const db = dbOf(source);
  const st = db.select().from(station).where(eq(station.id, stationId)).get();
  if (!st) throw notFound('That station');
  const s = db.select().from(site).where(eq(site.id, st.siteId)).get();
  if (!s) throw notFound('That site');
  const row = db.select().from(profile).where(eq(profile.stationId, stationId)).get() ?? null;
  const k = row?.kitId ? (db.select().from(kit).where(eq(kit.id, row.kitId)).get() ?? null) : null;
  const { profile: merged, profileError } = profileFrom((row?.data ?? {}) as Record<string, unknown>, k);
  const autoexec = currentFile(db, stationId, 'AUTOEXEC.BAT');
  const config = currentFile(db, stationId, 'CONFIG.SYS');
  return {
    station: st,
    site: s,
    profileRow: row,
    profile: merged,
    profileError,
    kit: k,
    autoexec,
    config,
    hashes: {
      profile: sha256(canonicalJson(merged)),
      kit: k ? sha256(canonicalJson(kitFacts(k))) : null,
      autoexecIn: autoexec.bytes ? sha256(autoexec.bytes) : null,
      configIn: config.bytes ? sha256(config.bytes) : null,
    },
  };
}

/**
 * The engine profile for stored (or unsaved) profile data and a kit: merged, then validated. When it does not
 * pass the schema, `profile` is the merged data as it is and `profileError` names the first bad field.
 */
export function profileFrom(data: Record<string, unknown>, k: KitRow | null): { profile: Profile; profileError: string | null } {
  const merged = mergeProfile(data, k);
  const parsed = profileSchema.safeParse(merged);
  if (parsed.success) return { profile: parsed.data, profileError: null };
  return { profile: merged as Profile, profileError: describeIssue(parsed.error.issues[0]) };
}

/** The newest revision of one kind (revisions are never overwritten, so the highest id is current). */
export function currentFile(db: Db, stationId: number, kind: StartupFileRow['kind']): FileInput {
  const row = db
    .select()
    .from(startupFile)
    .where(and(eq(startupFile.stationId, stationId), eq(startupFile.kind, kind)))
    .orderBy(desc(startupFile.id))
    .limit(1)
    .get();
  if (!row) return { file: null, bytes: null };
  const { content, ...meta } = row;
  return { file: meta, bytes: row.absent ? null : new Uint8Array(content) };
}

/**
 * The kit's facts win over what the profile says about them: loader path from the kit, options as the
 * station's own (e.g. its station number) followed by the kit's options it does not already name, serial
 * settings from the profile when set and else from the kit.
 */
export function mergeProfile(data: Record<string, unknown>, k: KitRow | null): Record<string, unknown> {
  if (!k) return { ...data };
  const loader = (data.loader ?? {}) as { path?: string; args?: string };
  const network = (data.network ?? {}) as Record<string, unknown>;
  return {
    ...data,
    loader: { path: k.programPath, args: mergeArgs(loader.args ?? '', k.programArgs) },
    network: {
      port: network.port,
      baud: network.baud ?? k.baud,
      parity: network.parity ?? k.parity,
      dataBits: network.dataBits ?? k.dataBits,
      stopBits: network.stopBits ?? k.stopBits,
    },
    kit: {
      name: k.name,
      minDos: k.minDos,
      residentKB: k.residentKB,
      ...(k.configFiles != null ? { files: k.configFiles } : {}),
      ...(k.configBuffers != null ? { buffers: k.configBuffers } : {}),
      ...(k.configLines.length > 0 ? { configLines: k.configLines } : {}),
    },
  };
}

/** Station options first, then each kit option not already given (case-insensitive), single spaces. */
export function mergeArgs(stationArgs: string, kitArgs: string): string {
  const own = stationArgs.split(/\s+/).filter(Boolean);
  const seen = new Set(own.map((a) => a.toUpperCase()));
  const extra = kitArgs.split(/\s+/).filter((a) => a && !seen.has(a.toUpperCase()));
  return [...own, ...extra].join(' ');
}

function kitFacts(k: KitRow) {
  const { id: _id, archivedAt: _a, createdAt: _c, updatedAt: _u, version: _v, ...facts } = k;
  return facts;
}

function describeIssue(issue: { path: PropertyKey[]; message: string } | undefined): string {
  if (!issue) return 'The profile is not valid.';
  const where = issue.path.length > 0 ? issue.path.map(String).join('.') : 'profile';
  return `${where}: ${issue.message}`;
}

/** JSON with object keys sorted at every level, so equal profiles hash equal. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([key, v]) => `${JSON.stringify(key)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value ?? null);
}

export const sha256 = (data: Uint8Array | string) => createHash('sha256').update(data).digest('hex');

/** The engine's result with bytes left out and texts kept, safe to send as JSON or store. */
export type PlanJson = Omit<PlanResult, 'files'> & {
  files: { autoexec: FileJson; config: FileJson | null };
};
export type FileJson = {
  name: PlanResult['files']['autoexec']['name'];
  beforeText: string | null;
  afterText: string;
  changed: boolean;
  diff: string;
  /** Bytes of the patched file (the text shown is decoded code page 437). */
  afterSize: number;
};

export function planToJson(result: PlanResult): PlanJson {
  const file = (f: PlanResult['files']['autoexec']): FileJson => ({
    name: f.name,
    beforeText: f.beforeText,
    afterText: f.afterText,
    changed: f.changed,
    diff: f.diff,
    afterSize: f.after.length,
  });
  return { ...result, files: { autoexec: file(result.files.autoexec), config: result.files.config ? file(result.files.config) : null } };
}

/**
 * Runs the engine on a loaded input. `overrides` lets a caller plan other file bytes (for example a user's
 * pasted file) against the same profile and kit. Returns the engine's result and its JSON-safe form.
 */
export function runPlan(
  input: Pick<PlanInputBundle, 'profile' | 'autoexec' | 'config'>,
  overrides: { autoexec?: Uint8Array | null; config?: Uint8Array | null } = {},
): { result: PlanResult; json: PlanJson } {
  const result = plan({
    profile: input.profile,
    autoexec: overrides.autoexec !== undefined ? overrides.autoexec : input.autoexec.bytes,
    config: overrides.config !== undefined ? overrides.config : input.config.bytes,
  });
  return { result, json: planToJson(result) };
}
