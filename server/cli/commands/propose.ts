import { readFileSync } from 'node:fs';
import { parseFlags } from '../cli-args';
import { planSite } from '../../../shared/plan';
import { proposalText } from '../../../shared/plan/plan-text';
import { parseSiteFile } from '../../../shared/schemas/site-file';

export const summary = 'rank antenna spots per station from a site file: propose --site <file> [--station <id>] [--top <n>] [--json]';

export async function run(argv: string[]): Promise<number> {
  const parsed = parseFlags(argv, { site: { type: 'string' }, station: { type: 'string' }, top: { type: 'string' }, json: { type: 'boolean' } }, summary.slice(summary.indexOf(': ') + 2));
  if ('error' in parsed) {
    console.error(`propose: ${parsed.error}`);
    return 2;
  }
  const values = parsed.values as { site?: string; station?: string; top?: string; json?: boolean };
  if (!values.site) {
    console.error('propose: --site <file> is required');
    return 2;
  }
  const top = values.top === undefined ? 3 : Number(values.top);
  if (!Number.isInteger(top) || top < 1 || top > 100) {
    console.error(`propose: --top must be a whole number from 1 to 100 (got "${values.top}")`);
    return 2;
  }
  const site = readSite(values.site, 'propose');
  if (!site) return 1;
  if (values.station !== undefined && !site.stations.some((s) => s.id === values.station)) {
    console.error(`propose: --station "${values.station}" is not in ${values.site} (stations: ${site.stations.map((s) => s.id).join(', ') || 'none'})`);
    return 2;
  }
  const result = planSite(site, { stationId: values.station, topPerAntenna: top });
  if (values.json) {
    console.log(JSON.stringify({ caution: result.caution, cautions: result.cautions, ground: result.ground, antennas: result.antennas, stats: result.stats }, null, 2));
  } else {
    console.log(proposalText(result, top).join('\n'));
  }
  return 0;
}

/** Read and validate a site file; prints "file: field: message" lines and returns null when it is bad. */
export function readSite(path: string, command: string) {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (err) {
    console.error(`${command}: cannot read ${path}: ${err instanceof Error ? err.message : String(err)}`);
    return null;
  }
  const parsed = parseSiteFile(text);
  if (!parsed.ok) {
    for (const e of parsed.errors) console.error(`${command}: ${path}: ${e}`);
    return null;
  }
  return parsed.site;
}
