import { Router, type Response } from 'express';
import { z } from 'zod';
import {
  publishScheduleRequestSchema,
  type ScheduleVersion,
} from '@shared/analysis/schedule-version';
import type { AppDependencies } from '../app-dependencies';
import { actorOf } from '../auth/actor';
import { validate } from '../http/validate';
import { clientStudyIds } from './client-studies';
import { downloadName } from './downloads/schedule-table';
import { scheduleCsv } from './downloads/schedule-csv';
import { schedulePdf } from './downloads/schedule-pdf';
import { scheduleXlsx } from './downloads/schedule-xlsx';
import { notifyClients } from './notify-clients';
import { publishSchedule } from './publish-schedule';
import { findVersion, listVersions } from './schedule-versions-repository';

const idSchema = z.uuid();

const formats = {
  csv: {
    type: 'text/csv; charset=utf-8',
    build: (v: ScheduleVersion) => Promise.resolve(scheduleCsv(v)),
  },
  xlsx: {
    type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
    build: scheduleXlsx,
  },
  pdf: { type: 'application/pdf', build: schedulePdf },
} as const;

/** Publishing, reading and downloading a study's demand schedule versions. */
export function schedulesRouter(deps: AppDependencies): Router {
  const router = Router();
  const base = '/studies/:studyId/schedules';

  router.post(base, async (req, res) => {
    const request = validate(publishScheduleRequestSchema, req.body);
    const actor = actorOf(res);
    const { studyId } = req.params;
    const id = await publishSchedule(deps.db, studyId, request, {
      userId: actor.userId,
      name: actor.name,
    });
    const version = await findVersion(deps.db, studyId, id);
    const notified = await notifyClients(deps, version);
    res.status(201).json({ ...version, clientsNotified: notified });
  });

  router.get(base, async (req, res) => {
    res.json(await listVersions(deps.db, [req.params.studyId]));
  });

  router.get(`${base}/:versionId`, async (req, res) => {
    res.json(
      await findVersion(
        deps.db,
        req.params.studyId,
        validate(idSchema, req.params.versionId, 'version id'),
      ),
    );
  });

  for (const [extension, format] of Object.entries(formats)) {
    router.get(`${base}/:versionId/download.${extension}`, async (req, res) => {
      const versionId = validate(idSchema, req.params.versionId, 'version id');
      const version = await findVersion(deps.db, req.params.studyId, versionId);
      send(res, format.type, downloadName(version, extension), await format.build(version));
    });
  }

  router.get('/portal/schedules', async (_req, res) => {
    const actor = actorOf(res);
    res.json(await listVersions(deps.db, await clientStudyIds(deps.db, actor)));
  });

  return router;
}

function send(res: Response, type: string, filename: string, body: string | Buffer): void {
  res.setHeader('Content-Type', type);
  res.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
  res.setHeader('Cache-Control', 'private, no-store');
  res.send(body);
}
