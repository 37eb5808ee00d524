import type { Clearance } from '../clearance/types';
import type { CoaxRun } from '../coax/coax-run';
import type { PatternSummary } from './physics';
import type { AntennaNeed } from './site-model';

/*
 * The ranking score, 0 (poor) to 1 (best), that explains itself. Loftline's own weighting:
 *  - 65 % pattern: the mean gain over the station's window (long distance 3–15°, regional 15–45°,
 *    near-vertical 60–90°), mapped linearly from −6 dBi (0) to +8 dBi (1);
 *  - 35 % coax: total loss of the run (matched + SWR), 0 dB → 1 and 3 dB or more → 0; halved when the
 *    club's inventory has nothing that reaches; 0 with no operating position;
 *  - minus 0.05 for each check that needs review (at most 0.3).
 * Blocked candidates are ranked but never assigned.
 */
export const PATTERN_WEIGHT = 0.65;
export const COAX_WEIGHT = 0.35;
export const WINDOW_GAIN_FLOOR_DBI = -6;
export const WINDOW_GAIN_TOP_DBI = 8;
export const COAX_LOSS_ZERO_SCORE_DB = 3;
export const REVIEW_PENALTY = 0.05;
export const MAX_REVIEW_PENALTY = 0.3;

const clamp01 = (x: number) => Math.max(0, Math.min(1, x));

export type ScoreParts = { pattern: number; coax: number; reviewPenalty: number };
export type Score = { score: number; parts: ScoreParts; summary: string; explanation: string[] };

const WINDOW_WORDS = { 'long-distance': 'long-distance', regional: 'regional', 'near-vertical': 'near-vertical' } as const;

/**
 * The score alone. coax.lossDb: total loss of the best way to make the run (or, when nothing in the
 * inventory reaches, of the best cable type over the run); coax null: no operating position.
 */
export function scoreValue(
  need: AntennaNeed,
  pattern: PatternSummary,
  coax: { lossDb: number | null; reaches: boolean } | null,
  reviews: number,
): { score: number; parts: ScoreParts; windowGainDbi: number } {
  const window = pattern.windows.find((w) => w.id === need.purpose);
  const windowGainDbi = window ? window.meanGainDbi : -99;
  const patternPart = clamp01((windowGainDbi - WINDOW_GAIN_FLOOR_DBI) / (WINDOW_GAIN_TOP_DBI - WINDOW_GAIN_FLOOR_DBI));
  let coaxPart = 0;
  if (coax && coax.lossDb !== null) coaxPart = clamp01(1 - coax.lossDb / COAX_LOSS_ZERO_SCORE_DB);
  if (coax && !coax.reaches) coaxPart *= 0.5;
  const reviewPenalty = Math.min(MAX_REVIEW_PENALTY, REVIEW_PENALTY * reviews);
  return {
    score: PATTERN_WEIGHT * patternPart + COAX_WEIGHT * coaxPart - reviewPenalty,
    parts: { pattern: patternPart, coax: coaxPart, reviewPenalty },
    windowGainDbi,
  };
}

export function scoreCandidate(args: {
  need: AntennaNeed;
  pattern: PatternSummary;
  feedHeightM: number;
  coax: CoaxRun | null;
  clearances: readonly Clearance[];
}): Score {
  const { need, pattern, coax, clearances } = args;
  const window = pattern.windows.find((w) => w.id === need.purpose);
  let coaxLine = 'no operating position recorded: coax run unknown';
  let coaxShort = 'coax unknown';
  let coaxIn: { lossDb: number | null; reaches: boolean } | null = null;
  if (coax) {
    const best = coax.lossByType[0];
    const lossDb = coax.best ? coax.best.totalDb : (best?.totalDb ?? null);
    const type = coax.best?.type ?? best?.type ?? 'coax';
    coaxIn = { lossDb, reaches: coax.best !== null };
    coaxShort = `${Math.round(coax.runM)} m of ${type}, ${lossDb === null ? 'loss unknown' : `${lossDb.toFixed(1)} dB`}`;
    const pieces = coax.best
      ? coax.best.pieceIds.length === 1
        ? `best piece on its own ${coax.best.pieceIds[0]} (${coax.best.lengthM.toFixed(0)} m)`
        : `best on its own: pieces ${coax.best.pieceIds.join(' + ')} joined (${coax.best.lengthM.toFixed(0)} m)`
      : 'no piece in the inventory reaches';
    coaxLine = `${coax.runM.toFixed(1)} m run to ${coax.operatingPositionId} (${coax.groundRouteM.toFixed(1)} m on the ground, ${coax.dropM.toFixed(1)} m drop, ${coax.slackM.toFixed(1)} m slack): ${pieces}; ${lossDb === null ? 'loss unknown' : `${lossDb.toFixed(2)} dB at SWR ${pattern.swr50.toFixed(2)}`}`;
  }
  const reviews = clearances.filter((c) => c.level === 'needs-review');
  const blocked = clearances.filter((c) => c.level === 'blocked');
  const { score, parts, windowGainDbi } = scoreValue(need, pattern, coaxIn, reviews.length);
  const { pattern: patternPart, coax: coaxPart, reviewPenalty } = parts;
  const summary = `${pattern.heightWavelengths.toFixed(2)} λ high, takeoff ${Math.round(pattern.takeoffDeg)}°, ${coaxShort}`;
  const explanation = [
    `${pattern.heightWavelengths.toFixed(2)} λ high (${args.feedHeightM.toFixed(1)} m), takeoff ${pattern.takeoffDeg.toFixed(0)}°, ` +
      `${WINDOW_WORDS[need.purpose]} window ${window ? `${window.fromDeg}–${window.toDeg}°` : ''} mean ${windowGainDbi.toFixed(1)} dBi` +
      `${need.purposeDefaulted ? ' (purpose by band default)' : ''}`,
    coaxLine,
    blocked.length > 0
      ? `blocked by ${blocked.map((c) => c.key).join(', ')}: cannot be used`
      : reviews.length > 0
        ? `${reviews.length} check${reviews.length > 1 ? 's' : ''} need review: ${reviews.map((c) => c.key).join(', ')}`
        : 'every check meets its rule on the recorded data',
    `score ${score.toFixed(2)} = ${PATTERN_WEIGHT} × pattern ${patternPart.toFixed(2)} + ${COAX_WEIGHT} × coax ${coaxPart.toFixed(2)}` +
      (reviewPenalty > 0 ? ` − review ${reviewPenalty.toFixed(2)}` : ''),
  ];
  return { score, parts, summary, explanation };
}
