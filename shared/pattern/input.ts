import { z } from 'zod';
import type { DipoleInput } from './types';

export const DEFAULT_APEX_DEG = 120;
/** 14 AWG copper, the common field-day dipole wire. */
export const DEFAULT_WIRE_DIAMETER_M = 0.00163;

const groundSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('free-space') }),
  z.strictObject({ kind: z.literal('perfect') }),
  z.strictObject({
    kind: z.literal('real'),
    sigmaSPerM: z.number().positive('conductivity must be above 0').max(10, 'conductivity above 10 S/m is not ground'),
    epsR: z.number().min(1, 'relative permittivity is at least 1').max(100, 'relative permittivity above 100 is not ground'),
  }),
]);

/** The model is built for HF and 6 m wire dipoles; outside these limits its assumptions stop holding. */
export const dipoleInputSchema = z.strictObject({
  freqMhz: z.number().min(0.5, 'frequency must be at least 0.5 MHz').max(100, 'frequency above 100 MHz is outside this model'),
  ground: groundSchema,
  shape: z.enum(['flat', 'inverted-v']),
  heightM: z.number().positive('height must be above 0 m').max(500, 'height above 500 m is outside this model'),
  lengthM: z.number().positive('wire length must be above 0 m').max(1000).optional(),
  endHeightsM: z.tuple([z.number().positive('end height must be above 0 m'), z.number().positive('end height must be above 0 m')]).optional(),
  apexDeg: z.number().min(30, 'apex angle must be at least 30°').max(180, 'apex angle is at most 180°').optional(),
  wireDiameterM: z.number().positive('wire diameter must be above 0').max(0.05, 'wire diameter above 5 cm is outside this model').optional(),
});

/** Same checks as the schema plus the geometry (cheap: runs on every summary, so no zod here). */
export function validateDipoleInput(input: DipoleInput): void {
  const fail = (m: string): never => {
    throw new Error(`invalid dipole: ${m}`);
  };
  const { freqMhz, heightM } = input;
  if (!Number.isFinite(freqMhz) || freqMhz < 0.5 || freqMhz > 100) fail(`frequency must be 0.5–100 MHz (got ${freqMhz})`);
  if (!Number.isFinite(heightM) || heightM <= 0 || heightM > 500) fail(`height must be above 0 and at most 500 m (got ${heightM})`);
  if (input.shape !== 'flat' && input.shape !== 'inverted-v') fail(`shape must be "flat" or "inverted-v" (got ${String(input.shape)})`);
  const g = input.ground;
  if (!g || (g.kind !== 'free-space' && g.kind !== 'perfect' && g.kind !== 'real')) fail('ground must be free-space, perfect or real');
  if (g.kind === 'real') {
    if (!(g.sigmaSPerM > 0 && g.sigmaSPerM <= 10)) fail(`ground conductivity must be above 0 and at most 10 S/m (got ${g.sigmaSPerM})`);
    if (!(g.epsR >= 1 && g.epsR <= 100)) fail(`ground relative permittivity must be 1–100 (got ${g.epsR})`);
  }
  if (input.lengthM !== undefined && !(Number.isFinite(input.lengthM) && input.lengthM > 0 && input.lengthM <= 1000)) {
    fail(`wire length must be above 0 and at most 1000 m (got ${input.lengthM})`);
  }
  if (input.apexDeg !== undefined && !(input.apexDeg >= 30 && input.apexDeg <= 180)) fail(`apex angle must be 30–180° (got ${input.apexDeg})`);
  if (input.wireDiameterM !== undefined && !(input.wireDiameterM > 0 && input.wireDiameterM <= 0.05)) {
    fail(`wire diameter must be above 0 and at most 0.05 m (got ${input.wireDiameterM})`);
  }
  if (input.endHeightsM !== undefined) {
    if (input.shape !== 'flat') fail('end heights apply to a flat-top; an inverted-V takes apexDeg');
    const [a, b] = input.endHeightsM;
    if (!(a > 0 && b > 0 && Number.isFinite(a) && Number.isFinite(b))) fail('end heights must be above 0 m');
  }
}
