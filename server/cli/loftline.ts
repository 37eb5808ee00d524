// The `loftline` command line: `npm run -s loftline -- <command> [options]`.
// Each command lives in ./commands/<name>.ts and exports `run(argv: string[]): Promise<number>` (the exit code)
// and `summary: string` (one line for the help text).
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

type Command = { run: (argv: string[]) => Promise<number>; summary: string };

const dir = join(__dirname, 'commands');

function commandNames(): string[] {
  return readdirSync(dir)
    .filter((f) => f.endsWith('.ts') && !f.endsWith('.test.ts') && !f.startsWith('_'))
    .map((f) => f.slice(0, -3))
    .sort();
}

async function load(name: string): Promise<Command> {
  return (await import(pathToFileURL(join(dir, `${name}.ts`)).href)) as Command;
}

async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  const names = commandNames();
  if (!name || name === 'help' || name === '--help') {
    console.log('usage: npm run -s loftline -- <command> [options]\n\ncommands:');
    for (const n of names) console.log(`  ${n.padEnd(12)} ${(await load(n)).summary}`);
    return name ? 0 : 2;
  }
  if (!names.includes(name)) {
    console.error(`loftline: unknown command "${name}" (try: ${names.join(', ')})`);
    return 2;
  }
  return (await load(name)).run(rest);
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (err: unknown) => {
    console.error(`loftline: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  },
);
