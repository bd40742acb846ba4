/**
 * The demo site's wiring survey (invented): the architecture practice of the demo scenario, wired as a
 * star from the punch-down block in the copy room over the spare pair 2 (black/yellow).
 * On purpose it has exactly two problems for the screen test to flag and fix: the spoke to the model
 * shop (run r-09, 540 ft of wall wiring plus a 7 ft cord) is over 500 ft, and no terminator is fitted.
 */
import type { CableRun, PairTest, SurveyInput, SurveyJack, SurveyNode } from './types';

/** The run whose spoke is too long. Shortened to 480 ft (a new, shorter route) the spoke is 487 ft. */
export const DEMO_LONG_SPOKE_RUN_ID = 'r-09';

// [jack number, label, room, station(s), wall run length ft, pair 1 V DC (null: no telephone line there)]
const JACKS: Array<[string, string, string, string, number, number | null]> = [
  ['01', 'J-01 Reception', 'Reception', 'RECEPT', 85, 48.3],
  ['02', "J-02 Principal's office", "Principal's office", 'PRINCIPL', 120, 48.1],
  ['03', 'J-03 Hallway', 'Hallway', 'HALLPRN', 64, null],
  ['04', 'J-04 Drafting north', 'Drafting room', 'DRAFT1', 150.5, 47.9],
  ['05', 'J-05 Drafting south', 'Drafting room', 'DRAFT2, PLOTPRN', 162, 47.85],
  ['06', 'J-06 Intern desk', 'Drafting room', 'INTERN', 98, 48.2],
  ['07', 'J-07 Back office', 'Back office', 'ACCOUNTS', 210, 47.6],
  ['08', 'J-08 Studio', 'Studio', 'STUDIO', 275, 47.4],
  ['09', 'J-09 Model shop', 'Model shop (rear building)', 'MODELS', 540, 46.9],
  ['10', 'J-10 Plan archive', 'Plan archive', 'ARCHIVE', 310, 47.3],
  ['11', 'J-11 Library corner', 'Library', 'LIBRARY', 188, 47.7],
  ['12', 'J-12 Copy room', 'Copy room', 'MODEM1', 12, null],
];

const TESTED_BY = 'Tess Varga';

function pairTests(n: string, index: number, lineVdc: number | null): PairTest[] {
  const at = `2026-03-0${index < 6 ? 2 : 3}T${String(9 + (index % 6)).padStart(2, '0')}:15`;
  // Pair 1 carries the office's telephone line at most jacks (a live pair gets no continuity test).
  const line1 = lineVdc === null
    ? { vdc: 0.04, vac: 0.2, continuity: 'good' as const }
    : { vdc: lineVdc, vac: 0.4, continuity: null };
  return [
    { id: `t-${n}-1`, jackId: `j-${n}`, pair: '1 (red/green)', ...line1, by: TESTED_BY, at },
    {
      id: `t-${n}-2`, jackId: `j-${n}`, pair: '2 (black/yellow)', vdc: n === '07' ? 0.12 : 0.02, vac: 0.1,
      continuity: 'good', by: TESTED_BY, at,
    },
  ];
}

function adapterNodes(stations: string): SurveyNode[] {
  return stations.split(', ').map((s) => ({ id: `a-${s.toLowerCase()}`, kind: 'adapter' as const, label: `Adapter ${s}` }));
}

function runsFor(n: string, stations: string, lengthFt: number): CableRun[] {
  const wall: CableRun = { id: `r-${n}`, from: 'b-1', to: `n-${n}`, lengthFt, gauge: 22, reverses: false, kind: 'wall' };
  const names = stations.split(', ');
  if (names.length === 1) {
    return [wall, { id: `c-${n}`, from: `n-${n}`, to: `a-${names[0].toLowerCase()}`, lengthFt: 7, gauge: 26, reverses: true, kind: 'cord' }];
  }
  // Two stations share the jack through a splitter plugged into the wall jack.
  return [
    wall,
    { id: `c-${n}s`, from: `n-${n}`, to: `s-${n}`, lengthFt: 0.5, gauge: 26, reverses: false, kind: 'cord' },
    ...names.map((s, i): CableRun => ({
      id: `c-${n}${'ab'[i]}`, from: `s-${n}`, to: `a-${s.toLowerCase()}`, lengthFt: i === 0 ? 7 : 14, gauge: 26, reverses: true, kind: 'cord',
    })),
  ];
}

const jacks: SurveyJack[] = JACKS.map(([n, label, room, station]) => ({ id: `j-${n}`, label, room, station }));

const nodes: SurveyNode[] = [
  { id: 'b-1', kind: 'block', label: 'Punch-down block (copy room)' },
  ...JACKS.flatMap(([n, label, , stations]): SurveyNode[] => [
    { id: `n-${n}`, kind: 'jack', label, jackId: `j-${n}` },
    ...(stations.includes(',') ? [{ id: `s-${n}`, kind: 'splitter' as const, label: `Splitter at J-${n}` }] : []),
    ...adapterNodes(stations),
  ]),
];

/** A fresh copy each call, so a test or screen can change it freely. */
export function demoSurvey(): SurveyInput {
  const survey: SurveyInput = {
    siteName: 'Halvorsen & Pike Architects',
    jacks,
    pairTests: JACKS.flatMap(([n, , , , , lineVdc], i) => pairTests(n, i, lineVdc)),
    nodes,
    runs: JACKS.flatMap(([n, , , stations, length]) => runsFor(n, stations, length)),
    terminators: [],
    centreNodeId: 'b-1',
    networkPair: '2 (black/yellow)',
  };
  return JSON.parse(JSON.stringify(survey)) as SurveyInput;
}
