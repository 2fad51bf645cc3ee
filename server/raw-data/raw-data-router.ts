import { GetObjectCommand } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { Router, type Response } from 'express';
import { allInterviews } from '@shared/analysis/interview-filter';
import type { RawCell } from '@shared/raw-data/answer-parts';
import type { RawDataDictionary } from '@shared/raw-data/raw-data-dictionary';
import { rawDataQuerySchema, type RawDataRequest } from '@shared/raw-data/raw-data-request';
import type { AppDependencies } from '../app-dependencies';
import { validate } from '../http/validate';
import { interviewRecords } from './interview-records';
import { rakedCellWeights } from './raked-cell-weights';
import { interviewRowsQuery, rawDataSource, type RawDataSource } from './raw-data-source';
import { rawRow } from './raw-row';
import { streamCsv } from './stream-csv';
import { streamXlsx } from './stream-xlsx';

/**
 * How long a photo link in a download works: a day, so a team can open the file and look
 * through the photos the same day, while a file passed on later no longer opens them.
 */
export const rawPhotoLinkSeconds = 24 * 60 * 60;

const formats = {
  csv: { type: 'text/csv; charset=utf-8', write: streamCsvOf },
  xlsx: {
    type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
    write: streamXlsxOf,
  },
} as const;

/** A study's raw interviews as CSV or XLSX, streamed, and their data dictionary. */
export function rawDataRouter(deps: AppDependencies): Router {
  const router = Router();
  const base = '/studies/:studyId/raw-data';

  router.get(`${base}/dictionary.json`, async (req, res) => {
    const request = requestOf(req.query);
    const source = await rawDataSource(deps.db, req.params.studyId, request);
    res.setHeader('Cache-Control', 'private, no-store');
    res.json(dictionaryOf(source, request));
  });

  for (const [extension, format] of Object.entries(formats)) {
    router.get(`${base}/interviews.${extension}`, async (req, res) => {
      const request = requestOf(req.query);
      const source = await rawDataSource(deps.db, req.params.studyId, request);
      // Raking refuses impossible margins before the first byte goes out, as a 400.
      const weights = request.weighting
        ? await rakedCellWeights(deps.db, source, request.weighting)
        : null;
      res.setHeader('Content-Type', format.type);
      res.setHeader(
        'Content-Disposition',
        `attachment; filename="${fileName(source.study.name)}-interviews.${extension}"`,
      );
      res.setHeader('Cache-Control', 'private, no-store');
      const numbers = new Map(source.versions.map((v) => [v.id, v.number]));
      const photoLink = (key: string) =>
        getSignedUrl(
          deps.storage.client,
          new GetObjectCommand({ Bucket: deps.storage.bucket, Key: key }),
          { expiresIn: rawPhotoLinkSeconds },
        );
      async function* rows(): AsyncGenerator<RawCell[]> {
        for await (const record of interviewRecords(
          deps.db.$client,
          interviewRowsQuery(source.where),
        )) {
          yield rawRow(record, source.layout, numbers.get(record.version_id), photoLink, weights);
        }
      }
      try {
        await format.write(res, source, rows());
      } catch (error) {
        // The header is gone: an incomplete file must not look complete.
        if (!res.headersSent) throw error;
        res.destroy(error instanceof Error ? error : undefined);
      }
    });
  }

  return router;
}

function requestOf(query: unknown): RawDataRequest {
  const parsed = validate(rawDataQuerySchema, query, 'query');
  return { ...parsed, filter: parsed.filter ?? allInterviews };
}

function streamCsvOf(res: Response, source: RawDataSource, rows: AsyncIterable<RawCell[]>) {
  return streamCsv(
    res,
    source.layout.columns.map((c) => c.name),
    rows,
  );
}

function streamXlsxOf(res: Response, source: RawDataSource, rows: AsyncIterable<RawCell[]>) {
  return streamXlsx(res, source.layout.columns, rows);
}

function dictionaryOf(source: RawDataSource, request: RawDataRequest): RawDataDictionary {
  return {
    study: source.study,
    generatedAt: new Date().toISOString(),
    filter: request.filter,
    states: source.states,
    weighting: request.weighting ?? null,
    questionnaireVersions: source.versions.map((v) => ({ id: v.id, number: v.number })),
    photoLinkSeconds: rawPhotoLinkSeconds,
    columns: source.layout.columns,
  };
}

/** The study's name as a file name: letters, digits and dashes. */
function fileName(name: string): string {
  return (
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'study'
  );
}
