/**
 * The site-wide text files: README.TXT (what the bundle is and how to use it), STATIONS.TXT (directory of
 * every station: PCs, printers, modems, other) and the SURVEY.TXT placeholder when no survey was recorded.
 */
import { CAUTIONS } from './cautions';
import { PC_FILES, SITE_FILES } from './layout';
import type { PlacedPc } from './layout';
import { DOS_COLUMNS } from './text';
import type { BundleSite, BundleStationEntry } from './types';
import { wrapLabelled, wrapWords } from './wrap';

const W = DOS_COLUMNS;

function title(text: string): string[] {
  return ['='.repeat(W), text, '='.repeat(W)];
}

function siteLines(site: BundleSite): string[] {
  return [
    ...wrapLabelled('Site:        ', site.name, W),
    ...(site.address ? wrapLabelled('Address:     ', site.address, W) : []),
    `Bundle made: ${site.generatedAt}`,
  ];
}

/** README.TXT lines. */
export function readmeLines(site: BundleSite, placed: readonly PlacedPc[]): string[] {
  const para = (text: string) => [...wrapWords(text, W), ''];
  const files: Array<[string, string]> = [
    [PC_FILES.sheet, 'install sheet: station, ports, changes and why, checks, boot order, sign-off'],
    [PC_FILES.install, 'installer: INSTALL <station number>'],
    [PC_FILES.undo, 'puts back the newest backup INSTALL made'],
    [PC_FILES.restore, 'copied into each backup folder; restores that backup'],
    [PC_FILES.samefile, 'compares two files for INSTALL/UNDO (ERRORLEVEL 0 same, 1 different, 2 missing)'],
    [PC_FILES.autoexec, 'the new AUTOEXEC.BAT'],
    [PC_FILES.config, 'the new CONFIG.SYS (only when the plan writes one)'],
    [PC_FILES.autoexecOld, 'the AUTOEXEC.BAT the plan was made from (none when the PC had none)'],
    [PC_FILES.configOld, 'the CONFIG.SYS the plan was made from (none when the PC had none)'],
    [PC_FILES.diff, 'the change as a unified diff'],
  ];
  return [
    ...title('BOOTWRIGHT ROLLOUT BUNDLE'),
    ...siteLines(site),
    `PC folders:  ${placed.length}`,
    '',
    ...para(
      'This bundle holds one folder for every PC with an approved plan. Read the folder\'s SHEET.TXT ' +
        'first. At the PC, run INSTALL from that folder with the station number, e.g. A: then CD \\FOLDER ' +
        'then INSTALL 12. INSTALL changes nothing unless the PC\'s startup files are still the ones the ' +
        'plan was made from.',
    ),
    'In every PC folder:',
    ...files.flatMap(([name, text]) => wrapWords(text, W, `  ${name.padEnd(13)} `, ' '.repeat(16))),
    '',
    'For the whole site:',
    ...wrapWords('directory of every station (PCs, printers, modems, other)', W, `  ${SITE_FILES.stations.padEnd(13)} `, ' '.repeat(16)),
    ...wrapWords('each file of the bundle with its station, plan revision, approver and SHA-256 (one line per file, longer than 80 columns)', W, `  ${SITE_FILES.manifest.padEnd(13)} `, ' '.repeat(16)),
    ...wrapWords('the wiring survey report of the site', W, `  ${SITE_FILES.survey.padEnd(13)} `, ' '.repeat(16)),
    '',
    'Cautions:',
    ...CAUTIONS.flatMap((text) => wrapWords(text, W, '  - ', '    ')),
  ];
}

/** The columns of the station directory; cells wrap inside their column. */
const COLUMNS: Array<{ head: string; width: number }> = [
  { head: 'No.', width: 6 },
  { head: 'Station', width: 22 },
  { head: 'Kind', width: 8 },
  { head: 'Location', width: 27 },
  { head: 'Folder', width: 12 },
];

const KIND_LABEL: Record<BundleStationEntry['kind'], string> = { pc: 'PC', printer: 'printer', modem: 'modem', other: 'other' };

function tableRow(cells: string[]): string[] {
  const wrapped = cells.map((cell, i) => wrapWords(cell, COLUMNS[i].width));
  const height = Math.max(...wrapped.map((w) => w.length));
  const rows: string[] = [];
  for (let r = 0; r < height; r++) {
    rows.push(wrapped.map((w, i) => (w[r] ?? '').padEnd(COLUMNS[i].width)).join(' ').trimEnd());
  }
  return rows;
}

/** STATIONS.TXT lines: every station by number, with the folder of each PC that has one. */
export function stationsLines(site: BundleSite, placed: readonly PlacedPc[]): string[] {
  const folderOf = new Map<string, string>();
  for (const { pc, folder } of placed) folderOf.set(`${pc.stationNumber}\u0000${pc.stationName}`, folder);
  const stations = [...site.stations].sort((a, b) => a.number - b.number || (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
  const lines = [...title('STATION DIRECTORY'), ...siteLines(site), `Stations:    ${stations.length}`, ''];
  lines.push(...tableRow(COLUMNS.map((c) => c.head)), COLUMNS.map((c) => '-'.repeat(c.width)).join(' '));
  for (const station of stations) {
    const folder = station.kind === 'pc' ? folderOf.get(`${station.number}\u0000${station.name}`) ?? '(no plan)' : '';
    lines.push(...tableRow([String(station.number), station.name, KIND_LABEL[station.kind], station.location ?? '', folder]));
  }
  return lines;
}

/** SURVEY.TXT when no survey was recorded. */
export function surveyPlaceholderLines(site: BundleSite): string[] {
  return [
    ...title('WIRING SURVEY'),
    ...siteLines(site),
    '',
    ...wrapWords(
      'No wiring survey was recorded for this site when this bundle was made. Record the survey in ' +
        'Bootwright before the network pair is connected, and test every pair before touching it.',
      W,
    ),
  ];
}
