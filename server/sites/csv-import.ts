// An office inventory as CSV (papaparse): every row checked against the 8.3 name rules, the site's number
// ranges and the stations already there, before anything is written.
import Papa from 'papaparse';
import { STATION_KINDS, type StationKind } from '@/db/requests/sites';
import { stationNameSchema, stationNumberSchema } from '@/db/requests/stations';
import type { NumberRanges } from '@/db/sites';
import { parseDosVersion } from '@/generators/engine/dos-version';

export const CSV_COLUMNS = ['name', 'number', 'kind', 'location', 'notes', 'dos', 'network_port'] as const;
export const MAX_IMPORT_ROWS = 254;

export type ImportRow = {
  /** 1-based line of the CSV file (the header is line 1). */
  line: number;
  values: { name: string; number: number | null; kind: StationKind; location: string; notes: string; dos: string; networkPort: string };
  errors: Record<string, string>;
};
export type ImportPreview = { rows: ImportRow[]; fileErrors: string[]; valid: number; invalid: number };
type Existing = { name: string; number: number };

const KIND_WORDS: Record<string, StationKind> = { pc: 'pc', computer: 'pc', printer: 'printer', modem: 'modem', other: 'other' };

export function previewImport(csv: string, ranges: NumberRanges, existing: Existing[]): ImportPreview {
  const { header, records, errors } = readCsv(csv);
  const fileErrors = [...errors, ...headerErrors(header)];
  if (records.length === 0) fileErrors.push('The file has no station rows under its header line.');
  if (records.length > MAX_IMPORT_ROWS) fileErrors.push(`At most ${MAX_IMPORT_ROWS} rows can be imported at once.`);
  if (fileErrors.length) return { rows: [], fileErrors, valid: 0, invalid: 0 };

  const names = new Map(existing.map((s) => [s.name.toUpperCase(), 'at this site']));
  const numbers = new Map(existing.map((s) => [s.number, 'at this site']));
  const rows = records.map((r) => checkRow(r.cells, r.line, ranges, names, numbers));
  assignNumbers(rows, ranges, numbers);
  const invalid = rows.filter((r) => Object.keys(r.errors).length > 0).length;
  return { rows, fileErrors, valid: rows.length - invalid, invalid };
}

type CsvRecord = { line: number; cells: Record<string, string> };

/**
 * Parses as rows of cells (the first non-empty row is the header) and keeps the file line each row starts on,
 * counting line breaks inside quoted cells, so errors point at what the technician sees in an editor.
 */
function readCsv(csv: string): { header: string[]; records: CsvRecord[]; errors: string[] } {
  const parsed = Papa.parse<string[]>(csv.replace(/^\uFEFF/, ''), { skipEmptyLines: false });
  const errors = parsed.errors.map((e) => `Row ${(e.row ?? 0) + 1}: ${e.message}.`);
  let header: string[] | null = null;
  const records: CsvRecord[] = [];
  let line = 1;
  for (const cells of parsed.data) {
    const blank = cells.every((c) => c.trim() === '');
    if (!blank && !header) header = cells.map((h) => h.trim().toLowerCase().replace(/[\s-]+/g, '_'));
    else if (!blank && header) records.push({ line, cells: Object.fromEntries(header.map((h, i) => [h, cells[i] ?? ''])) });
    line += 1 + cells.reduce((n, c) => n + (c.match(/\r\n|\r|\n/g)?.length ?? 0), 0);
  }
  return { header: header ?? [], records, errors };
}

function headerErrors(fields: string[]): string[] {
  const out: string[] = [];
  if (!fields.includes('name')) out.push('The header line needs a “name” column (columns: ' + CSV_COLUMNS.join(', ') + ').');
  const unknown = fields.filter((f) => f && !(CSV_COLUMNS as readonly string[]).includes(f));
  if (unknown.length) out.push(`Unknown column${unknown.length > 1 ? 's' : ''}: ${unknown.join(', ')}. Use ${CSV_COLUMNS.join(', ')}.`);
  return out;
}

function checkRow(raw: Record<string, string>, line: number, ranges: NumberRanges, names: Map<string, string>, numbers: Map<number, string>): ImportRow {
  const cell = (k: string) => (raw[k] ?? '').trim();
  const errors: Record<string, string> = {};
  const kindWord = cell('kind').toLowerCase() || 'pc';
  const kind = KIND_WORDS[kindWord];
  if (!kind) errors.kind = `“${cell('kind')}” is not a kind: use ${STATION_KINDS.join(', ')}.`;

  const nameResult = stationNameSchema.safeParse(cell('name'));
  const name = nameResult.success ? nameResult.data : cell('name').toUpperCase();
  if (!nameResult.success) errors.name = nameResult.error.issues[0].message;
  else if (names.has(name)) errors.name = `${name} is already used ${names.get(name)}.`;
  else names.set(name, `on line ${line}`);

  let number: number | null = null;
  if (cell('number') !== '') {
    const n = stationNumberSchema.safeParse(/^\d+$/.test(cell('number')) ? Number(cell('number')) : NaN);
    if (!n.success) errors.number = /^\d+$/.test(cell('number')) ? n.error.issues[0].message : `“${cell('number')}” is not a whole number.`;
    else if (numbers.has(n.data)) errors.number = `Number ${n.data} is already used ${numbers.get(n.data)}.`;
    else {
      number = n.data;
      numbers.set(n.data, `on line ${line}`);
      const range = kind ? ranges[kind] : null;
      if (range && (number < range[0] || number > range[1])) errors.number = `${number} is outside this site’s ${kind} range ${range[0]}–${range[1]}.`;
    }
  }

  const dos = cell('dos');
  if (dos && parseDosVersion(dos) === null) errors.dos = `“${dos}” is not a DOS version we know, like 3.30 or 6.22 (VER shows it).`;
  if (dos && kind && kind !== 'pc') errors.dos = 'Only PCs have a DOS version.';
  const networkPort = cell('network_port').toUpperCase();
  if (networkPort && !/^COM[1-4]$/.test(networkPort)) errors.network_port = `“${cell('network_port')}” is not COM1 to COM4.`;
  if (networkPort && kind && kind !== 'pc') errors.network_port = 'Only PCs get a network port here.';
  if (cell('location').length > 120) errors.location = 'At most 120 characters.';
  if (cell('notes').length > 2000) errors.notes = 'At most 2000 characters.';

  return { line, values: { name, number, kind: kind ?? 'other', location: cell('location'), notes: cell('notes'), dos, networkPort }, errors };
}

/**
 * Rows without a number get the next free one of their kind's range, in file order. A row with errors gets
 * none, so fixing it later does not shift the numbers the other rows were shown.
 */
function assignNumbers(rows: ImportRow[], ranges: NumberRanges, numbers: Map<number, string>) {
  for (const row of rows) {
    if (row.values.number !== null || Object.keys(row.errors).length > 0) continue;
    const [first, last] = ranges[row.values.kind];
    let n = first;
    while (n <= last && numbers.has(n)) n++;
    if (n > last) row.errors.number = `The ${row.values.kind} range ${first}–${last} has no free number left.`;
    else {
      row.values.number = n;
      numbers.set(n, `on line ${row.line}`);
    }
  }
}
