import type { AssignOption, AssignProblem, AssignSolution } from './assign';
import type { AntennaPlan } from './plan-site';
import type { SeparationResult } from './separation';

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
    const top = plan.blockedBy.slice(0, 3).map((b) => `${b.key} ×${b.count}`).join(', ');
    lines.push(`${plan.blockedCount} of ${plan.candidateCount} spots are blocked (${top})`);
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
    if (users.length + 1 > (maxEnds.get(s) ?? 1)) reasons.push(`support ${s} carries at most ${maxEnds.get(s) ?? 1} end(s), taken by ${users.join(' and ')}`);
  }
  solution.choice.forEach((o, j) => {
    if (!o || j === i) return;
    const r = separation(best, o);
    if (r.level === 'blocked') reasons.push(`${r.wavelengths.toFixed(2)} λ from ${o.needKey} (needs ${(r.requiredM ?? 0).toFixed(1)} m)`);
  });
  const name = best.id.split('#')[1] ?? best.id;
  const more = reasons.length > 3 ? `; and ${reasons.length - 3} more` : '';
  if (reasons.length > 0) lines.push(`best spot ${name} (score ${best.score.toFixed(2)}) not used: ${reasons.slice(0, 3).join('; ')}${more}`);
  else lines.push(`best spot ${name} (score ${best.score.toFixed(2)}) was given up for a higher total across all antennas`);
  if (!mine) lines.push('every usable spot conflicts with the other antennas: left without a spot');
  return lines;
}
