// /api/clubs/:clubId/sites: the places a club surveys (name, reference point, ground, notes, rules).
import type { Router } from 'express';
import type { AppDeps } from '../../app-deps';
import { RecordRepository } from './record-repository';
import { listQuerySchema, recordRouter } from './record-router';
import { RecordService } from './record-service';

export function sitesRouter(deps: AppDeps): Router {
  const repo = new RecordRepository(deps.dataSource, 'sites', { createdAt: 'DESC' });
  return recordRouter(deps, 'sites', new RecordService(deps.dataSource, repo, deps.clock), listQuerySchema());
}
