import { z } from 'zod';

/*
 * The messages between the app and the planning Web Worker (tagged, versioned, parsed on both sides).
 * The worker runs the pure engine (shared/plan) so the screen stays responsive while a plan is computed.
 */
export const PLAN_WORKER_VERSION = 1;

export const planRequestSchema = z.strictObject({
  v: z.literal(PLAN_WORKER_VERSION),
  id: z.number().int(),
  type: z.literal('plan'),
  file: z.unknown(),
});
export type PlanRequest = z.infer<typeof planRequestSchema>;

export const planReplySchema = z.discriminatedUnion('type', [
  z.strictObject({ v: z.literal(PLAN_WORKER_VERSION), id: z.number().int(), type: z.literal('planned'), result: z.unknown() }),
  z.strictObject({ v: z.literal(PLAN_WORKER_VERSION), id: z.number().int(), type: z.literal('failed'), message: z.string() }),
]);
export type PlanReply = z.infer<typeof planReplySchema>;
