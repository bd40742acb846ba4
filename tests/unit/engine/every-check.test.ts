/**
 * Every check slug the engine can emit is produced by at least one test: a check no test can make fire
 * would be a check that cannot fail.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const ENGINE = join(__dirname, '..', '..', '..', 'generators', 'engine');
const FIXTURES = join(__dirname, '..', '..', 'fixtures', 'engine');

function emitted(): Set<string> {
  const out = new Set<string>();
  for (const file of readdirSync(ENGINE).filter((f) => f.endsWith('.ts'))) {
    const source = readFileSync(join(ENGINE, file), 'utf8');
    for (const m of source.matchAll(/(?:lineCheck|profileCheck)\(\s*'([a-z0-9-]+)'/g)) out.add(m[1]);
    for (const m of source.matchAll(/slug: (?:same \? )?'([a-z0-9-]+)'(?: : '([a-z0-9-]+)')?/g)) [m[1], m[2]].filter(Boolean).forEach((s) => out.add(s));
    for (const m of source.matchAll(/\? '([a-z0-9]+(?:-[a-z0-9]+)+)' : '([a-z0-9]+(?:-[a-z0-9]+)+)'/g)) [m[1], m[2]].forEach((s) => out.add(s));
  }
  // raiseAll builds `${name}-raised` for FILES and BUFFERS.
  out.add('files-raised');
  out.add('buffers-raised');
  return out;
}

test('each check slug appears in a fixture expectation or in a test that asserts it', () => {
  const slugs = emitted();
  expect(slugs.size).toBeGreaterThanOrEqual(50);
  const tested = [
    ...readdirSync(FIXTURES).filter((f) => f.endsWith('.expect.json')).map((f) => readFileSync(join(FIXTURES, f), 'utf8')),
    ...readdirSync(__dirname).filter((f) => f.endsWith('.test.ts') && f !== 'every-check.test.ts').map((f) => readFileSync(join(__dirname, f), 'utf8')),
  ].join('\n');
  const untested = [...slugs].filter((s) => !tested.includes(`'${s}'`) && !tested.includes(`"${s}"`));
  expect(untested).toEqual([]);
});
