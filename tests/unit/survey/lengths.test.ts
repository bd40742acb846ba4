// Length limits. Common practice of the trade, no published source: star spokes up to 500 ft each from
// the centre; a bus up to 4,000 ft in total, 2,500 ft when only 24 AWG wire is used; 22 AWG for new runs.
import { analyzeSurvey } from '@/generators/survey';
import { chain, slugs, star, withAdapters } from './support/build';

describe('star spoke limit 500 ft (trade practice, no published source)', () => {
  it.each([[499, false], [499.99, false], [500, false], [500.01, true], [501, true]])(
    'a spoke of %p ft: over the limit = %p', (len, over) => {
      const result = analyzeSurvey(star([len, 100, 50]));
      expect(result.layout).toBe('star');
      expect(slugs(result).includes('spoke-too-long')).toBe(over);
    });

  it('measures a spoke from the centre to its far end, cords included', () => {
    const result = analyzeSurvey(withAdapters(star([495, 100]), ['n1', 'n2']));
    const check = result.checks.find((c) => c.slug === 'spoke-too-long')!;
    expect(check.severity).toBe('error');
    expect(check.runIds).toEqual(['r1', 'c-n1']);
    expect(check.message).toContain('502 ft');
    expect(result.spokes.map((s) => s.farthest.lengthFt)).toEqual([502, 107]);
  });

  it('names every over-long spoke and nothing else', () => {
    const result = analyzeSurvey(star([600, 100, 700]));
    expect(result.checks.filter((c) => c.slug === 'spoke-too-long').map((c) => c.runIds)).toEqual([['r1'], ['r3']]);
  });

  it('does not apply the bus total to a star', () => {
    expect(slugs(analyzeSurvey(star([450, 450, 450, 450, 450, 450, 450, 450, 450, 450])))).not.toContain('bus-too-long');
  });
});

describe('bus total 4,000 ft with 22 AWG (trade practice, no published source)', () => {
  it.each([[[2000, 1999], false], [[2000, 2000], false], [[2000, 2000.5], true], [[2000, 2001], true]])(
    'runs %p: over = %p', (lengths, over) => {
      const result = analyzeSurvey(chain(lengths as number[]));
      expect(result.layout).toBe('bus');
      expect(slugs(result).includes('bus-too-long')).toBe(over);
    });
});

describe('bus total 2,500 ft when only 24 AWG is used (trade practice, no published source)', () => {
  it.each([[[1250, 1249], false], [[1250, 1250], false], [[1250, 1251], true]])('runs %p of 24 AWG: over = %p',
    (lengths, over) => {
      const result = analyzeSurvey(chain(lengths as number[], 24));
      expect(slugs(result).includes('bus-too-long')).toBe(over);
      if (over) expect(result.checks.find((c) => c.slug === 'bus-too-long')!.message).toContain('2500 ft');
    });

  it('keeps 4,000 ft when 22 AWG is part of the wiring', () => {
    expect(slugs(analyzeSurvey(chain([1500, 1500], [22, 24])))).not.toContain('bus-too-long');
  });

  it('applies 2,500 ft to thinner wire too (our reading of the rule)', () => {
    expect(slugs(analyzeSurvey(chain([1300, 1300], 26)))).toContain('bus-too-long');
  });

  it('judges the gauge on the wall wiring, not on the adapter cords', () => {
    // 24 AWG walls with (unusual) 22 AWG cords: the walls decide, so the 2,500 ft figure applies.
    const s = withAdapters(chain([1300, 1290], 24), ['b', 'n2']);
    s.runs.forEach((r) => { if (r.kind === 'cord') r.gauge = 22; });
    expect(slugs(analyzeSurvey(s))).toContain('bus-too-long');
  });
});

describe('22 AWG for new runs (trade practice, no published source)', () => {
  it('notes wall runs of other gauges, and only those', () => {
    const result = analyzeSurvey(chain([100, 100, 100], [22, 24, 26]));
    const note = result.checks.find((c) => c.slug === 'gauge-not-22')!;
    expect(note.severity).toBe('note');
    expect(note.runIds).toEqual(['r2', 'r3']);
    expect(slugs(analyzeSurvey(withAdapters(chain([100]), ['n1'])))).not.toContain('gauge-not-22');
  });
});

describe('totals', () => {
  it('adds wire in all and by gauge, wall and cord apart', () => {
    const result = analyzeSurvey(withAdapters(chain([100, 200.5], [22, 24]), ['n1', 'n2']));
    expect(result.totals).toEqual({
      lengthFt: 314.5, byGauge: { 22: 100, 24: 200.5, 26: 14 }, wallFt: 300.5, cordFt: 14, runsCounted: 4, runsSkipped: 0,
    });
  });
});
