// Wire resistance against REFERENCES §6.8 [HYPERPHYSICS]: the HyperPhysics wire-gauge table (from Floyd,
// "Electric Circuit Fundamentals"), ohms per 1,000 ft of copper at 20 °C. Loop = 2 x conductor x length.
import { OHMS_PER_1000_FT, conductorOhms, loopOhms } from '@/generators/survey/gauge';
import { analyzeSurvey } from '@/generators/survey';
import { chain } from './support/build';

describe('gauge table', () => {
  it('matches the published 20 °C figures [HYPERPHYSICS] (REFERENCES 6.8)', () => {
    expect(OHMS_PER_1000_FT[22]).toBe(16.14);
    expect(OHMS_PER_1000_FT[24]).toBe(25.67);
    expect(OHMS_PER_1000_FT[26]).toBe(40.81);
  });

  it('agrees with the per-km column of the same row [HYPERPHYSICS]: 52.9, 84.2, 133.9 Ω/km', () => {
    const perKm = (g: 22 | 24 | 26) => (OHMS_PER_1000_FT[g] / 0.3048);
    expect(perKm(22)).toBeCloseTo(52.9, 0);
    expect(perKm(24)).toBeCloseTo(84.2, 0);
    expect(perKm(26)).toBeCloseTo(133.9, 0);
  });

  it('scales with length and doubles for the loop [HYPERPHYSICS] (REFERENCES 6.8: loop = 2 x R x length)', () => {
    expect(conductorOhms(22, 1000)).toBeCloseTo(16.14, 10);
    expect(conductorOhms(24, 500)).toBeCloseTo(12.835, 10);
    expect(loopOhms(26, 250)).toBeCloseTo(2 * 40.81 * 0.25, 10);
    expect(loopOhms(22, 0)).toBe(0);
  });

  it('gives per-run and end-to-end loop resistance in the analysis [HYPERPHYSICS]', () => {
    const result = analyzeSurvey(chain([300, 200], [22, 24]));
    const [r1, r2] = result.runs;
    expect(r1.conductorOhms).toBeCloseTo(16.14 * 0.3, 10);
    expect(r1.loopOhms).toBeCloseTo(2 * 16.14 * 0.3, 10);
    expect(r2.loopOhms).toBeCloseTo(2 * 25.67 * 0.2, 10);
    // No adapters: end to end is the longest path, block to the far jack.
    expect(result.endToEnd?.runIds).toEqual(expect.arrayContaining(['r1', 'r2']));
    expect(result.endToEnd?.loopOhms).toBeCloseTo(2 * 16.14 * 0.3 + 2 * 25.67 * 0.2, 10);
    expect(result.endToEnd?.lengthFt).toBe(500);
  });

  it('keeps entered numbers unrounded in the result', () => {
    const result = analyzeSurvey(chain([123.456789]));
    expect(result.runs[0].lengthFt).toBe(123.456789);
    expect(result.totals.lengthFt).toBe(123.456789);
  });
});
