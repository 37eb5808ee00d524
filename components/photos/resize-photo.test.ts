import { describe, expect, it } from 'vitest';
import { MAX_EDGE_PX, fitWithin } from './resize-photo.types';

describe('fitWithin (the size a photo is resized to before it is kept)', () => {
  it('scales a 4032×3024 phone photo (12 MP, 4:3) to 1600×1200, keeping the aspect ratio', () => {
    expect(fitWithin(4032, 3024)).toEqual({ width: MAX_EDGE_PX, height: 1200 });
  });
  it('scales a portrait photo by its long (vertical) edge', () => {
    expect(fitWithin(3024, 4032)).toEqual({ width: 1200, height: 1600 });
  });
  it('never enlarges a photo that is already small', () => {
    expect(fitWithin(800, 600)).toEqual({ width: 800, height: 600 });
  });
  it('keeps at least one pixel on a very thin panorama', () => {
    expect(fitWithin(20000, 3)).toEqual({ width: 1600, height: 1 });
  });
});
