// Maps a bundle record and the rows it names onto the builder's input (generators/bundle/types.ts). Plan
// revisions and startup-file revisions never change; everything else comes from the record's snapshot, so
// the same record always gives the same BundleSite and so the same zip.
import type { BundleRecordPlan } from '@/db/bundles';
import { checkKey } from '@/db/requests/plans';
import type { BundlePc, BundleSite } from '@/generators/bundle';
import type { StoredResult } from '../plans/view';
import type { BundleRecordRow, BundleRepository, PlanRow } from './repository';

/** Plain words for what sits on a port (the profile's `attached` values). */
const ATTACHED_WORDS: Record<string, string> = {
  adapter: 'network adapter',
  mouse: 'mouse',
  modem: 'modem',
  printer: 'printer',
  other: 'other device',
  none: 'nothing attached',
};

/** The plan revision as the sheet, the installers and the manifest print it: "3 (#12)". */
export const revisionLabel = (p: Pick<BundleRecordPlan, 'planId' | 'revision'>) => `${p.revision ?? '?'} (#${p.planId})`;

type Profile = { dos?: string; bootDrive?: string; ports?: Array<{ name: string; present: boolean; attached: string }> };

function portsOf(profile: Profile): BundlePc['ports'] {
  return (profile.ports ?? []).filter((p) => p.present).map((p) => ({ name: p.name, attached: ATTACHED_WORDS[p.attached] ?? p.attached }));
}

/** The original file a plan was made from; null when the PC had none. Its hash must be the plan's. */
function original(files: ReturnType<BundleRepository['fileBytes']>, fileId: number | null, hash: string | null, what: string): Uint8Array | null {
  if (hash === null) return null;
  const file = fileId === null ? undefined : files.get(fileId);
  if (!file || file.absent || file.sha256 !== hash) throw new Error(`${what}: the stored original does not match the plan's input hash`);
  return new Uint8Array(file.content);
}

function toPc(entry: BundleRecordPlan, row: PlanRow, files: ReturnType<BundleRepository['fileBytes']>): BundlePc {
  const result = row.result as unknown as StoredResult;
  const profile = result.inputs.profile as Profile;
  const name = `plan ${row.id}`;
  const configChanged = !!result.files.config?.changed && row.configOut !== null;
  return {
    stationName: entry.stationName ?? `ST${entry.stationNumber}`,
    stationNumber: entry.stationNumber ?? 0,
    dos: profile.dos ?? '3.30',
    bootDrive: profile.bootDrive,
    ports: portsOf(profile),
    planRevisionId: revisionLabel(entry),
    planHash: row.planHash,
    approvedBy: entry.approvedBy ?? 'unknown',
    approvedAt: entry.approvedAt ?? '',
    autoexecOld: original(files, row.autoexecFileId, row.autoexecInHash, `${name} AUTOEXEC.BAT`),
    autoexecNew: new Uint8Array(row.autoexecOut),
    configOld: original(files, row.configFileId, row.configInHash, `${name} CONFIG.SYS`),
    configNew: configChanged ? new Uint8Array(row.configOut!) : null,
    diff: result.diff,
    changes: result.changes.map((c) => ({ file: c.file, line: c.line, lines: c.lines, reason: c.reason })),
    checks: result.checks.map((c) => ({ slug: c.slug, severity: c.severity, message: c.message, reason: row.warningReasons[checkKey(c)] ?? null })),
    bootBefore: result.boot.before.map(({ line, program, args }) => ({ line, program, args })),
    bootAfter: result.boot.after.map(({ line, program, args }) => ({ line, program, args })),
  };
}

/** The builder's input for `record`; throws when a plan revision it names is gone or its hash moved. */
export function toBundleSite(repo: BundleRepository, record: BundleRecordRow): BundleSite {
  const snapshot = record.snapshot;
  if (!snapshot) throw new Error(`bundle ${record.id} has no snapshot of its site`);
  const rows = repo.plans(record.plans.map((p) => p.planId));
  const byId = new Map(rows.map((r) => [r.id, r]));
  const files = repo.fileBytes(rows.flatMap((r) => [r.autoexecFileId, r.configFileId]).filter((id): id is number => id !== null));
  const pcs = record.plans.map((entry) => {
    const row = byId.get(entry.planId);
    if (!row) throw new Error(`plan ${entry.planId} of bundle ${record.id} is gone`);
    if (row.planHash !== entry.planHash) throw new Error(`plan ${entry.planId} no longer has the hash bundle ${record.id} recorded`);
    return toPc(entry, row, files);
  });
  return {
    id: String(record.siteId),
    name: snapshot.site.name,
    address: snapshot.site.address || undefined,
    stations: snapshot.stations.map((s) => ({ name: s.name, number: s.number, kind: s.kind, location: s.location || undefined })),
    pcs,
    surveyReport: record.surveyReport ? new Uint8Array(record.surveyReport) : null,
    generatedAt: record.generatedAt,
  };
}
