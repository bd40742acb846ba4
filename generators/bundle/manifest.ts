/**
 * MANIFEST.CSV: one row per file of the bundle (the manifest itself aside) tying it to its station, plan
 * revision, plan hash, approver and the SHA-256 of its bytes. CR LF and code page 437 like every other text
 * file; its rows are longer than 80 columns (a SHA-256 alone is 64), it is read by programs, not on screen.
 */
import { createHash } from 'node:crypto';
import { encodeDos, plainText } from './text';

export type ManifestRow = {
  stationNumber: number | null;
  stationName: string;
  folder: string;
  file: string;
  planRevisionId: string;
  planHash: string;
  approvedBy: string;
  approvedAt: string;
  sha256: string;
};

export const MANIFEST_HEADER = [
  'station_number', 'station_name', 'folder', 'file', 'plan_revision', 'plan_hash', 'approved_by', 'approved_at', 'sha256',
] as const;

export function sha256Hex(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** RFC 4180 quoting: a field with a comma, quote or line break goes in quotes, quotes doubled. */
function csvField(value: string): string {
  const text = plainText(value);
  return /[",]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function csvRow(row: ManifestRow): string {
  return [
    row.stationNumber === null ? '' : String(row.stationNumber),
    row.stationName, row.folder, row.file, row.planRevisionId, row.planHash, row.approvedBy, row.approvedAt, row.sha256,
  ].map(csvField).join(',');
}

/** The manifest's bytes for `rows` in the given order. */
export function manifestBytes(rows: readonly ManifestRow[]): Uint8Array {
  const lines = [MANIFEST_HEADER.join(','), ...rows.map(csvRow)];
  return encodeDos(lines.join('\r\n') + '\r\n');
}
