// The survey report: 80 columns, CR LF only, code page 437 (checked with iconv-lite's cp437 table),
// the cautions (REFERENCES 6.5-6.7 [MACASSEY] [TIPRING], 6.10 [AVAYA], 6.11 [LEVITON]), deterministic.
import iconv from 'iconv-lite';
import { analyzeSurvey, demoSurvey, renderSurveyReport, renderSurveyText } from '@/generators/survey';
import { CP437_UPPER, cp437Text } from '@/generators/survey/cp437';
import type { SurveyInput } from '@/generators/survey/types';
import { chain, withAdapters } from './support/build';

function decode(bytes: Uint8Array): string {
  return iconv.decode(Buffer.from(bytes), 'cp437');
}

function oddSurvey(): SurveyInput {
  const s = withAdapters(chain([100, 2600.123456789], 24), ['n1', 'n2']);
  s.siteName = 'Café Ωmega — 設計 🏗 with a very long name that goes on and on past the end of any eighty column line';
  s.jacks.push({ id: 'j1', label: 'J-01\tReception\r\nfront', room: 'x'.repeat(120), station: 'RECEPT' });
  s.nodes[1].jackId = 'j1';
  s.pairTests.push({ id: 't1', jackId: 'j1', pair: '2 (black/yellow) with a long note', vdc: 0.30000000000000004, vac: null, continuity: null, by: 'Tess', at: '2026-03-02' });
  s.runs[0].id = 'a-run-id-that-is-much-longer-than-any-column-of-the-table-0123456789';
  s.terminators.push({ id: 't', nodeId: 'n2', ohms: 120 });
  return s;
}

const surveys: Array<[string, SurveyInput]> = [['demo', demoSurvey()], ['odd', oddSurvey()], ['empty', { siteName: '', jacks: [], pairTests: [], nodes: [], runs: [], terminators: [] }]];

describe.each(surveys)('report of the %s survey', (_name, survey) => {
  const result = analyzeSurvey(survey);
  const bytes = renderSurveyReport(survey, result, { generatedAt: '2026-03-04' });
  const text = decode(bytes);

  it('has CR LF line ends only, ending with one', () => {
    expect(text.endsWith('\r\n')).toBe(true);
    expect(text.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
  });

  it('keeps every line within 80 columns', () => {
    const lines = text.split('\r\n');
    expect(Math.max(...lines.map((l) => l.length))).toBeLessThanOrEqual(80);
  });

  it('is code page 437 that decodes back to the printable text, with no control bytes', () => {
    expect(text.replace(/\r\n/g, '\n')).toBe(renderSurveyText(survey, result, { generatedAt: '2026-03-04' }));
    expect(iconv.encode(text, 'cp437').equals(Buffer.from(bytes))).toBe(true);
    expect([...bytes].filter((b) => b < 0x20 && b !== 0x0d && b !== 0x0a)).toEqual([]);
  });

  it('shows the cautions', () => {
    const flat = text.replace(/\r\n\s*/g, ' ');
    expect(flat).toContain('48 V DC'); // [MACASSEY] [TIPRING] REFERENCES 6.5
    expect(flat).toContain('90 V AC'); // [TIPRING] REFERENCES 6.7
    expect(flat).toContain('Test every pair');
    expect(flat).toContain('lightning storm'); // [AVAYA] REFERENCES 6.10
    expect(flat).toContain('NEC Article 800'); // [LEVITON] REFERENCES 6.11
    expect(flat).toContain('licensed practice');
  });

  it('is the same for the same input', () => {
    expect(Buffer.from(renderSurveyReport(survey, analyzeSurvey(survey), { generatedAt: '2026-03-04' })).equals(Buffer.from(bytes))).toBe(true);
  });
});

describe('report content', () => {
  it('prints the site, readings with units as entered, runs with gauge and resistance, totals, layout and checks', () => {
    const survey = demoSurvey();
    const text = renderSurveyText(survey, analyzeSurvey(survey));
    expect(text).toContain('Site: Halvorsen & Pike Architects');
    expect(text).toMatch(/1 \(red\/green\) +48\.3 +0\.4 +- +IN USE/);
    expect(text).toContain('Readings in volts');
    expect(text).toMatch(/r-09 +wall +540 +22 no +17\.43 Ω/); // 2 x 16.14 x 0.540 [HYPERPHYSICS]
    expect(text).toContain('Wire in all: 2313 ft');
    expect(text).toContain('Shape: star');
    expect(text).toContain('ERROR spoke-too-long');
    expect(text).toContain('ERROR terminator-missing');
    expect(text).not.toContain('Generated:');
  });

  it('prints an odd reading as entered, not rounded', () => {
    const survey = oddSurvey();
    expect(renderSurveyText(survey, analyzeSurvey(survey))).toContain('0.30000000000000004');
    expect(renderSurveyText(survey, analyzeSurvey(survey))).toContain('2600.123456789');
  });

  it('turns characters code page 437 lacks into "?" and keeps those it has', () => {
    expect(cp437Text('Café Ωmega — 設計 🏗\t°')).toBe('Café Ωmega ? ?? ? °');
  });
});

describe('code page 437 table', () => {
  it('matches iconv-lite byte for byte for 0x80-0xFF', () => {
    const upper = Buffer.from(Array.from({ length: 128 }, (_, i) => 0x80 + i));
    expect(CP437_UPPER).toBe(iconv.decode(upper, 'cp437'));
  });
});
