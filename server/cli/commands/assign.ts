import { parseArgs } from 'node:util';
import { planSite } from '../../../shared/plan';
import { assignmentText } from '../../../shared/plan/plan-text';
import { readSite } from './propose';

export const summary = 'choose one antenna spot per station from a site file: assign --site <file> [--json]';

export async function run(argv: string[]): Promise<number> {
  let values: { site?: string; json?: boolean };
  try {
    ({ values } = parseArgs({ args: argv, options: { site: { type: 'string' }, json: { type: 'boolean' } }, strict: true, allowPositionals: false }));
  } catch (err) {
    console.error(`assign: ${err instanceof Error ? err.message : String(err)}`);
    return 2;
  }
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
