/**
 * The wiring survey as the computation sees it: plain data, independent of the database.
 * Numbers keep the precision they were entered with; only the printed report rounds computed values.
 */

export type Gauge = 22 | 24 | 26;
export type NodeKind = 'block' | 'jack' | 'splitter' | 'adapter';
export type RunKind = 'wall' | 'cord';
export type Continuity = 'good' | 'open' | 'short';

/** A telephone jack on the wall of the site. */
export interface SurveyJack {
  id: string;
  label: string;
  room?: string;
  /** Station name of the device that sits at this jack, if any. */
  station?: string;
}

/** One meter reading of one pair at one jack. Null means "not measured". */
export interface PairTest {
  id: string;
  jackId: string;
  /** Pair number and colours as written on the sheet, e.g. "2 (black/yellow)". */
  pair: string;
  vdc: number | null;
  vac: number | null;
  continuity: Continuity | null;
  by?: string;
  at?: string;
}

/** A point of the network drawing: the punch-down block, a jack, a splitter or a network adapter. */
export interface SurveyNode {
  id: string;
  kind: NodeKind;
  label: string;
  /** For a jack node: the surveyed jack it stands for. */
  jackId?: string;
}

/** A length of wire between two nodes: cable in the wall or a cord. */
export interface CableRun {
  id: string;
  from: string;
  to: string;
  lengthFt: number;
  gauge: Gauge;
  /** An adapter cord reverses the pair; wall wiring must not. */
  reverses: boolean;
  /** When absent, a run that touches an adapter counts as a cord and any other run as wall wiring. */
  kind?: RunKind;
}

/** A terminating resistor fitted across the network pair at a node. */
export interface Terminator {
  id: string;
  nodeId: string;
  ohms: number;
}

export interface SurveyInput {
  siteName: string;
  jacks: SurveyJack[];
  pairTests: PairTest[];
  nodes: SurveyNode[];
  runs: CableRun[];
  terminators: Terminator[];
  /** The chosen centre of a star (usually the punch-down block). */
  centreNodeId?: string | null;
  /** The pair chosen to carry the network, written like PairTest.pair. */
  networkPair?: string;
}

// ---------------------------------------------------------------------------------------------
// Result

export type Severity = 'error' | 'warning' | 'note';

/** One finding: error blocks the survey, warning needs a look, note informs. */
export interface SurveyCheck {
  slug: string;
  severity: Severity;
  message: string;
  runIds: string[];
  jackIds: string[];
  nodeIds: string[];
}

export type Layout = 'star' | 'bus' | 'tree' | 'mixed' | 'empty';

/**
 * in-use: a voltage over the trade's threshold; fault: continuity open or short;
 * free: both voltages measured under the thresholds and continuity good;
 * unconfirmed: nothing says in use or faulty, but a reading is missing.
 */
export type PairStatus = 'in-use' | 'free' | 'fault' | 'unconfirmed';

export interface PairResult {
  testId: string;
  pair: string;
  status: PairStatus;
  vdc: number | null;
  vac: number | null;
  continuity: Continuity | null;
  /** False when a later test of the same pair at the same jack replaces this one. */
  current: boolean;
}

export interface JackResult {
  jackId: string;
  label: string;
  pairs: PairResult[];
  /** Pairs whose current test says free. */
  freePairs: string[];
  /** Status of the network pair here, 'untested' when no test names it, null when no network pair is chosen. */
  networkPairStatus: PairStatus | 'untested' | null;
}

export interface RunResult {
  runId: string;
  from: string;
  to: string;
  kind: RunKind;
  /** Null when the entered length is not a usable number (negative, NaN, infinite). */
  lengthFt: number | null;
  /** Null when the entered gauge is not 22, 24 or 26. */
  gauge: Gauge | null;
  reverses: boolean;
  /** Resistance of one conductor, ohms. */
  conductorOhms: number | null;
  /** Both conductors of the pair, there and back: 2 x conductor. */
  loopOhms: number | null;
  /** False when the run is left out of the graph (unknown node, duplicate id). */
  inGraph: boolean;
}

export interface Totals {
  lengthFt: number;
  byGauge: Record<'22' | '24' | '26', number>;
  wallFt: number;
  cordFt: number;
  /** Runs whose length was counted. */
  runsCounted: number;
  /** Runs left out of the totals because their length or gauge was unusable. */
  runsSkipped: number;
}

/** A path through the wiring, from one node to another. */
export interface SurveyPath {
  fromNodeId: string;
  toNodeId: string;
  runIds: string[];
  lengthFt: number;
  loopOhms: number;
  /** Runs on the path that reverse the pair. */
  reversals: number;
  /** False when some run on the path has an unusable length or gauge (counted as zero). */
  complete: boolean;
}

/** One spoke of a star: everything hanging off the centre through one run. */
export interface Spoke {
  firstRunId: string;
  nodeIds: string[];
  /** The longest path from the centre into this spoke. */
  farthest: SurveyPath;
}

export interface SurveyResult {
  layout: Layout;
  /** The node treated as centre (star hub or the root of the drawing), null when there is none. */
  centreNodeId: string | null;
  jacks: JackResult[];
  runs: RunResult[];
  totals: Totals;
  /** Only for a star. */
  spokes: Spoke[];
  /** Every pair of adapters joined by the wiring, with its reversal count. */
  adapterPaths: Array<SurveyPath & { even: boolean }>;
  /** The adapter-to-adapter path with the highest loop resistance (or the longest path when there are fewer than two adapters). */
  endToEnd: SurveyPath | null;
  terminatorNeeded: boolean;
  checks: SurveyCheck[];
  counts: Record<Severity, number>;
}
