import { Router } from 'express';
import { z } from 'zod';
import type { AppDependencies } from '../app-dependencies';
import { tokenOwnerFrom } from '../auth/bearer-token';
import { validate } from '../http/validate';
import { clientStudyIds } from '../schedules/client-studies';
import { scheduleCsv } from '../schedules/downloads/schedule-csv';
import { downloadName } from '../schedules/downloads/schedule-table';
import { findVersionAmong, listVersions } from '../schedules/schedule-versions-repository';
import { openApiDocument } from './openapi-document';

const idSchema = z.uuid();

/** /api/v1: published schedules of the token owner's studies as JSON or CSV, and the OpenAPI document. */
export function readApiRouter(deps: AppDependencies): Router {
  const router = Router();
  // The owner's client studies, narrowed to the token's restriction when it has one.
  const studiesOf = async (res: Parameters<typeof tokenOwnerFrom>[0]) => {
    const owner = tokenOwnerFrom(res);
    const ids = await clientStudyIds(deps.db, owner);
    return owner.studyIds ? ids.filter((id) => owner.studyIds?.includes(id)) : ids;
  };

  router.get('/v1/openapi.json', (_req, res) => {
    res.json(openApiDocument(deps.config.APP_URL));
  });

  router.get('/v1/schedules', async (_req, res) => {
    res.json(await listVersions(deps.db, await studiesOf(res)));
  });

  router.get('/v1/schedules/:versionId.csv', async (req, res) => {
    const id = validate(idSchema, req.params.versionId, 'version id');
    const version = await findVersionAmong(deps.db, await studiesOf(res), id);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `inline; filename="${downloadName(version, 'csv')}"`);
    res.send(scheduleCsv(version));
  });

  router.get('/v1/schedules/:versionId', async (req, res) => {
    const id = validate(idSchema, req.params.versionId, 'version id');
    res.json(await findVersionAmong(deps.db, await studiesOf(res), id));
  });

  return router;
}
