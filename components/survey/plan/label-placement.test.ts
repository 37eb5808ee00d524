import { describe, expect, it } from 'vitest';
import { labelBox, placeLabels } from './label-placement';

describe('plan label placement (greedy, no overlaps)', () => {
  it('keeps labels that do not touch and drops the lower-priority one of an overlapping pair', () => {
    const kept = placeLabels([
      { id: 'a', x: 100, y: 100, text: 'Big bur oak', priority: 1 },
      { id: 'b', x: 110, y: 104, text: 'Cottonwood pair', priority: 1 },
      { id: 'c', x: 100, y: 200, text: 'Gate walnut', priority: 1 },
      { id: 'line', x: 112, y: 98, text: 'County line (power line)', priority: 5 },
    ], 400, 400);
    expect([...kept.keys()].sort()).toEqual(['c', 'line']);
  });

  it('on a tie the first candidate wins; labels off the drawing are skipped', () => {
    expect([...placeLabels([{ id: 'x', x: 50, y: 50, text: 'one', priority: 0 }, { id: 'y', x: 52, y: 50, text: 'two', priority: 0 }, { id: 'z', x: -300, y: 50, text: 'far', priority: 9 }], 200, 200).keys()]).toEqual(['x']);
  });

  it('a label near the right edge is shifted left to stay inside the drawing', () => {
    const c = { id: 'l', x: 390, y: 50, text: 'County road line (power line)', priority: 5 };
    const dx = placeLabels([c], 400, 200).get('l')!;
    expect(dx).toBeLessThan(0);
    expect(labelBox(c).x1 + dx).toBeCloseTo(400, 9);
  });

  it('a label box is centred on its anchor and grows with the text', () => {
    const b = labelBox({ id: 'a', x: 100, y: 50, text: 'abcd', priority: 0 });
    expect((b.x0 + b.x1) / 2).toBeCloseTo(100, 12);
    expect(labelBox({ id: 'a', x: 100, y: 50, text: 'abcdefgh', priority: 0 }).x1).toBeGreaterThan(b.x1);
  });
});
