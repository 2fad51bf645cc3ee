import { randomUUID } from 'node:crypto';
import { fieldInterview } from '../field-setup';
import { commonSpec } from '../fit-specs';
import { smallDefinition, validStudy } from '../study-agents';
import type { FuzzContext } from './fuzz-context';

/**
 * A well-formed body for every state-changing API route, keyed `METHOD path` exactly as the
 * access policy lists it. The write-route fuzzer fails for a route missing here, so a new
 * write route cannot escape it: add its sample when adding the route.
 */
export const sampleBodies: Record<string, (context: FuzzContext) => unknown> = {
  'PUT /api/members/:userId/roles': () => ({ roles: ['enumerator'] }),
  'POST /api/invitations': () => ({
    email: `invited.${randomUUID().slice(0, 8)}@example.test`,
    name: 'Wanjiru Otieno',
    roles: ['enumerator'],
  }),
  'DELETE /api/invitations/:invitationId': () => undefined,
  'POST /api/studies': () => validStudy,
  'PATCH /api/studies/:studyId': () => ({ market: 'Households in an invented river town' }),
  'POST /api/studies/:studyId/status': () => ({ status: 'in_field' }),
  'PUT /api/studies/:studyId/members/:userId': () => ({ roles: ['enumerator'] }),
  'DELETE /api/studies/:studyId/members/:userId': () => undefined,
  'POST /api/studies/:studyId/questionnaires': () => ({ title: 'Second wave' }),
  'PUT /api/studies/:studyId/questionnaires/:questionnaireId/draft': () => ({
    definition: smallDefinition,
  }),
  'POST /api/studies/:studyId/questionnaires/:questionnaireId/new-draft': () => undefined,
  'PUT /api/studies/:studyId/questionnaires/:questionnaireId/versions/:version': () => ({
    definition: smallDefinition,
  }),
  'POST /api/studies/:studyId/questionnaires/:questionnaireId/versions/:version/publish': () =>
    undefined,
  'POST /api/studies/:studyId/sampling-points/import': () => ({
    csv: 'point_code,point_name,point_kind,latitude,longitude,stratum,notes\nK-901,Riverside kiosk,kiosk,-1.2001,36.8002,North,By the bridge',
  }),
  'POST /api/studies/:studyId/routes': ({ setup }) => ({
    name: 'Market loop',
    stops: [{ pointId: setup.points[0].id, quota: 5 }],
    windowStart: '2027-03-01',
    windowEnd: '2027-03-14',
  }),
  'PUT /api/studies/:studyId/routes/:routeId': ({ setup }) => ({
    name: 'Market loop, revised',
    stops: setup.points.map((point) => ({ pointId: point.id, quota: 4 })),
    windowStart: '2027-03-01',
    windowEnd: '2027-03-21',
  }),
  'DELETE /api/studies/:studyId/routes/:routeId': () => undefined,
  'PUT /api/studies/:studyId/routes/:routeId/assignment': ({ setup }) => ({
    enumeratorId: setup.organisation.people.enumerator.userId,
  }),
  'POST /api/field/sync': ({ setup }) => ({ interviews: [fieldInterview(setup)] }),
  'PUT /api/field/photos/:photoId': () => ({ bytes: 'not an image' }),
  'POST /api/studies/:studyId/interviews/:interviewId/review': () => ({
    action: 'return',
    note: 'Please record the shelf price again.',
  }),
  'POST /api/studies/:studyId/fits': () => ({
    spec: {
      method: 'price-ladder',
      ...commonSpec,
      blockId: 'ladder',
    },
  }),
  'POST /api/studies/:studyId/schedules': () => ({
    fitId: randomUUID(),
    title: 'Water filter schedule, first wave',
  }),
  'POST /api/portal/tokens': () => ({ name: 'Pricing dashboard' }),
  'DELETE /api/portal/tokens/:tokenId': () => undefined,
  'POST /api/studies/:studyId/review/accept': ({ interviewId }) => ({
    interviewIds: [interviewId],
  }),
  'POST /api/members/:userId/deactivate': () => undefined,
  'POST /api/members/:userId/reactivate': () => undefined,
  'POST /api/session/sign-out-everywhere': () => ({}),
  'POST /api/studies/:studyId/devices/:deviceId/sign-out': () => ({}),
  'DELETE /api/admin/tokens/:tokenId': () => undefined,
  'POST /api/studies/:studyId/dataset-uploads': () => ({
    fileName: 'outlet-sales.csv',
    totalBytes: 2048,
  }),
  'PUT /api/studies/:studyId/dataset-uploads/:uploadId': () => ({ bytes: 'price,quantity' }),
  'POST /api/studies/:studyId/datasets': () => ({
    uploadId: randomUUID(),
    name: 'Outlet sales by week',
    columns: [
      { source: 'Price', name: 'price', role: 'price', type: 'number' },
      { source: 'Units', name: 'units', role: 'quantity', type: 'number' },
    ],
  }),
  'DELETE /api/studies/:studyId/datasets/:datasetId': () => undefined,
  'POST /api/studies/:studyId/datasets/:datasetId/fits': () => ({
    spec: {
      form: 'log-log',
      covariates: [],
      fixedEffects: [],
      weighted: false,
      standardErrors: { type: 'hc1' },
      instruments: [],
      confidenceLevel: 0.95,
    },
  }),
};
