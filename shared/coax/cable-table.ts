import type { SiteCoax } from '../schemas/site-file';

export type CoaxType = SiteCoax['type'];

/**
 * Matched loss per 100 ft at 30 MHz, ARRL General Class License Manual Table 6-1 (see REFERENCES.md).
 * RG-8 and RG-213 share a row. LMR-400 has no row there: Loftline has no sourced figure for it and
 * reports its loss as unknown rather than guess.
 */
export const COAX_LOSS_DB_PER_100FT_AT_30MHZ: Record<CoaxType, number | null> = {
  'RG-8': 1.08,
  'RG-213': 1.08,
  'RG-8X': 1.96,
  'RG-58': 2.47,
  'RG-174': 4.56,
  'LMR-400': null,
};
export const COAX_TABLE_SOURCE = 'ARRL General Class License Manual, Table 6-1 (matched loss at 30 MHz)';
