// Turns the survey's rows into what the computation reads (ids are the technician's refs) and into the
// rows the API answers with.
import {
  readingRef, terminatorRef,
  type SurveyJackRow, type SurveyNodeRow, type SurveyReadingRow, type SurveyRunRow, type SurveySettingsRow, type SurveyTerminatorRow,
} from '@/db/requests/survey';
import type { Gauge, SurveyInput } from '@/generators/survey';
import type { SurveyRows } from './repository';

/** A stored voltage back to a number; the text itself is what the API answers with. */
function volts(text: string | null): number | null {
  return text === null ? null : Number(text);
}

/** "2026-03-02 09:15" (UTC): a reading's time as the report prints it. */
export function readingTime(at: Date): string {
  return at.toISOString().slice(0, 16).replace('T', ' ');
}

export function toSurveyInput(siteName: string, rows: SurveyRows): SurveyInput {
  const jackRef = new Map(rows.jacks.map((j) => [j.id, j.ref]));
  const nodeRef = new Map(rows.nodes.map((n) => [n.id, n.ref]));
  const centre = rows.settings?.centreNodeId ?? null;
  return {
    siteName,
    jacks: rows.jacks.map((j) => ({ id: j.ref, label: j.label, room: j.room || undefined, station: j.station || undefined })),
    pairTests: rows.readings.map((t) => ({
      id: readingRef(t.id),
      jackId: jackRef.get(t.jackId) ?? `#${t.jackId}`,
      pair: t.pair,
      vdc: volts(t.vdcVolts),
      vac: volts(t.vacVolts),
      continuity: t.continuity,
      by: t.testedByName || undefined,
      at: readingTime(t.testedAt),
    })),
    nodes: rows.nodes.map((n) => ({
      id: n.ref, kind: n.kind, label: n.label, jackId: n.jackId === null ? undefined : jackRef.get(n.jackId),
    })),
    runs: rows.runs.map((r) => ({
      id: r.ref,
      from: nodeRef.get(r.fromNodeId) ?? `#${r.fromNodeId}`,
      to: nodeRef.get(r.toNodeId) ?? `#${r.toNodeId}`,
      lengthFt: r.lengthFt,
      gauge: r.gauge as Gauge,
      reverses: r.reverses,
      kind: r.kind ?? undefined,
    })),
    terminators: rows.terminators.map((t) => ({ id: terminatorRef(t.id), nodeId: nodeRef.get(t.nodeId) ?? `#${t.nodeId}`, ohms: t.ohms })),
    centreNodeId: centre === null ? null : (nodeRef.get(centre) ?? null),
    networkPair: rows.settings?.networkPair || undefined,
  };
}

export const jackRow = (j: SurveyRows['jacks'][number]): SurveyJackRow => ({
  id: j.id, ref: j.ref, label: j.label, room: j.room, station: j.station, version: j.version,
});

export const readingRow = (t: SurveyRows['readings'][number]): SurveyReadingRow => ({
  id: t.id,
  jackId: t.jackId,
  pair: t.pair,
  vdc: t.vdcVolts,
  vac: t.vacVolts,
  continuity: t.continuity,
  testedByName: t.testedByName,
  testedAt: t.testedAt.toISOString(),
  version: t.version,
});

export const nodeRow = (n: SurveyRows['nodes'][number]): SurveyNodeRow => ({
  id: n.id, ref: n.ref, kind: n.kind, label: n.label, jackId: n.jackId, version: n.version,
});

export const runRow = (r: SurveyRows['runs'][number]): SurveyRunRow => ({
  id: r.id,
  ref: r.ref,
  fromNodeId: r.fromNodeId,
  toNodeId: r.toNodeId,
  lengthFt: r.lengthFt,
  gauge: r.gauge,
  reverses: r.reverses,
  kind: r.kind,
  version: r.version,
});

export const terminatorRow = (t: SurveyRows['terminators'][number]): SurveyTerminatorRow => ({
  id: t.id, ref: terminatorRef(t.id), nodeId: t.nodeId, ohms: t.ohms, version: t.version,
});

export function settingsRow(s: SurveyRows['settings']): SurveySettingsRow {
  return s === null ? { centreNodeId: null, networkPair: '', version: 0 } : { centreNodeId: s.centreNodeId, networkPair: s.networkPair, version: s.version };
}
