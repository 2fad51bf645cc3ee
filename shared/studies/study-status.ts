/** A study moves from draft to in the field to closed. */
export const studyStatuses = ['draft', 'in_field', 'closed'] as const;
export type StudyStatus = (typeof studyStatuses)[number];
