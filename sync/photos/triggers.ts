/* The browser events that start an upload run: the same ones the record sync uses (sync/engine/triggers.ts). */
export { browserTriggerEnv, type TriggerEnv } from '../engine/triggers';
