import { parseArgs } from 'node:util';

/*
 * One way for every command to read its flags. node:util parseArgs refuses a value that starts with a dash
 * ("--height-m -3" → a three-line "argument is ambiguous" message about '--height-m=-XYZ'), so a negative
 * number after a flag that takes a value is passed as that value and the command's own check answers it in
 * plain words ("height must be above 0"). Its errors become one line that ends with the command's usage.
 */

type FlagSpec = Record<string, { type: 'string' | 'boolean'; short?: string }>;

const NEGATIVE_NUMBER = /^-\d|^-\.\d/;

/** `--flag -3` → `--flag=-3` for flags that take a value. */
export function joinNegativeValues(argv: readonly string[], options: FlagSpec): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    const next = argv[i + 1];
    const name = a.startsWith('--') ? a.slice(2) : null;
    if (name && options[name]?.type === 'string' && next !== undefined && NEGATIVE_NUMBER.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}

export type ParsedFlags = { values: Record<string, string | boolean | undefined> } | { error: string };

/** Parses argv strictly (no positionals); an error is one line naming the problem and the usage. */
export function parseFlags(argv: readonly string[], options: FlagSpec, usage: string): ParsedFlags {
  try {
    const { values } = parseArgs({ args: joinNegativeValues(argv, options), options, strict: true, allowPositionals: false });
    return { values: values as Record<string, string | boolean | undefined> };
  } catch (err) {
    const first = (err instanceof Error ? err.message : String(err)).split('\n')[0].replace(/\.$/, '');
    return { error: `${first}; usage: ${usage}` };
  }
}
