// The station directory as CSV, in the import's columns plus what Bootwright knows (plan status, files).
import Papa from 'papaparse';
import type { DirectoryRow } from '../stations/directory';

/** A cell a spreadsheet would run as a formula gets a leading apostrophe (common practice for CSV export). */
const safe = (v: string) => (/^[=+\-@\t\r]/.test(v) ? `'${v}` : v);

export function directoryCsv(rows: DirectoryRow[]): string {
  const data = rows.map((r) => [
    r.name,
    String(r.number),
    r.kind,
    safe(r.location),
    safe(r.notes),
    r.dos ?? '',
    r.networkPort ?? '',
    r.planStatus,
    r.kind === 'pc' ? r.files.autoexec : '',
    r.kind === 'pc' ? r.files.config : '',
  ]);
  const fields = ['name', 'number', 'kind', 'location', 'notes', 'dos', 'network_port', 'plan_status', 'autoexec', 'config'];
  // CR LF line ends: what spreadsheet programs and RFC 4180 expect.
  return Papa.unparse({ fields, data }, { newline: '\r\n' }) + '\r\n';
}
