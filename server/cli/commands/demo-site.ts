import { writeFileSync } from 'node:fs';
import { generateDemoSite, seededRandom } from '../../../shared/plan';
import { parseFlags } from '../cli-args';

export const summary = 'write a generated site file of an invented park: demo-site --supports <n> --seed <s> [--out <file>]';

export async function run(argv: string[]): Promise<number> {
  const parsed = parseFlags(argv, { supports: { type: 'string' }, seed: { type: 'string' }, out: { type: 'string' } }, summary.slice(summary.indexOf(': ') + 2));
  if ('error' in parsed) {
    console.error(`demo-site: ${parsed.error}`);
    return 2;
  }
  const values = parsed.values as { supports?: string; seed?: string; out?: string };
  const supports = Number(values.supports);
  const seed = Number(values.seed);
  if (values.supports === undefined || !Number.isInteger(supports) || supports < 1 || supports > 5000) {
    console.error(`demo-site: --supports must be a whole number from 1 to 5000 (got "${values.supports ?? ''}")`);
    return 2;
  }
  if (values.seed === undefined || !Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) {
    console.error(`demo-site: --seed must be a whole number from 0 to 4294967295 (got "${values.seed ?? ''}")`);
    return 2;
  }
  const text = `${JSON.stringify(generateDemoSite({ supports, random: seededRandom(seed) }), null, 2)}\n`;
  if (values.out) writeFileSync(values.out, text);
  else process.stdout.write(text);
  return 0;
}
