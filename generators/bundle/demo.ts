/**
 * Synthetic sites for tests and the bench, in the invented demo scenario: Halvorsen & Pike Architects
 * (the survey demo's practice) with the invented "Threadline" kit (C:\THREAD\TLRES.COM /S:<station> /Q).
 * The first 13 stations are the demo office (10 PCs on DOS 3.30 to 6.22, two printers, a shared modem);
 * larger sites repeat six PC shapes under made-up desk names. Startup files here are plausible examples,
 * not engine output: the bundle passes them through byte for byte whatever they hold.
 */
import { createHash } from 'node:crypto';
import { createTwoFilesPatch } from 'diff';
import { encodeCp437 } from '../dos/cp437';
import type { BundleBootStep, BundlePc, BundleSite, BundleStationEntry } from './types';

export const DEMO_SITE_NAME = 'Halvorsen & Pike Architects';
export const DEMO_GENERATED_AT = '2026-03-10T14:30:00.000Z';

const OFFICE: Array<[string, BundleStationEntry['kind'], string]> = [
  ['RECEPT', 'pc', 'Reception'],
  ['PRINCIPL', 'pc', "Principal's office"],
  ['HALLPRN', 'printer', 'Hallway'],
  ['DRAFT1', 'pc', 'Drafting room, north'],
  ['DRAFT2', 'pc', 'Drafting room, south'],
  ['PLOTPRN', 'printer', 'Drafting room, south'],
  ['INTERN', 'pc', 'Drafting room, intern desk'],
  ['ACCOUNTS', 'pc', 'Back office'],
  ['STUDIO', 'pc', 'Studio'],
  ['MODELS', 'pc', 'Model shop (rear building)'],
  ['ARCHIVE', 'pc', 'Plan archive'],
  ['LIBRARY', 'pc', 'Library'],
  ['MODEM1', 'modem', 'Copy room'],
];

const DESKS = ['Drafting desk', 'Studio bench', 'Survey office', 'Model shop', 'Plan room', 'Site office', 'Réception annex'];

type Shape = {
  dos: string;
  before: string[] | null;
  config: string[] | null;
  /** Planned CONFIG.SYS; undefined: the plan leaves CONFIG.SYS as it is. */
  configNew?: string[];
  port: 'COM1' | 'COM2';
  final: string | null;
};

// Six startup-file shapes of the demo scenario (menu at the end, Windows at the end, mouse on COM1,
// DOS 3.30 with no @ and no CONFIG.SYS, no AUTOEXEC.BAT at all, CONFIG.SYS left alone).
const SHAPES: Shape[] = [
  {
    dos: '6.22',
    before: ['@ECHO OFF', 'PROMPT $P$G', 'PATH C:\\DOS;C:\\MENU', 'SET TEMP=C:\\TEMP', 'LH C:\\DOS\\SMARTDRV.EXE', 'C:\\MENU\\MENU.EXE'],
    config: ['DEVICE=C:\\DOS\\HIMEM.SYS', 'DOS=HIGH', 'FILES=30', 'BUFFERS=20'],
    configNew: ['DEVICE=C:\\DOS\\HIMEM.SYS', 'DOS=HIGH', 'FILES=40', 'BUFFERS=20'],
    port: 'COM1',
    final: 'C:\\MENU\\MENU.EXE',
  },
  {
    dos: '3.30',
    before: ['ECHO OFF', 'PATH C:\\DOS;C:\\WP', 'C:\\WP\\WP.EXE'],
    config: null,
    configNew: ['FILES=20', 'BUFFERS=15'],
    port: 'COM1',
    final: 'C:\\WP\\WP.EXE',
  },
  {
    dos: '5.00',
    before: ['@ECHO OFF', 'PATH C:\\WINDOWS;C:\\DOS', 'C:\\MOUSE\\MOUSE.COM', 'WIN'],
    config: ['DEVICE=C:\\DOS\\HIMEM.SYS', 'FILES=30'],
    port: 'COM2',
    final: 'WIN',
  },
  {
    dos: '4.01',
    before: null,
    config: ['FILES=20', 'BUFFERS=20'],
    configNew: ['FILES=30', 'BUFFERS=20'],
    port: 'COM1',
    final: null,
  },
  {
    dos: '6.20',
    before: ['@ECHO OFF', 'PATH C:\\DOS', 'SET CAD=C:\\CAD', ':MENU', 'C:\\CAD\\CAD.EXE', 'GOTO MENU'],
    config: ['DEVICE=C:\\DOS\\HIMEM.SYS', 'DOS=HIGH,UMB', 'FILES=40'],
    port: 'COM1',
    final: 'C:\\CAD\\CAD.EXE',
  },
  {
    dos: '3.30',
    before: ['PATH C:\\DOS', 'C:\\ACCT\\LEDGER.EXE'],
    config: null,
    port: 'COM2',
    final: 'C:\\ACCT\\LEDGER.EXE',
  },
];

function dosFile(lines: string[]): Uint8Array {
  return encodeCp437(lines.map((l) => `${l}\r\n`).join(''));
}

function block(station: number, port: string): string[] {
  return [
    'REM --- Bootwright network block start (do not edit by hand) ---',
    `MODE ${port}:9600,N,8,1`,
    `C:\\THREAD\\TLRES.COM /S:${station} /Q`,
    `MODE LPT1:=${port}:`,
    'REM --- Bootwright network block end ---',
  ];
}

/** Where the block goes: before a final program that may never return (and before its menu label). */
function insertAt(before: string[], final: string | null): number {
  if (final === null) return before.length;
  const at = before.lastIndexOf(final);
  return before[at - 1]?.startsWith(':') ? at - 1 : at;
}

function programs(lines: string[]): BundleBootStep[] {
  return lines.flatMap((text, i) => {
    const m = /^@?\s*(?:LH\s+)?(\S+)\s*(.*)$/i.exec(text);
    if (!m || /^(REM|ECHO|PROMPT|PATH|SET|GOTO|:)/i.test(m[1])) return [];
    return [{ line: i + 1, program: m[1], args: m[2] }];
  });
}

function demoPc(index: number, name: string, number: number): BundlePc {
  const shape = SHAPES[index % SHAPES.length];
  const before = shape.before ?? [];
  const at = insertAt(before, shape.final);
  const added = block(number, shape.port);
  const after = [...before.slice(0, at), ...added, ...before.slice(at)];
  const autoexecNew = dosFile(after);
  const configNew = shape.configNew ? dosFile(shape.configNew) : null;
  const hash = createHash('sha256').update(autoexecNew).update(configNew ?? new Uint8Array(0)).digest('hex');
  const diff = [
    createTwoFilesPatch('AUTOEXEC.BAT', 'AUTOEXEC.BAT', before.map((l) => `${l}\n`).join(''), after.map((l) => `${l}\n`).join('')),
    shape.configNew
      ? createTwoFilesPatch('CONFIG.SYS', 'CONFIG.SYS', (shape.config ?? []).map((l) => `${l}\n`).join(''), shape.configNew.map((l) => `${l}\n`).join(''))
      : '',
  ].join('');
  const mouse = shape.port === 'COM2';
  return {
    stationName: name,
    stationNumber: number,
    dos: shape.dos,
    ports: [
      { name: 'COM1', attached: mouse ? 'mouse' : 'network adapter' },
      { name: 'COM2', attached: mouse ? 'network adapter' : 'nothing' },
      { name: 'LPT1', attached: 'nothing (printing goes to the network)' },
    ],
    planRevisionId: `rev-${number}-1`,
    planHash: hash,
    approvedBy: 'Mara Lindqvist',
    approvedAt: '2026-03-09T16:05:00.000Z',
    autoexecOld: shape.before ? dosFile(shape.before) : null,
    autoexecNew,
    configOld: shape.config ? dosFile(shape.config) : null,
    configNew,
    diff,
    changes: [
      {
        file: 'AUTOEXEC.BAT',
        line: at + 1,
        lines: added,
        reason: shape.final
          ? `Sets ${shape.port} up, loads the Threadline resident program and sends LPT1 to ${shape.port}, ` +
            `before ${shape.final}, which may never return.`
          : `The PC had no AUTOEXEC.BAT: the new one only sets ${shape.port} up, loads the resident program and redirects LPT1.`,
      },
    ],
    checks: mouse
      ? [{ slug: 'port-taken', severity: 'warning', message: 'COM1 has a mouse, so the adapter goes on COM2.', reason: 'Mouse stays on COM1 as the user asked.' }]
      : [{ slug: 'memory-left', severity: 'note', message: 'About 560 KB of conventional memory stays free for the main program.' }],
    bootBefore: programs(before),
    bootAfter: programs(after),
  };
}

function stationName(i: number): string {
  if (i < OFFICE.length) return OFFICE[i][0];
  const n = i - OFFICE.length;
  return `${DESKS[n % DESKS.length]} ${Math.floor(n / DESKS.length) + 1}`;
}

/** A site of `stationCount` stations; about nine in ten are PCs with an approved plan. Same count, same site. */
export function demoBundleSite(stationCount = OFFICE.length): BundleSite {
  const stations: BundleStationEntry[] = [];
  const pcs: BundlePc[] = [];
  for (let i = 0; i < stationCount; i++) {
    const number = 101 + i;
    const name = stationName(i);
    const kind: BundleStationEntry['kind'] =
      i < OFFICE.length ? OFFICE[i][1] : i % 20 === 7 ? 'printer' : i % 50 === 11 ? 'modem' : 'pc';
    const location = i < OFFICE.length ? OFFICE[i][2] : `Floor ${1 + (i % 4)}, bay ${1 + (i % 30)}`;
    stations.push({ name, number, kind, location });
    if (kind === 'pc') pcs.push(demoPc(pcs.length, name, number));
  }
  return {
    id: `site-demo-${stationCount}`,
    name: DEMO_SITE_NAME,
    address: '14 Kiln Yard, Eastbridge',
    stations,
    pcs,
    surveyReport: null,
    generatedAt: DEMO_GENERATED_AT,
  };
}
