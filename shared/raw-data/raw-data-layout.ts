import { qualityFlagKinds } from '../field-sync/quality/quality-flag';
import { interviewStatuses } from '../interviews/interview-status';
import type { Block } from '../questionnaire/block';
import { answerParts, type AnswerPart } from './answer-parts';
import type { RawColumn } from './raw-data-column';

/** The facts of an interview every download has, before its answers. */
export const interviewColumns: readonly RawColumn[] = [
  fixed('interview_id', 'uuid', 'Id the device gave the interview'),
  fixed('questionnaire_version', 'integer', 'Version of the questionnaire it was taken with'),
  fixed('review_state', 'text', 'Where the interview stands in review', null, interviewStatuses),
  fixed('review_note', 'text', 'Note the reviewer left'),
  fixed('reviewed_at', 'timestamp', 'When it was last reviewed (UTC)'),
  fixed('route_id', 'uuid', 'Route it was taken on'),
  fixed('route_name', 'text', 'Name of that route'),
  fixed('point_id', 'uuid', 'Sampling point it was taken at'),
  fixed('point_code', 'text', 'Code of that point'),
  fixed('point_name', 'text', 'Name of that point'),
  fixed('region', 'text', "The point's stratum"),
  fixed('enumerator_id', 'uuid', 'Enumerator who took it'),
  fixed('enumerator_name', 'text', "That enumerator's name"),
  fixed('started_at', 'timestamp', 'When the interview started (UTC)'),
  fixed('finished_at', 'timestamp', 'When it finished (UTC)'),
  fixed('received_at', 'timestamp', 'When the server received it (UTC)'),
  fixed('duration', 'number', 'Finished minus started', 'seconds'),
  fixed('latitude', 'number', 'Where the device stood at the end (WGS 84)', 'degrees'),
  fixed('longitude', 'number', 'Where the device stood at the end (WGS 84)', 'degrees'),
  fixed('gps_accuracy', 'number', 'Accuracy the device reported for that position', 'metres'),
  ...qualityFlagKinds.map((kind) =>
    fixed(`flag.${kind}`, 'boolean', `Quality check “${kind}” flagged it`),
  ),
  fixed('photos_expected', 'integer', 'Photos the interview refers to'),
  fixed('photos_stored', 'integer', 'Of those, photos stored on the server'),
];

/** The raking weight's column, present when a weighting is chosen. */
export const weightColumn: RawColumn = fixed(
  'weight',
  'number',
  'Raking weight to the chosen margins, scaled to sum to the number of interviews downloaded',
);

function fixed(
  name: string,
  type: RawColumn['type'],
  description: string,
  unit: string | null = null,
  allowed: readonly string[] | null = null,
): RawColumn {
  return { name, type, description, unit, allowed, questionnaireVersions: null };
}

/** One questionnaire version the study's interviews were taken with. */
export interface LayoutVersion {
  readonly id: string;
  readonly number: number;
  readonly blocks: readonly Block[];
}

/** Where one answer part of one version goes in the row. */
export interface PlacedPart {
  readonly column: number;
  readonly blockId: string;
  readonly part: AnswerPart;
}

export interface RawDataLayout {
  readonly columns: readonly RawColumn[];
  /** Per questionnaire version id, the answer parts it fills and their column positions. */
  readonly partsByVersion: ReadonlyMap<string, readonly PlacedPart[]>;
  readonly weighted: boolean;
}

/**
 * The columns of a download: the interview's facts, one column per answer part (`block.field`)
 * over every version given (a block kept across versions keeps its column; the dictionary says
 * which versions have it), then the weight when weighted.
 */
export function rawDataLayout(
  versions: readonly LayoutVersion[],
  currency: string,
  digits: number,
  weighted: boolean,
): RawDataLayout {
  const columns: RawColumn[] = [...interviewColumns];
  const positions = new Map<string, number>();
  const versionsOf = new Map<number, number[]>();
  const partsByVersion = new Map<string, PlacedPart[]>();
  const ordered = [...versions].sort((a, b) => b.number - a.number);
  for (const version of ordered) {
    const placed: PlacedPart[] = [];
    for (const block of version.blocks) {
      for (const part of answerParts(block, currency, digits)) {
        const name = `${block.id}.${part.field}`;
        let column = positions.get(name);
        if (column === undefined) {
          column = columns.length;
          positions.set(name, column);
          versionsOf.set(column, []);
          columns.push({
            name,
            type: part.type,
            description: `${block.prompt.trim()} — ${part.description}`,
            unit: part.unit,
            allowed: part.allowed,
            questionnaireVersions: [],
          });
        }
        versionsOf.get(column)!.push(version.number);
        placed.push({ column, blockId: block.id, part });
      }
    }
    partsByVersion.set(version.id, placed);
  }
  for (const [column, numbers] of versionsOf) {
    columns[column] = { ...columns[column], questionnaireVersions: numbers.sort((a, b) => a - b) };
  }
  if (weighted) columns.push(weightColumn);
  return { columns, partsByVersion, weighted };
}
