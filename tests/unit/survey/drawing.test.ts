// Drawing positions: a tree layered from the centre (or the punch-down block), deterministic.
import { demoSurvey, layoutSurvey } from '@/generators/survey';
import { LAYOUT_ROW_GAP } from '@/generators/survey/layout';
import { chain, node, star, withAdapters } from './support/build';

describe('layoutSurvey', () => {
  it('puts the centre on the top row and every node one row below the node it hangs from', () => {
    const s = withAdapters(star([100, 200, 300]), ['n1', 'n2', 'n3']);
    const at = new Map(layoutSurvey(s).nodes.map((n) => [n.id, n]));
    const top = at.get('b')!.y;
    for (const id of ['n1', 'n2', 'n3']) expect(at.get(id)!.y).toBe(top + LAYOUT_ROW_GAP);
    for (const id of ['a-n1', 'a-n2', 'a-n3']) expect(at.get(id)!.y).toBe(top + 2 * LAYOUT_ROW_GAP);
    expect(at.get('b')!.x).toBe(at.get('n2')!.x); // centred over its middle child
  });

  it('gives every node its own place inside the drawing size', () => {
    const s = demoSurvey();
    const drawing = layoutSurvey(s);
    expect(drawing.nodes.map((n) => n.id)).toEqual(s.nodes.map((n) => n.id));
    const places = new Set(drawing.nodes.map((n) => `${n.x},${n.y}`));
    expect(places.size).toBe(s.nodes.length);
    for (const n of drawing.nodes) {
      expect(n.x).toBeGreaterThan(0);
      expect(n.y).toBeGreaterThan(0);
      expect(n.x).toBeLessThan(drawing.size.width);
      expect(n.y).toBeLessThan(drawing.size.height);
    }
  });

  it('roots at the block when no centre is chosen, and places unwired nodes to the side', () => {
    const s = chain([100, 100]);
    s.nodes.unshift(node('loose', 'jack'));
    const at = new Map(layoutSurvey(s).nodes.map((n) => [n.id, n]));
    expect(at.get('b')!.y).toBeLessThan(at.get('n1')!.y);
    expect(at.get('loose')!.x).toBeGreaterThan(at.get('n2')!.x);
  });

  it('is deterministic', () => {
    expect(layoutSurvey(demoSurvey())).toEqual(layoutSurvey(demoSurvey()));
  });

  it('handles an empty survey', () => {
    expect(layoutSurvey({ siteName: '', jacks: [], pairTests: [], nodes: [], runs: [], terminators: [] }))
      .toEqual({ nodes: [], size: { width: 120, height: 120 } });
  });
});
