import { z } from 'zod';
import {
  scheduleVersionSchema,
  scheduleVersionSummarySchema,
} from '@shared/analysis/schedule-version';
import { apiErrorSchema } from '@shared/http/api-error';

const schema = (s: z.ZodType) =>
  z.toJSONSchema(s, { target: 'draft-2020-12', io: 'output', unrepresentable: 'any' });

const errors = {
  '401': {
    description: 'No valid access token (missing, unknown or revoked).',
    content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } },
  },
  '404': {
    description: 'No such published version among your studies.',
    content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } },
  },
};

const versionId = {
  name: 'versionId',
  in: 'path',
  required: true,
  schema: { type: 'string', format: 'uuid' },
};

/**
 * The OpenAPI 3.1 description of the read API, its schemas generated from the same zod schemas
 * the server answers with.
 */
export function openApiDocument(appUrl: string) {
  return {
    openapi: '3.1.0',
    info: {
      title: 'Fieldcurve read API',
      version: '1.0.0',
      description:
        'Published demand schedules of the studies shared with you, for your own planning tools. ' +
        'Issue and revoke access tokens in the Fieldcurve portal. Every figure is an estimate with ' +
        'an interval, not advice.',
    },
    servers: [{ url: `${appUrl}/api/v1` }],
    security: [{ accessToken: [] }],
    paths: {
      '/schedules': {
        get: {
          operationId: 'listSchedules',
          summary: 'Published schedule versions of your studies, newest first',
          responses: {
            '200': {
              description: 'The versions.',
              content: {
                'application/json': {
                  schema: {
                    type: 'array',
                    items: { $ref: '#/components/schemas/ScheduleVersionSummary' },
                  },
                },
              },
            },
            '401': errors['401'],
          },
        },
      },
      '/schedules/{versionId}': {
        get: {
          operationId: 'getSchedule',
          summary: 'One published schedule version with its rows',
          parameters: [versionId],
          responses: {
            '200': {
              description: 'The version.',
              content: {
                'application/json': { schema: { $ref: '#/components/schemas/ScheduleVersion' } },
              },
            },
            ...errors,
          },
        },
      },
      '/schedules/{versionId}.csv': {
        get: {
          operationId: 'getScheduleCsv',
          summary:
            'One published schedule version as CSV (header row first; a final Note column says the figures are estimates)',
          parameters: [versionId],
          responses: {
            '200': {
              description: 'The schedule as CSV.',
              content: { 'text/csv': { schema: { type: 'string' } } },
            },
            ...errors,
          },
        },
      },
    },
    components: {
      securitySchemes: {
        accessToken: {
          type: 'http',
          scheme: 'bearer',
          description: 'A token issued in the portal.',
        },
      },
      schemas: {
        ScheduleVersionSummary: schema(scheduleVersionSummarySchema),
        ScheduleVersion: schema(scheduleVersionSchema),
        Error: schema(apiErrorSchema),
      },
    },
  };
}
