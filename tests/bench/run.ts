// Runs every benchmark module in this folder (files named *.bench.ts), one after another, on one core.
// Each module exports `run(): Promise<void>` and prints its own figures; nothing here asserts a time.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

const here = __dirname;
const only = process.argv.slice(2);

async function main(): Promise<void> {
  const files = readdirSync(here)
    .filter((f) => f.endsWith('.bench.ts'))
    .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
    .sort();
  if (files.length === 0) throw new Error(`no benchmark matches ${only.join(' ')}`);
  for (const file of files) {
    console.log(`\n=== ${file.replace('.bench.ts', '')} ===`);
    const mod = (await import(pathToFileURL(join(here, file)).href)) as { run: () => Promise<void> };
    await mod.run();
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
