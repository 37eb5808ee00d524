/*
 * shared/pattern — predicted radiation pattern and feed point of a centre-fed wire dipole over flat ground.
 * Everything is a planning estimate (see README "How the antenna physics is computed").
 *
 * API (stable; other modules import only from this file):
 *   type DipoleInput, PatternSummary, ElevationPoint, AzimuthPoint, FeedPoint, ResonanceInfo
 *   dipoleInputSchema                        zod schema of DipoleInput (forms, CLI)
 *   validateDipoleInput(input)               throws a clear Error for impossible geometry (ends below ground …)
 *   summarizePattern(input)                  the fast summary (peak, takeoff, half-power, lobes, nulls,
 *                                            windows, feed, SWR, ground loss)
 *   elevationCut(input, stepDeg = 0.5)       broadside elevation cut 0…90°
 *   azimuthCut(input, elevationDeg, stepDeg = 1)
 *                                            0…359°; azimuth 0° = along the wire towards end 1, 90° = broadside
 *   gainAt(input, elevationDeg, azimuthDeg)  gain in one direction, dBi
 *   pattern3d(input, stepDeg = 5)            { elevationsDeg, azimuthsDeg, gainDbi[elev][az] } over the sky
 *   feedImpedance(input)                     { resistanceOhm, reactanceOhm } at input.freqMhz
 *   feedSweep(input, fromMhz, toMhz, steps)  impedance and SWR(50 Ω) of the SAME wire (cut for input.freqMhz
 *                                            or input.lengthM) across a range of frequencies
 *   resonanceInfo(input, fromMhz, toMhz)     lowest-SWR and zero-reactance frequencies of that wire
 *   swr(resistanceOhm, reactanceOhm, z0Ohm = 50)
 *   dipoleWire(input)                        the wire as 3-D points (x along the wire, z up) for drawings
 *   OPERATOR_WINDOWS, GAIN_FLOOR_DBI, modelNotes(...)   (PatternSummary.modelNotes: where a case stretches the model)
 * Gains are dBi relative to the power delivered INTO the feed point; over real ground that includes what
 * the ground absorbs, reported as groundLossDb.
 */
export type { DipoleInput, PatternSummary, ElevationPoint, AzimuthPoint, FeedPoint, ResonanceInfo, OperatorWindowId } from './types';
export { dipoleInputSchema, validateDipoleInput } from './input';
export { dipoleWire } from './geometry';
export type { WirePoint } from './geometry';
export { summarizePattern } from './summary';
export { elevationCut, azimuthCut, gainAt, pattern3d } from './cuts';
export { feedImpedance, feedSweep, resonanceInfo, swr } from './feed';
export { OPERATOR_WINDOWS, GAIN_FLOOR_DBI, modelNotes } from './windows';
