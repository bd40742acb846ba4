/**
 * A real DOS shell: DOSBox 0.74 (Debian `dosbox`, headless) boots fixture startup files before and after the
 * edit, with stub programs (Debian `nasm`) that log their name and arguments. After the edit the serial
 * setup, the redirection and the loader run in that order, once, before the final program, and every
 * program that ran before still runs in the same order. All runs share one DOSBox start.
 * Fixtures that hit DOSBox differences (REFERENCES.md §7) are kept out; their expect.json says why.
 */
import { rmSync } from 'node:fs';
import { plan } from '../../../generators/engine/index';
import { requireTool, runDosbox, type DosboxRun, type StubEntry } from '../../support/dosbox';
import { blockEntries, buildTree, dosboxCopy, entryOf, stemOf } from './helpers/dos-tree';
import { loadFixtures, type Fixture } from './helpers/fixtures';

type Case = { id: string; f: Fixture; result: ReturnType<typeof plan>; before: string | null; after: string; config: string; pick?: string };

const OFF_PREFIX = /^(@?REM|::) Bootwright off: /;
const same = (a: StubEntry, b: StubEntry) => a.program === b.program && a.args === b.args;
const show = (log: StubEntry[]) => log.map((e) => `${e.program} ${e.args}`.trim());

const cases: Case[] = loadFixtures()
  .filter((f) => f.expect.dosbox !== false)
  .flatMap((f) => {
    const result = plan({ profile: f.profile, autoexec: f.bat, config: f.sys });
    const spec = f.expect.dosbox as { runs?: { config?: string; pick?: string }[] };
    return (spec.runs ?? [{}]).map((run, k) => ({
      id: `${f.name}#${k}`,
      f,
      result,
      before: f.bat ? dosboxCopy(f.bat.toString('latin1')) : null,
      after: dosboxCopy(Buffer.from(result.files.autoexec.after).toString('latin1')),
      config: run.config ?? '',
      pick: run.pick,
    }));
  });

let logs = new Map<string, StubEntry[]>();
let seconds = 0;
const roots: string[] = [];

afterAll(() => {
  for (const root of roots) rmSync(root, { recursive: true, force: true });
});

beforeAll(() => {
  requireTool('dosbox', 'dosbox');
  requireTool('nasm', 'nasm');
  const runs: DosboxRun[] = [];
  for (const c of cases) {
    const texts = [c.before ?? '', c.after];
    const options = { dosDir: c.f.profile.dosDir, loaderPath: c.f.profile.loader.path, pick: c.pick };
    // DOSBox starts with PATH=Z:\ (REFERENCES 7.2); C:\BIN holds stubs for programs named without a path.
    const commands = ['SET PATH=C:\\BIN;Z:\\', `SET CONFIG=${c.config}`];
    const boot = (text: string | null) => (text === null ? commands : [...commands, 'CALL C:\\AUTOEXEC.BAT']);
    runs.push({ name: `${c.id}:before`, root: buildTree(c.before, texts, options), commands: boot(c.before) });
    runs.push({ name: `${c.id}:after`, root: buildTree(c.after, texts, options), commands: boot(c.after) });
    roots.push(runs[runs.length - 2].root, runs[runs.length - 1].root);
  }
  const out = runDosbox(runs, 90_000);
  if (out.timedOut) throw new Error('DOSBox did not finish within 90 s (does a fixture loop?)');
  logs = out.logs;
  seconds = out.seconds;
}, 120_000);

/** What is wrong with one boot pair; [] when all holds. */
function verify(c: Case, before: StubEntry[], after: StubEntry[]): string[] {
  const block = blockEntries(c.after);
  // [HELP622] MODE (Redirect Printing) example: serial setup first, then the redirection (REFERENCES 1.26).
  const { network, redirect, loader } = c.f.profile;
  const wanted = [
    { program: 'MODE', start: `${network.port} ` },
    ...(redirect ? [{ program: 'MODE', start: `${redirect.from}:=${redirect.to}:` }] : []),
    { program: stemOf(loader.path), start: '' },
  ];
  if (block.length !== wanted.length || block.some((b, i) => b.program !== wanted[i].program || !b.args.startsWith(wanted[i].start))) {
    return [`block lines are not serial setup, redirection, loader: ${show(block).join(' | ')}`];
  }
  const hits = after.map((e, i) => [e, i] as const).filter(([e]) => block.some((b) => same(b, e)));
  if (hits.length !== block.length || hits.some(([e], i) => !same(e, block[i]))) return ['the block did not run exactly once, in order'];
  const problems: string[] = [];
  const final = c.result.finalProgram ? entryOf(`${c.result.finalProgram.program} `) : null;
  const finalAt = final ? after.findIndex((e) => e.program === final.program && (final.program !== 'BATRUN' || e.args === final.args)) : -1;
  if (finalAt >= 0 && finalAt < hits[hits.length - 1][1]) problems.push('the final program ran before the block');
  const turnedOff = c.result.changes
    .filter((ch) => ch.file === 'AUTOEXEC.BAT' && ch.kind === 'comment-out')
    .map((ch) => entryOf(ch.lines[0].replace(OFF_PREFIX, '')))
    .filter((e): e is StubEntry => e !== null);
  // A file that already holds our block (an earlier run) had it run before too: compare without it.
  const oldBlock = c.before !== null && /Bootwright network block start/i.test(c.before) ? blockEntries(c.before) : [];
  const oldKept = before.filter((e) => !turnedOff.some((t) => same(t, e)) && !oldBlock.some((b) => same(b, e)));
  const others = after.filter((_, i) => !hits.some(([, k]) => k === i));
  if (show(oldKept).join('|') !== show(others).join('|')) problems.push('the programs that ran before do not run in the same order');
  return problems;
}

test('DOSBox booted every chosen fixture before and after the edit in one start', () => {
  expect(cases.length * 2).toBeGreaterThanOrEqual(60);
  expect(seconds).toBeLessThan(60);
});

test.each(cases.map((c) => [c.id, c] as const))('%s: block runs once, in order, before the final program; old programs keep their order', (_id, c) => {
  const before = logs.get(`${c.id}:before`)!;
  const after = logs.get(`${c.id}:after`)!;
  expect(after.length).toBeGreaterThanOrEqual(2);
  expect({ problems: verify(c, before, after), before: show(before), after: show(after) }).toEqual({ problems: [], before: show(before), after: show(after) });
});

test('the menu, hand-off and multi-configuration runs reach their programs (stubs and scripts work)', () => {
  const after = (id: string) => show(logs.get(`${id}:after`)!);
  expect(after('goto-menu-loop#0')).toEqual(expect.arrayContaining(['DRAW', 'LW']));
  expect(after('multi-config#0')).toContain('WIN');
  expect(after('multi-config#1')).toContain('DRAW');
  expect(after('handoff-at-end#0')).toContain('BATRUN START');
  expect(after('no-path#0')[0]).toMatch(/^MODE COM1 /);
});

test('control: the same check rejects a boot where the block runs after the final program', () => {
  // block-misplaced's original file runs WIN and then our (misplaced) block: used as an "after" it must fail.
  const c = cases.find((k) => k.id === 'block-misplaced#0')!;
  const wrong = logs.get('block-misplaced#0:before')!;
  const misplaced = { ...c, after: c.before!, result: { ...c.result, changes: [] } };
  expect(verify(misplaced, wrong, wrong)).toContain('the final program ran before the block');
});
