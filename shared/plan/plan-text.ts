import type { Clearance } from '../clearance/types';
import type { Candidate } from './evaluate';
import type { PlanResult } from './plan-site';

/*
 * Plain-text views of a plan for the command line (and any text export). Metres with feet beside them
 * are already in the clearance messages; everything else is metres.
 */

function supportsText(c: Candidate): string {
  return c.shape === 'flat'
    ? `flat-top ${c.supportIds[0]}–${c.supportIds[1]} (${c.spanM!.toFixed(1)} m span, sag ${c.sagM!.toFixed(2)} m)`
    : `inverted-V on ${c.supportIds[0]}, legs ${c.wireAzimuthDeg}°/${(c.wireAzimuthDeg + 180) % 360}°`;
}

function clearanceLines(results: readonly Clearance[], indent: string): string[] {
  const notClear = results.filter((r) => r.level !== 'clear');
  const clearCount = results.length - notClear.length;
  const lines = notClear.map((r) => `${indent}[${r.level}] ${r.message} (${r.source})`);
  lines.push(`${indent}${clearCount} other check${clearCount === 1 ? '' : 's'} clear`);
  return lines;
}

function candidateLines(c: Candidate, rank: number | null, indent: string): string[] {
  const head = `${indent}${rank === null ? '' : `${rank}. `}${supportsText(c)}: ${c.summary} — ${c.level}, score ${c.score.toFixed(2)}`;
  const bs = `${indent}   broadside ${c.broadsideDeg.map((d) => `${d.toFixed(0)}°`).join(' / ')}; wire ${c.wireLengthM.toFixed(2)} m; public keeps ${c.exposure.uncontrolledM.toFixed(1)} m, operators ${c.exposure.controlledM.toFixed(1)} m`;
  return [head, bs, ...c.explanation.map((l) => `${indent}   ${l}`), ...clearanceLines(c.clearances, `${indent}   `)];
}

/** Ranked candidates per antenna. */
export function proposalText(result: PlanResult, top: number): string[] {
  const lines: string[] = [];
  for (const a of result.antennas) {
    const n = a.need;
    lines.push(
      `${n.stationId} · ${n.band} (${n.purpose}${n.purposeDefaulted ? ', by band' : ''}, ${n.powerW} W ${n.mode}) · ${a.candidateCount} spots, ${a.blockedCount} blocked`,
    );
    if (a.candidateCount === 0) lines.push('   no support pair or support can carry this dipole');
    a.ranked.slice(0, top).forEach((c, i) => lines.push(...candidateLines(c, i + 1, '   ')));
    lines.push('');
  }
  lines.push(result.caution);
  return lines;
}

/** The chosen spot per antenna, what limited it, and the separations between them. */
export function assignmentText(result: PlanResult): string[] {
  const a = result.assignment;
  const lines: string[] = [
    `Assignment (${a.method}${a.exact ? ', proven best' : ', best found'}; total score ${a.totalScore.toFixed(2)})`,
  ];
  for (const s of a.spots) {
    lines.push(`${s.stationId} · ${s.band}`);
    if (s.candidate) lines.push(...candidateLines(s.candidate, null, '   '));
    else lines.push('   no spot');
    if (s.coaxNote) lines.push(`   coax: ${s.coaxNote}`);
    for (const l of s.limitedBy) lines.push(`   limited by: ${l}`);
  }
  if (a.separations.length > 0) {
    lines.push('Separation between chosen antennas:');
    for (const r of a.separations) lines.push(`   [${r.level}] ${r.message}`);
  }
  lines.push('', result.caution);
  return lines;
}
