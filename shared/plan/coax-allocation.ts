import type { CoaxPiece } from '../coax/coax-run';
import { matchedLossDb, swrExtraLossDb } from '../coax/loss';
import type { Candidate } from './evaluate';
import type { AntennaNeed } from './site-model';

export type CoaxAllocation = { pieceIds: string[]; note: string };

function lossOf(pieces: readonly CoaxPiece[], freqMhz: number, swr: number): number {
  let matched = 0;
  for (const p of pieces) {
    const m = matchedLossDb(p.type, freqMhz, p.lengthM);
    if (m === null) return Infinity; // unknown loss sorts last
    matched += m;
  }
  return matched + swrExtraLossDb(matched, swr);
}

/**
 * Gives each chosen antenna coax from the club's inventory, each piece to one antenna: the longest runs
 * choose first, taking the lowest-loss piece that reaches, else the lowest-loss two pieces joined.
 */
export function allocateCoax(chosen: readonly (Candidate | null)[], inventory: readonly CoaxPiece[], needs: readonly AntennaNeed[]): CoaxAllocation[] {
  const out: CoaxAllocation[] = chosen.map(() => ({ pieceIds: [], note: '' }));
  const free = new Set(inventory.map((p) => p.id));
  const order = chosen
    .map((c, i) => ({ c, i }))
    .filter((x): x is { c: Candidate; i: number } => x.c !== null && x.c.coax !== null)
    .sort((a, b) => b.c.coax!.runM - a.c.coax!.runM || a.i - b.i);
  for (const { c, i } of order) {
    const run = c.coax!;
    const freqMhz = needs[i].freqMhz;
    const swr = c.pattern.swr50;
    const avail = inventory.filter((p) => free.has(p.id));
    let best: { pieces: CoaxPiece[]; db: number } | null = null;
    for (const p of avail) {
      if (p.lengthM < run.runM) continue;
      const db = lossOf([p], freqMhz, swr);
      if (!best || db < best.db || (db === best.db && p.lengthM < best.pieces[0].lengthM)) best = { pieces: [p], db };
    }
    if (!best) {
      for (let a = 0; a < avail.length; a++) {
        for (let b = a + 1; b < avail.length; b++) {
          if (avail[a].lengthM + avail[b].lengthM < run.runM) continue;
          const db = lossOf([avail[a], avail[b]], freqMhz, swr);
          if (!best || db < best.db) best = { pieces: [avail[a], avail[b]], db };
        }
      }
    }
    if (!best) {
      out[i] = { pieceIds: [], note: `no coax left in the inventory reaches ${run.runM.toFixed(1)} m to ${run.operatingPositionId}: bring more` };
      continue;
    }
    for (const p of best.pieces) free.delete(p.id);
    const what = best.pieces.map((p) => `${p.id} (${p.type}, ${p.lengthM.toFixed(0)} m)`).join(' + ');
    out[i] = {
      pieceIds: best.pieces.map((p) => p.id),
      note: `${what} for a ${run.runM.toFixed(1)} m run to ${run.operatingPositionId}, ${Number.isFinite(best.db) ? `${best.db.toFixed(2)} dB` : 'loss unknown'}${best.pieces.length > 1 ? ', joined with a barrel' : ''}`,
    };
  }
  chosen.forEach((c, i) => {
    if (c && !c.coax) out[i] = { pieceIds: [], note: 'no operating position recorded: coax run unknown' };
  });
  return out;
}
