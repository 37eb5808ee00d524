// /api/clubs/:clubId/events: field-day outings at one of the club's sites. Latest outing first.
import type { Router } from 'express';
import type { AppDeps } from '../../app-deps';
import { AppError } from '../../http/errors';
import { RecordRepository } from '../sites/record-repository';
import { listQuerySchema, recordRouter } from '../sites/record-router';
import { RecordService, type FieldGuard } from '../sites/record-service';

export function eventsRouter(deps: AppDeps): Router {
  const sites = new RecordRepository(deps.dataSource, 'sites', {});
  /** An event happens at one of this club's sites that has not been deleted. */
  const siteOfClub: FieldGuard<'events'> = async (manager, clubId, fields) => {
    const site = await sites.find(manager, clubId, fields.siteId);
    if (!site || site.deletedAt) {
      throw new AppError('site_not_found', 'invalid', 'siteId: no such site in this club', { issues: [{ path: 'siteId', message: 'no such site in this club' }] });
    }
  };
  const repo = new RecordRepository(deps.dataSource, 'events', { startsOn: 'DESC', createdAt: 'DESC' });
  return recordRouter(deps, 'events', new RecordService(deps.dataSource, repo, deps.clock, siteOfClub), listQuerySchema(['siteId']));
}
