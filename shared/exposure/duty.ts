import type { SiteStation } from '../schemas/site-file';

/**
 * Mode duty factors for average power (FCC OET Bulletin 65 Supplement B, Table 1; recalled from memory,
 * see REFERENCES.md): conversational SSB 20 %, CW 40 %, FM and digital modes 100 %.
 */
export const MODE_DUTY_FACTOR: Record<SiteStation['mode'], number> = { ssb: 0.2, cw: 0.4, digital: 1.0, fm: 1.0 };
export const DUTY_SOURCE = 'FCC OET Bulletin 65 Supplement B, Table 1 (from memory)';
