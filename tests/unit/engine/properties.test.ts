/**
 * Property tests (fast-check, 1,000 cases each) over startup files generated from real-world line shapes.
 */
import fc from 'fast-check';
import { plan, parseBatch, parseConfig, printModel } from '../../../generators/engine/index';
import { encodeCp437 } from '../../../generators/dos/cp437';
import { bootPathProblems } from './helpers/boot-paths';
import { applyWithGnuPatch } from './helpers/gnu-patch';
import { autoexecArb, choicesOf, configArb, profileArb } from './helpers/grammar';
import { mapLine, outsideBlockProblems } from './helpers/outside-block';

const RUNS = { numRuns: 1000 };
const input = fc.record({ autoexec: autoexecArb, config: configArb, profile: profileArb });
const latin = (b: Uint8Array) => Buffer.from(b).toString('latin1');

test('print(parse(x)) = x for generated startup files and for arbitrary bytes', () => {
  fc.assert(
    fc.property(fc.oneof(autoexecArb, fc.uint8Array({ maxLength: 400 }).map((u) => Buffer.from(u))), (bytes) => {
      expect(Buffer.from(printModel(parseBatch(bytes))).equals(bytes)).toBe(true);
      expect(Buffer.from(printModel(parseConfig(bytes))).equals(bytes)).toBe(true);
    }),
    RUNS,
  );
});

test('plan(plan(x)) changes nothing', () => {
  fc.assert(
    fc.property(input, ({ autoexec, config, profile }) => {
      const first = plan({ profile, autoexec, config });
      const second = plan({ profile, autoexec: first.files.autoexec.after, config: first.files.config?.after ?? null });
      expect(second.changed).toBe(false);
      expect(second.diff).toBe('');
    }),
    RUNS,
  );
});

test('every line outside the block is byte-identical or turned into REM with a check', () => {
  fc.assert(
    fc.property(input, ({ autoexec, config, profile }) => {
      const r = plan({ profile, autoexec, config });
      if (!r.files.autoexec.changed) return;
      expect(outsideBlockProblems(latin(autoexec), latin(r.files.autoexec.after), r.checks)).toEqual([]);
    }),
    RUNS,
  );
});

test('changing a setting rewrites only the block', () => {
  fc.assert(
    fc.property(input, fc.constantFrom(1200, 4800), ({ autoexec, config, profile }, baud) => {
      const first = plan({ profile, autoexec, config });
      if (!first.files.autoexec.changed) return;
      const changed = { ...profile, network: { ...profile.network, baud } };
      const second = plan({ profile: changed, autoexec: first.files.autoexec.after, config: first.files.config?.after ?? null });
      expect(second.changes.filter((c) => c.kind !== 'replace-block')).toEqual([]);
      expect(outsideBlockProblems(latin(first.files.autoexec.after), latin(second.files.autoexec.after), [])).toEqual([]);
    }),
    RUNS,
  );
});

test('the test interpreter meets the block once, in order, before the final program on every boot path', () => {
  fc.assert(
    fc.property(input, ({ autoexec, config, profile }) => {
      const r = plan({ profile, autoexec, config });
      if (!r.files.autoexec.changed) return;
      const after = r.files.autoexec.afterText;
      const finalLine = r.finalProgram ? mapLine(latin(autoexec), latin(r.files.autoexec.after), r.finalProgram.line) : null;
      expect(bootPathProblems(after, finalLine, choicesOf(config))).toEqual([]);
    }),
    RUNS,
  );
});

test('the diff applies with GNU patch -p1 and gives the patched bytes exactly (1,000 cases, 5 patch runs)', () => {
  const samples = fc.sample(input, { numRuns: 1000, seed: 20240611 });
  for (let start = 0; start < samples.length; start += 200) {
    const batch = samples.slice(start, start + 200).map((s) => ({ s, r: plan({ profile: s.profile, autoexec: s.autoexec, config: s.config }) }));
    const changed = batch.filter(({ r }) => r.changed);
    const outcomes = applyWithGnuPatch(changed.map(({ s, r }) => ({ files: { 'AUTOEXEC.BAT': s.autoexec, 'CONFIG.SYS': s.config }, diff: encodeCp437(r.diff) })));
    outcomes.forEach((o, i) => {
      const { r } = changed[i];
      expect(o.ok ? '' : o.output).toBe('');
      expect(o.files['AUTOEXEC.BAT']?.equals(Buffer.from(r.files.autoexec.after))).toBe(true);
      if (r.files.config) expect(o.files['CONFIG.SYS']?.equals(Buffer.from(r.files.config.after))).toBe(true);
    });
    expect(changed.length).toBeGreaterThan(150);
  }
});
