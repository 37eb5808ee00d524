import type { AssignOption, AssignProblem, AssignSolution } from './assign';
import type { AntennaPlan } from './plan-site';
import type { SeparationResult } from './separation';

/** A candidate id (`20m:iv:<support>@45`, `40m:flat:<a>~<b>`) in words: "the inverted-V at <support> (legs 45°–225°)". */
export function spotWords(candidateId: string): string {
  const iv = /^[^:]+:iv:(.+)@(\d+(?:\.\d+)?)$/.exec(candidateId);
  if (iv) {
    const az = Number(iv[2]);
    return `the inverted-V at ${iv[1]} (legs ${az}°–${az + 180}°)`;
  }
  const flat = /^[^:]+:flat:(.+)~(.+)$/.exec(candidateId);
  return flat ? `the flat-top ${flat[1]}–${flat[2]}` : candidateId;
}

/** An antenna's key (`<station>:<band>`) in words: "<station> 20m". */
export const antennaWords = (needKey: string): string => {
  const at = needKey.lastIndexOf(':');
  return at < 0 ? needKey : `${needKey.slice(0, at)} ${needKey.slice(at + 1)}`;
};

/** A clearance key (`power-line:<line>`) in words: "power line <line>". */
const blockerWords = (key: string): string => (key.startsWith('power-line:') ? `power line ${key.slice('power-line:'.length)}` : key);

/** Plain lines saying what limited the choice for antenna i. */
export function explainAntenna(
  i: number,
  problem: AssignProblem,
  solution: AssignSolution,
  plan: AntennaPlan,
  separation: (a: AssignOption, b: AssignOption) => SeparationResult,
  maxEnds: ReadonlyMap<string, number>,
): string[] {
  const lines: string[] = [];
  const need = plan.need;
  const options = problem.needs[i].options;
  const mine = solution.choice[i];
  if (plan.candidateCount === 0) {
    lines.push(`no support pair or support can carry a ${need.band} dipole within the span and wire-height rules`);
    return lines;
  }
  if (plan.blockedCount > 0) {
    const top = plan.blockedBy.slice(0, 3).map((b) => `${blockerWords(b.key)} ×${b.count}`).join(', ');
    lines.push(`${plan.blockedCount} of ${plan.candidateCount} spots are blocked (by ${top})`);
  }
  if (options.length === 0) {
    lines.push(`no usable spot: every spot for ${need.band} is blocked`);
    return lines;
  }
  const best = options.reduce((a, b) => (b.score > a.score ? b : a), options[0]);
  if (mine && mine.id === best.id) {
    lines.push('got its best usable spot');
    return lines;
  }
  // Why the best spot on its own was not used: the other antennas' choices.
  const reasons: string[] = [];
  const used = new Map<string, string[]>();
  solution.choice.forEach((o, j) => {
    if (!o || j === i) return;
    for (const s of o.supportIds) used.set(s, [...(used.get(s) ?? []), o.needKey]);
  });
  for (const s of best.supportIds) {
    const users = used.get(s) ?? [];
    if (users.length + 1 > (maxEnds.get(s) ?? 1)) reasons.push(`support ${s} carries at most ${maxEnds.get(s) ?? 1} end(s), taken by ${users.map(antennaWords).join(' and ')}`);
  }
  solution.choice.forEach((o, j) => {
    if (!o || j === i) return;
    const r = separation(best, o);
    if (r.level === 'blocked') reasons.push(`${r.wavelengths.toFixed(2)} λ from ${antennaWords(o.needKey)}, which took ${spotWords(o.id.split('#')[1] ?? o.id)} (needs ${(r.requiredM ?? 0).toFixed(1)} m apart)`);
  });
  const name = spotWords(best.id.split('#')[1] ?? best.id);
  const more = reasons.length > 3 ? `; and ${reasons.length - 3} more` : '';
  if (reasons.length > 0) lines.push(`best spot ${name} (score ${best.score.toFixed(2)}) not used: ${reasons.slice(0, 3).join('; ')}${more}`);
  else lines.push(`best spot ${name} (score ${best.score.toFixed(2)}) was given up for a higher total across all antennas`);
  if (!mine) lines.push('every usable spot conflicts with the other antennas: left without a spot');
  return lines;
}
