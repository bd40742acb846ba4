// The site's station directory: one row per station with what the site screen and the CSV export show.
import type { StationSort } from '@/db/requests/stations';
import { parseDosVersion } from '@/generators/engine/dos-version';
import type { FileMetaRow, ProfileRow, StationRepository, StationRow } from './repository';

/** A PC's progress: its newest plan's state, or how far its profile got. */
export type PlanStatus = 'not-needed' | 'profile-draft' | 'ready' | 'draft' | 'in_review' | 'approved' | 'returned' | 'released' | 'superseded';
export type FileState = 'file' | 'none' | 'missing';

export type DirectoryRow = {
  id: number;
  siteId: number;
  kind: StationRow['kind'];
  name: string;
  number: number;
  location: string;
  notes: string;
  archivedAt: Date | null;
  version: number;
  linkedUser: boolean;
  dos: string | null;
  networkPort: string | null;
  kitId: number | null;
  wizardStep: string | null;
  planStatus: PlanStatus;
  files: { autoexec: FileState; config: FileState };
};

export function directoryRows(repo: StationRepository, siteId: number): DirectoryRow[] {
  const stations = repo.forSite(siteId);
  const ids = stations.map((s) => s.id);
  const profiles = new Map(repo.profilesFor(ids).map((p) => [p.stationId, p]));
  const files = repo.currentFilesFor(ids);
  const plans = repo.planStates(ids);
  return stations.map((s) => toRow(s, profiles.get(s.id), files.filter((f) => f.stationId === s.id), plans.get(s.id)));
}

function toRow(s: StationRow, p: ProfileRow | undefined, files: FileMetaRow[], planState: string | undefined): DirectoryRow {
  const data = (p?.data ?? {}) as { dos?: string; network?: { port?: string } };
  const fileState = (kind: FileMetaRow['kind']): FileState => {
    const f = files.find((x) => x.kind === kind);
    return !f ? 'missing' : f.absent ? 'none' : 'file';
  };
  return {
    id: s.id,
    siteId: s.siteId,
    kind: s.kind,
    name: s.name,
    number: s.number,
    location: s.location,
    notes: s.notes,
    archivedAt: s.archivedAt,
    version: s.version,
    linkedUser: s.userId !== null,
    dos: s.kind === 'pc' ? (data.dos ?? null) : null,
    networkPort: s.kind === 'pc' ? (data.network?.port ?? null) : null,
    kitId: p?.kitId ?? null,
    wizardStep: p?.wizardStep ?? null,
    planStatus: statusOf(s, p, planState),
    files: { autoexec: fileState('AUTOEXEC.BAT'), config: fileState('CONFIG.SYS') },
  };
}

function statusOf(s: StationRow, p: ProfileRow | undefined, planState: string | undefined): PlanStatus {
  if (s.kind !== 'pc') return 'not-needed';
  if (planState) return planState as PlanStatus;
  return p?.wizardStep === 'preview' ? 'ready' : 'profile-draft';
}

/** Order of statuses when sorting: what needs work first. */
const STATUS_ORDER: PlanStatus[] = ['returned', 'profile-draft', 'ready', 'draft', 'in_review', 'approved', 'released', 'superseded', 'not-needed'];
const KIND_ORDER = ['pc', 'printer', 'modem', 'other'];

type Filter = { sort: StationSort; dir: 'asc' | 'desc'; q?: string; kind?: string; archived: boolean };

export function filterAndSort(rows: DirectoryRow[], f: Filter): DirectoryRow[] {
  const q = f.q?.toUpperCase();
  const kept = rows.filter(
    (r) =>
      (f.archived ? r.archivedAt !== null : r.archivedAt === null) &&
      (!f.kind || r.kind === f.kind) &&
      (!q || r.name.includes(q) || r.location.toUpperCase().includes(q) || String(r.number) === q),
  );
  const key = sortKey(f.sort);
  const sign = f.dir === 'desc' ? -1 : 1;
  return kept.sort((a, b) => {
    const [ka, kb] = [key(a), key(b)];
    // Rows without a value (a printer's DOS) go last in either direction.
    if (ka === null || kb === null) return ka === kb ? a.number - b.number : ka === null ? 1 : -1;
    return (ka < kb ? -1 : ka > kb ? 1 : 0) * sign || a.number - b.number;
  });
}

function sortKey(sort: StationSort): (r: DirectoryRow) => string | number | null {
  switch (sort) {
    case 'name':
      return (r) => r.name;
    case 'number':
      return (r) => r.number;
    case 'kind':
      return (r) => KIND_ORDER.indexOf(r.kind);
    case 'dos':
      return (r) => (r.dos ? (parseDosVersion(r.dos) ?? 0) : null);
    case 'networkPort':
      return (r) => r.networkPort;
    case 'status':
      return (r) => STATUS_ORDER.indexOf(r.planStatus);
  }
}
