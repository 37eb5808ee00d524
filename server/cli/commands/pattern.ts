import { parseFlags } from '../cli-args';
import { customGround, groundFromClass, GROUND_CLASS_NAMES, type Ground } from '../../../shared/ground';
import { dipoleInputSchema, elevationCut, summarizePattern, type DipoleInput } from '../../../shared/pattern';
import { halfWaveCutM } from '../../../shared/wire';

export const summary =
  'predicted pattern and feed point of a dipole: pattern --mhz <f> --height-m <h> --ground <class> [--sigma <S/m> --epsr <εr>] [--length-m <L>] [--shape flat|inverted-v --apex-deg <a>] [--json]';

const HELP = `usage: npm run -s loftline -- pattern --mhz <f> --height-m <h> --ground <class> [options]

Predicted radiation pattern (broadside elevation cut) and feed point of a centre-fed wire dipole.
These are planning estimates from a simplified model (sinusoidal current, flat ground); they are not a
measurement and say nothing about safety near power lines or RF exposure.

  --mhz <f>            frequency in MHz (0.5–100)
  --height-m <h>       flat: feed-point height; inverted-V: apex height (metres)
  --ground <class>     ${GROUND_CLASS_NAMES.join(', ')}
  --sigma <S/m> --epsr <εr>
                       measured ground constants (instead of, or overriding, --ground)
  --length-m <L>       wire length end to end (default: 468/f ft practical cut)
  --shape flat|inverted-v   (default flat)
  --apex-deg <a>       inverted-V included angle (default 120)
  --step-deg <s>       elevation step of the printed cut (default 0.5 with --json, 5 otherwise)
  --json               one JSON object on stdout`;

function fail(msg: string): number {
  console.error(`pattern: ${msg}`);
  return 2;
}

function number(v: string | undefined, flag: string): number | undefined | Error {
  if (v === undefined) return undefined;
  const n = Number(v);
  if (v.trim() === '' || !Number.isFinite(n)) return new Error(`${flag} must be a number (got "${v}")`);
  return n;
}

export async function run(argv: string[]): Promise<number> {
  const flags = parseFlags(
    argv,
    {
      mhz: { type: 'string' },
      'height-m': { type: 'string' },
      ground: { type: 'string' },
      sigma: { type: 'string' },
      epsr: { type: 'string' },
      'length-m': { type: 'string' },
      shape: { type: 'string' },
      'apex-deg': { type: 'string' },
      'step-deg': { type: 'string' },
      json: { type: 'boolean' },
      help: { type: 'boolean', short: 'h' },
    },
    summary.slice(summary.indexOf(': ') + 2),
  );
  if ('error' in flags) return fail(flags.error);
  const values = flags.values;
  if (values.help) {
    console.log(HELP);
    return 0;
  }
  const nums: Record<string, number | undefined> = {};
  for (const flag of ['mhz', 'height-m', 'sigma', 'epsr', 'length-m', 'apex-deg', 'step-deg']) {
    const n = number(values[flag] as string | undefined, `--${flag}`);
    if (n instanceof Error) return fail(n.message);
    nums[flag] = n;
  }
  if (nums.mhz === undefined) return fail('--mhz <f> is required');
  if (nums['height-m'] === undefined) return fail('--height-m <h> is required');
  let ground: Ground;
  try {
    if (nums.sigma !== undefined || nums.epsr !== undefined) {
      if (nums.sigma === undefined || nums.epsr === undefined) return fail('--sigma and --epsr go together');
      ground = customGround(nums.sigma, nums.epsr);
    } else {
      if (typeof values.ground !== 'string') return fail(`--ground <class> is required (one of: ${GROUND_CLASS_NAMES.join(', ')})`);
      ground = groundFromClass(values.ground);
    }
  } catch (err) {
    return fail(err instanceof Error ? err.message : String(err));
  }
  const shape = (values.shape as string | undefined) ?? 'flat';
  if (shape !== 'flat' && shape !== 'inverted-v') return fail(`--shape must be flat or inverted-v (got "${shape}")`);
  if (nums['apex-deg'] !== undefined && shape !== 'inverted-v') return fail('--apex-deg needs --shape inverted-v');
  const candidate = {
    freqMhz: nums.mhz,
    ground,
    shape,
    heightM: nums['height-m'],
    ...(nums['length-m'] !== undefined ? { lengthM: nums['length-m'] } : {}),
    ...(nums['apex-deg'] !== undefined ? { apexDeg: nums['apex-deg'] } : {}),
  };
  const parsed = dipoleInputSchema.safeParse(candidate);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return fail(`${issue.path.join('.') || 'input'}: ${issue.message}`);
  }
  const input: DipoleInput = parsed.data;
  const step = nums['step-deg'] ?? (values.json ? 0.5 : 5);
  let result;
  try {
    const s = summarizePattern(input);
    result = { ...s, elevation: elevationCut(input, step) };
  } catch (err) {
    return fail(err instanceof Error ? err.message.replace(/^invalid dipole: /, '') : String(err));
  }
  const lengthM = input.lengthM ?? halfWaveCutM(input.freqMhz);
  if (values.json) {
    console.log(JSON.stringify({ input: { ...input, lengthM }, ...result, note: 'planning estimate; not a measurement' }));
    return 0;
  }
  const f = (v: number, d = 1) => v.toFixed(d);
  const lines = [
    `Dipole ${shape} ${f(lengthM, 2)} m at ${f(input.heightM, 1)} m (${f(result.heightWavelengths, 2)} λ), ${input.freqMhz} MHz, ground ${
      typeof values.ground === 'string' && nums.sigma === undefined ? values.ground : 'custom'
    }`,
    `Peak gain      ${f(result.peakGainDbi, 2)} dBi at ${f(result.takeoffDeg)}° (takeoff)`,
    `Half power     ${f(result.halfPower.lowDeg)}° … ${f(result.halfPower.highDeg)}°`,
    `Lobes          ${result.lobes.map((l) => `${f(l.elevationDeg)}° ${f(l.gainDbi, 2)} dBi`).join(', ')}`,
    `Nulls          ${result.nulls.length ? result.nulls.map((n) => `${f(n.elevationDeg)}°`).join(', ') : 'none'}`,
    ...result.windows.map((w) => `${(w.id + ' ').padEnd(15)}${f(w.meanGainDbi, 2)} dBi mean over ${w.fromDeg}°–${w.toDeg}°`),
    `Feed point     ${f(result.feed.resistanceOhm)} ${result.feed.reactanceOhm < 0 ? '−' : '+'} j${f(Math.abs(result.feed.reactanceOhm))} Ω, SWR ${
      Number.isFinite(result.swr50) ? f(result.swr50, 2) : '∞'
    } on 50 Ω`,
    `Ground loss    ${f(result.groundLossDb, 2)} dB`,
    ...result.modelNotes.map((n) => `Note: ${n}`),
    '',
    'Elevation cut (broadside):',
    ...result.elevation.map((p) => `  ${f(p.deg).padStart(5)}°  ${f(p.gainDbi, 2).padStart(7)} dBi`),
    '',
    'Planning estimate from a simplified model, not a measurement.',
  ];
  console.log(lines.join('\n'));
  return 0;
}
