import { planSite } from '../../../shared/plan';
import { assignmentText } from '../../../shared/plan/plan-text';
import { parseFlags } from '../cli-args';
import { readSite } from './propose';

export const summary = 'choose one antenna spot per station from a site file: assign --site <file> [--json]';

export async function run(argv: string[]): Promise<number> {
  const parsed = parseFlags(argv, { site: { type: 'string' }, json: { type: 'boolean' } }, summary.slice(summary.indexOf(': ') + 2));
  if ('error' in parsed) {
    console.error(`assign: ${parsed.error}`);
    return 2;
  }
  const values = parsed.values as { site?: string; json?: boolean };
  if (!values.site) {
    console.error('assign: --site <file> is required');
    return 2;
  }
  const site = readSite(values.site, 'assign');
  if (!site) return 1;
  const result = planSite(site);
  if (values.json) {
    console.log(JSON.stringify({ caution: result.caution, cautions: result.cautions, assignment: result.assignment, stats: result.stats }, null, 2));
  } else {
    console.log(assignmentText(result).join('\n'));
  }
  return 0;
}
