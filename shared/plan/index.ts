/*
 * shared/plan — proposes and assigns antenna spots for a site file. Entry point: planSite(site, options)
 * (see PlanResult). Pure, deterministic and I/O-free, so it runs in Node, the CLI or a browser Web Worker.
 */
export { planSite } from './plan-site';
export type { PlanResult, PlanSiteOptions, AntennaPlan, ChosenSpot } from './plan-site';
export type { Candidate } from './evaluate';
export { evaluateSpot } from './evaluate-spot';
export type { SpotToEvaluate, EvaluatedSpot } from './evaluate-spot';
export { legEndOffsetM, foldBearingDeg } from './candidates';
export { DEFAULT_PLAN_OPTIONS, resolvePlanOptions } from './options';
export type { PlanOptions, PlanOptionsInput } from './options';
export { PlanInputError, DEFAULT_PURPOSE_BY_BAND } from './site-model';
export type { AntennaNeed } from './site-model';
export { separationBetween, harmonicRelation, ISOLATION_CAVEAT } from './separation';
export type { SeparationResult, Orientation } from './separation';
export { solveExact, solveHeuristic, solveBruteForce, totalOf, UNASSIGNED_SCORE } from './assign';
export type { AssignProblem, AssignOption, AssignSolution } from './assign';
export { seededRandom } from './random';
export type { RandomSource } from './random';
export { generateDemoSite } from './demo-site';
export { SAFETY_CAUTION, CAUTION_LINES } from '../clearance/cautions';
