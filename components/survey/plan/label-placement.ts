/*
 * Which symbol labels the plan can show without writing over each other: greedy, in priority order
 * (the selected record first, then power lines, then the rest), a label is kept only if its box does not
 * overlap a box already kept. Widths are estimated from the character count at the plan's 13 px type.
 */

export type LabelCandidate = { id: string; x: number; y: number; text: string; priority: number };
type Box = { x0: number; y0: number; x1: number; y1: number };

const CHAR_PX = 7.2;
const HEIGHT_PX = 16;

export function labelBox(c: LabelCandidate): Box {
  const w = c.text.length * CHAR_PX + 6;
  return { x0: c.x - w / 2, x1: c.x + w / 2, y0: c.y - HEIGHT_PX + 3, y1: c.y + 3 };
}

const overlaps = (a: Box, b: Box) => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/**
 * The labels to draw, each with the sideways shift (px) that keeps it inside the drawing when its symbol sits
 * near an edge. Higher priority wins; ties keep the input order.
 */
export function placeLabels(candidates: readonly LabelCandidate[], widthPx: number, heightPx: number): Map<string, number> {
  const order = candidates.map((c, i) => ({ c, i })).sort((a, b) => b.c.priority - a.c.priority || a.i - b.i);
  const kept: Box[] = [];
  const out = new Map<string, number>();
  for (const { c } of order) {
    const raw = labelBox(c);
    if (raw.x1 < 0 || raw.x0 > widthPx || raw.y1 < 0 || raw.y0 > heightPx) continue;
    const w = raw.x1 - raw.x0;
    const dx = w >= widthPx ? -raw.x0 : raw.x0 < 0 ? -raw.x0 : raw.x1 > widthPx ? widthPx - raw.x1 : 0;
    const box = { ...raw, x0: raw.x0 + dx, x1: raw.x1 + dx };
    if (kept.some((k) => overlaps(k, box))) continue;
    kept.push(box);
    out.set(c.id, dx);
  }
  return out;
}
