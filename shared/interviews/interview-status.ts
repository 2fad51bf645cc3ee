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

/** How each review state is named on screen. */
export const interviewStatusLabels: Readonly<Record<InterviewStatus, string>> = {
  received: 'Received',
  flagged: 'Flagged',
  accepted: 'Accepted',
  returned: 'Returned',
  rejected: 'Rejected',
};
