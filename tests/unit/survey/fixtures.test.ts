// Named survey fixtures (tests/fixtures/survey/<case>.json), each with the rule it shows and its source
// ("common practice of the trade, no published source" for the trade's rules), enumerated by one loop.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { analyzeSurvey, renderSurveyReport } from '@/generators/survey';
import type { SurveyInput } from '@/generators/survey/types';

interface Fixture {
  description: string;
  rule: string;
  survey: SurveyInput;
  expect: { layout: string; errorsAndWarnings: string[] };
}

const dir = path.join(__dirname, '../../fixtures/survey');
const names = readdirSync(dir).filter((f) => f.endsWith('.json')).sort();

describe.each(names)('fixture %s', (name) => {
  const fixture = JSON.parse(readFileSync(path.join(dir, name), 'utf8')) as Fixture;

  it(`${fixture.description} [${fixture.rule}]`, () => {
    const result = analyzeSurvey(fixture.survey);
    expect(result.layout).toBe(fixture.expect.layout);
    const found = result.checks.filter((c) => c.severity !== 'note').map((c) => c.slug).sort();
    expect(found).toEqual([...fixture.expect.errorsAndWarnings].sort());
  });

  it('gives the same report twice', () => {
    const a = renderSurveyReport(fixture.survey, analyzeSurvey(fixture.survey));
    const b = renderSurveyReport(fixture.survey, analyzeSurvey(fixture.survey));
    expect(Buffer.from(a).equals(Buffer.from(b))).toBe(true);
  });
});

it('finds the fixtures', () => {
  expect(names.length).toBeGreaterThanOrEqual(7);
});
