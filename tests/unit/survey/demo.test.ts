// The demo site's survey: exactly one spoke over 500 ft and no terminator (trade practice, no published
// source), so the screen test can flag and fix them; fixed, no error or warning is left.
import { analyzeSurvey, demoSurvey, DEMO_LONG_SPOKE_RUN_ID } from '@/generators/survey';

describe('demo survey', () => {
  it('is a star from the punch-down block with exactly the two planted errors', () => {
    const result = analyzeSurvey(demoSurvey());
    expect(result.layout).toBe('star');
    expect(result.centreNodeId).toBe('b-1');
    const problems = result.checks.filter((c) => c.severity !== 'note');
    expect(problems.map((c) => c.slug)).toEqual(['spoke-too-long', 'terminator-missing']);
    expect(problems[0].runIds).toContain(DEMO_LONG_SPOKE_RUN_ID);
    expect(result.spokes.filter((s) => s.farthest.lengthFt > 500)).toHaveLength(1);
  });

  it('has the spare pair free at every jack, with invented architecture-practice labels', () => {
    const survey = demoSurvey();
    const result = analyzeSurvey(survey);
    expect(result.jacks.every((j) => j.networkPairStatus === 'free')).toBe(true);
    expect(survey.jacks.map((j) => j.label)).toContain('J-01 Reception');
    expect(survey.jacks).toHaveLength(12);
  });

  it('clears every error and warning once the spoke is shortened and a 150 Ω terminator fitted', () => {
    const survey = demoSurvey();
    survey.runs.find((r) => r.id === DEMO_LONG_SPOKE_RUN_ID)!.lengthFt = 480;
    survey.terminators.push({ id: 'term-1', nodeId: 'n-09', ohms: 150 });
    const result = analyzeSurvey(survey);
    expect(result.counts).toMatchObject({ error: 0, warning: 0 });
  });

  it('returns a fresh copy each time', () => {
    const a = demoSurvey();
    a.runs.length = 0;
    expect(demoSurvey().runs.length).toBeGreaterThan(0);
  });
});
