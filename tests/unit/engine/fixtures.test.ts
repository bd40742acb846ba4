/**
 * Named fixtures (tests/fixtures/engine/<case>.*), enumerated by one loop. Each expect.json records the
 * insertion point, the final program, the check slugs, and the boot order after the edit; the invariants
 * below run on every fixture, again with LF and with CR line ends.
 */
import { plan, parseBatch, parseConfig, printModel } from '../../../generators/engine/index';
import { encodeCp437 } from '../../../generators/dos/cp437';
import { bootPathProblems } from './helpers/boot-paths';
import { loadFixtures, menuChoices, withLineEnds, type Fixture } from './helpers/fixtures';
import { applyWithGnuPatch } from './helpers/gnu-patch';
import { mapLine, outsideBlockProblems } from './helpers/outside-block';

const fixtures = loadFixtures();
const planOf = (f: Fixture, bat: Buffer | null = f.bat, sys: Buffer | null = f.sys) => plan({ profile: f.profile, autoexec: bat, config: sys });
const slugs = (r: ReturnType<typeof plan>) => [...new Set(r.checks.map((c) => c.slug))].sort();

test('there are at least 30 fixtures, covering the demo scenario shapes', () => {
  expect(fixtures.length).toBeGreaterThanOrEqual(30);
  const names = fixtures.map((f) => f.name);
  // PRODUCT.md "Demo scenario": menu at the end, Windows at the end, a GOTO menu loop, a mouse on COM1,
  // a multi-configuration boot menu, DOS 3.30 with no @.
  for (const shape of ['menu-at-end', 'win-at-end', 'goto-menu-loop', 'mouse-on-com1', 'multi-config', 'dos330-no-at']) {
    expect(names).toContain(shape);
  }
});

test('every check PRODUCT.md and issue 3 ask for fires in some fixture', () => {
  const fired = new Set(fixtures.flatMap((f) => f.expect.checks));
  const required = [
    'dos-below-kit', 'port-missing', 'port-absent', 'port-taken', 'irq-shared', 'printer-on-redirected-lpt',
    'line-too-long', 'long-line', 'name-not-83', 'name-reserved', 'redirect-conflict', 'loader-other-options',
    'loader-unreachable', 'memory-low', 'no-autoexec', 'not-text', 'dos-unknown', 'com34-before-33',
  ];
  for (const slug of required) expect(fired).toContain(slug);
});

describe.each(fixtures.map((f) => [f.name, f] as const))('fixture %s', (_name, f) => {
  const result = planOf(f);

  test('plan matches the expectation (insertion point, final program, checks, boot order)', () => {
    expect(result.insertedAt).toBe(f.expect.insertedAt);
    expect(result.finalProgram?.line ?? null).toBe(f.expect.final);
    expect(result.changed).toBe(f.expect.changed);
    expect(slugs(result)).toEqual(f.expect.checks);
    expect(result.boot.after.map((s) => s.program)).toEqual(f.expect.boot);
    expect(result.ok).toBe(!result.checks.some((c) => c.severity === 'error'));
  });

  test('print(parse(x)) = x, also with LF and with CR line ends', () => {
    for (const bytes of [f.bat, f.sys]) {
      if (!bytes) continue;
      for (const variant of [bytes, withLineEnds(bytes, '\n'), withLineEnds(bytes, '\r')]) {
        expect(Buffer.from(printModel(parseBatch(variant))).equals(variant)).toBe(true);
        expect(Buffer.from(printModel(parseConfig(variant))).equals(variant)).toBe(true);
      }
    }
  });

  test('planning the plan changes nothing', () => {
    const again = planOf(f, Buffer.from(result.files.autoexec.after), result.files.config ? Buffer.from(result.files.config.after) : null);
    expect(again.changed).toBe(false);
    expect(again.diff).toBe('');
    if (result.changed) expect(again.insertedAt).toBe(result.insertedAt);
  });

  test('lines outside the block are byte-identical, or turned into REM lines with a check', () => {
    if (!f.bat || !result.changed) return;
    const after = Buffer.from(result.files.autoexec.after).toString('latin1');
    expect(outsideBlockProblems(f.bat.toString('latin1'), after, result.checks)).toEqual([]);
  });

  test('every boot path (test interpreter) runs the block once, in order, before the final program', () => {
    if (!result.files.autoexec.changed) return;
    const after = result.files.autoexec.afterText;
    const finalLine = result.finalProgram && f.bat ? mapLine(f.bat.toString('latin1'), after, result.finalProgram.line) : null;
    expect(bootPathProblems(after, finalLine, menuChoices(f.sys))).toEqual([]);
  });

  test('with LF and CR line ends: same insertion point, final program and boot order', () => {
    if (!f.bat || f.bat.length === 0 || !result.changed) return;
    for (const eol of ['\n', '\r'] as const) {
      const variant = planOf(f, withLineEnds(f.bat, eol));
      expect(variant.insertedAt).toBe(result.insertedAt);
      expect(variant.finalProgram?.line ?? null).toBe(result.finalProgram?.line ?? null);
      expect(variant.boot.after.map((s) => s.program)).toEqual(result.boot.after.map((s) => s.program));
      const extra = slugs(variant).filter((s) => !slugs(result).includes(s));
      const terminated = /[\r\n]/.test(f.bat.toString('latin1').split('\x1a')[0]);
      // [M4C] TBATCH.ASM: DOS wants CR LF (REFERENCES 2.13), so LF-only and CR-only files get one more check.
      expect(extra).toEqual(terminated && !slugs(result).includes('odd-line-end') ? ['odd-line-end'] : []);
    }
  });
});

test('GNU patch applies every fixture diff to the original and gives the patched bytes exactly', () => {
  const planned = fixtures.map((f) => ({ f, r: planOf(f) })).filter(({ r }) => r.changed);
  const outcomes = applyWithGnuPatch(
    planned.map(({ f, r }) => ({ files: { 'AUTOEXEC.BAT': f.bat, 'CONFIG.SYS': f.sys }, diff: encodeCp437(r.diff) })),
  );
  outcomes.forEach((o, i) => {
    const { f, r } = planned[i];
    expect({ name: f.name, ok: o.ok, output: o.ok ? '' : o.output }).toEqual({ name: f.name, ok: true, output: '' });
    expect(o.files['AUTOEXEC.BAT']?.equals(Buffer.from(r.files.autoexec.after))).toBe(true);
    if (r.files.config) expect(o.files['CONFIG.SYS']?.equals(Buffer.from(r.files.config.after))).toBe(true);
  });
  expect(planned.length).toBeGreaterThanOrEqual(30);
});

test("the diffs match the diff package's own line diff (createTwoFilesPatch), except where a moved block reads two ways", () => {
  // Our hunks come from the edits; the diff package computes its own (Myers) line diff from the two texts.
  const { createTwoFilesPatch } = jest.requireActual('diff') as typeof import('diff');
  const headers = { headerOptions: { includeIndex: false, includeUnderline: false, includeFileHeaders: true } };
  let compared = 0;
  for (const f of fixtures) {
    if (f.name === 'block-misplaced') continue;
    const r = planOf(f);
    for (const file of [r.files.autoexec, r.files.config]) {
      if (!file || !file.changed) continue;
      const theirs = createTwoFilesPatch(`a/${file.name}`, `b/${file.name}`, file.beforeText ?? '', file.afterText, undefined, undefined, { context: 3, ...headers });
      expect({ name: f.name, diff: file.diff }).toEqual({ name: f.name, diff: theirs });
      compared++;
    }
  }
  expect(compared).toBeGreaterThanOrEqual(50);
});
