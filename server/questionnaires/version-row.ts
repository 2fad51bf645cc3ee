import { sql } from 'drizzle-orm';
import type { QuestionnaireDefinition } from '@shared/questionnaire/questionnaire-definition';
import type {
  QuestionnaireVersion,
  QuestionnaireVersionSummary,
} from '@shared/questionnaire/questionnaire-resource';
import { questionnaireVersions } from '../db/schema';

type VersionRow = typeof questionnaireVersions.$inferSelect;

/** The columns a version list needs; the block count is read in SQL, not by loading content. */
export const versionSummaryColumns = {
  id: questionnaireVersions.id,
  questionnaireId: questionnaireVersions.questionnaireId,
  version: questionnaireVersions.version,
  status: questionnaireVersions.status,
  createdAt: questionnaireVersions.createdAt,
  publishedAt: questionnaireVersions.publishedAt,
  blockCount: sql<number>`jsonb_array_length(${questionnaireVersions.definition} -> 'blocks')`,
};

type SummaryRow = Omit<VersionRow, 'definition' | 'publishedBy'> & { blockCount: number };

export function toVersionSummary(row: SummaryRow): QuestionnaireVersionSummary {
  return {
    id: row.id,
    version: row.version,
    status: row.status,
    createdAt: row.createdAt.toISOString(),
    publishedAt: row.publishedAt?.toISOString() ?? null,
    blockCount: Number(row.blockCount),
  };
}

export function toVersion(row: VersionRow): QuestionnaireVersion {
  const definition = row.definition as QuestionnaireDefinition;
  return {
    ...toVersionSummary({ ...row, blockCount: definition.blocks.length }),
    questionnaireId: row.questionnaireId,
    definition,
  };
}
