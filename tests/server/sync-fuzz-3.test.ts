// Seeded convergence fuzz, share 3 of 3 (seeds with seed % 3 === 2); the fuzz itself and how to replay a
// seed are described in tests/sync/harness/fuzz-runner.ts.
import { defineSyncFuzz } from '../sync/harness/fuzz-runner';

defineSyncFuzz(2, 3);
