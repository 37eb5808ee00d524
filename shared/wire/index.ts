/*
 * shared/wire — wire geometry for dipoles.
 *   halfWaveCutM(freqMhz, { endEffectFactor? }), legLengthM, wireToCutM, PRACTICAL_RULE_M_MHZ, DEFAULT_END_EFFECT_FACTOR
 *   spanSagM({ spanM, tensionN, wireWeightNPerM?, pointLoadN?, method? })  mid-span sag (catenary or parabola)
 *   flatTopSpan({ …, endHeightsM })  feed height, lowest point and arc length of a sagging flat-top
 *   feedPointLoadN({ coaxWeightNPerM, dropM, balunN? })
 *   invertedV({ apexHeightM, wireLengthM, apexDeg? }), apexDegForEndHeight
 *   spanFit({ distanceM, wireLengthM, insulatorM?, minRopePerEndM? })
 */
export { halfWaveCutM, legLengthM, wireToCutM, PRACTICAL_RULE_M_MHZ, DEFAULT_END_EFFECT_FACTOR, DEFAULT_ALLOWANCES } from './cut-length';
export type { CutOptions, Allowances } from './cut-length';
export { spanSagM, flatTopSpan, feedPointLoadN, WIRE_14AWG_N_PER_M } from './sag';
export type { SpanLoad, FlatTopSpan } from './sag';
export { invertedV, apexDegForEndHeight } from './inverted-v';
export type { InvertedV } from './inverted-v';
export { spanFit } from './span-fit';
export type { SpanFit } from './span-fit';
