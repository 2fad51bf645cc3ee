/** Where a fit job stands: waiting for a worker, running, done with a result, or failed. */
export const fitStatuses = ['queued', 'running', 'done', 'failed'] as const;
export type FitStatus = (typeof fitStatuses)[number];
