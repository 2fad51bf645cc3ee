/** The schema that holds every imported dataset's typed table. */
export const datasetSchema = 'study_data';

/** The typed table of one dataset (the same name the delete trigger of drizzle/0010 drops). */
export function datasetTableName(datasetId: string): string {
  return `dataset_${datasetId.replaceAll('-', '')}`;
}
