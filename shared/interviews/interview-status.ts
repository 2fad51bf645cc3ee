/**
 * Where an interview stands after it reached the server: received and checked automatically, then
 * accepted, flagged for review, returned to the enumerator with a note, or rejected.
 */
export const interviewStatuses = [
  'received',
  'flagged',
  'accepted',
  'returned',
  'rejected',
] as const;
export type InterviewStatus = (typeof interviewStatuses)[number];
