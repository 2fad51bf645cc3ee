import { sql, type SQL } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/node-postgres';
import type { Database } from '../../server/db/database';
import {
  bidLevels,
  cardAmounts,
  ladderPrices,
} from '../../server/demo/lantern/lantern-questionnaires';

/**
 * The invented truth behind a seeded stated-preference study: every respondent has a
 * willingness to pay W drawn from a logistic distribution (median 1500 KES, scale 300) and
 * answers every stated question consistently with it.
 */
export const seededTruth = { median: 1500, scale: 300 } as const;

const numbers = (values: readonly number[]) => sql.raw(`ARRAY[${values.join(',')}]::numeric[]`);

/** The columns every typed row repeats from its interview (see stated-answer-rows). */
const common = sql.raw(`interview_id, study_id, questionnaire_version_id, block_id, block_rank,
  respondent_key, enumerator_id, route_id, point_id, finished_at, status, flagged, income_band,
  household_people`);
const commonValues = (blockId: string) =>
  sql`r.id, r.study_id, r.version_id, ${blockId}, 0, NULL, NULL, NULL, r.point_id, r.finished_at,
    'accepted'::interview_status, false, r.income_band, r.household_people`;

/**
 * Adds `count` accepted household interviews of the demo household questionnaire to a study,
 * set by set (generate_series), straight into the interview table and the typed analysis
 * tables — the answers a million interviews would have left there, without passing a million
 * answer documents through the trigger that derives them at sync. Each respondent answers from
 * their W:
 * - ladder: yes at every price ≤ W;
 * - thresholds: too cheap 0.4·W, cheap 0.6·W, expensive 0.9·W, too expensive 1.2·W (W kept
 *   within 50…16,000 KES, rounded to 10 KES), likelihoods 4 and 2;
 * - open WTP: W kept within 0…20,000 and rounded to 50 KES;
 * - payment card: from the highest amount ≤ W (0 below the first) to the next amount;
 * - double-bounded bids: the bid of level i mod 5, yes when W ≥ bid, then the follow-up.
 * Seeded: the same seed gives the same answers (interview ids are random).
 */
export async function seedStatedInterviews(
  db: Database,
  study: { studyId: string; versionId: string; pointIds: readonly string[] },
  count: number,
  seed = 0.42,
): Promise<void> {
  const client = await db.$client.connect();
  const run = (query: SQL) => drizzle(client).execute(query);
  const points = sql.raw(`ARRAY[${study.pointIds.map((p) => `'${p}'`).join(',')}]::uuid[]`);
  try {
    await run(sql`SELECT setseed(${seed})`);
    await run(sql`
      CREATE TEMP TABLE seeded_respondents ON COMMIT PRESERVE ROWS AS
      SELECT gen_random_uuid() AS id, i, ${study.studyId}::uuid AS study_id,
        ${study.versionId}::uuid AS version_id, (${points})[1 + i % ${study.pointIds.length}] AS point_id,
        timestamptz '2026-11-02 08:20:00+00' + (i % 30) * interval '1 day' AS finished_at,
        (ARRAY['under-10k','10k-25k','25k-50k','over-50k'])[1 + i % 4] AS income_band,
        1 + i % 6 AS household_people,
        ${seededTruth.median} + ${seededTruth.scale} * ln(u / (1 - u)) AS w
      FROM (SELECT i, 0.000001 + 0.999998 * random() AS u
            FROM generate_series(0, ${count - 1}::int) AS i) d`);
    await run(sql`
      INSERT INTO interviews (id, study_id, questionnaire_version_id, point_id, status, answers,
        flags, started_at, finished_at)
      SELECT id, study_id, version_id, point_id, 'accepted',
        jsonb_build_object('consent', jsonb_build_object('agreed', true)), '[]'::jsonb,
        finished_at - interval '20 minutes', finished_at
      FROM seeded_respondents`);
    await run(sql`
      INSERT INTO stated_ladder_steps (${common}, scale, price_minor, response)
      SELECT ${commonValues('ladder')}, 'yes-no', p * 100, CASE WHEN r.w >= p THEN 1 ELSE 0 END
      FROM seeded_respondents r CROSS JOIN unnest(${numbers(ladderPrices)}) AS p`);
    await run(sql`
      INSERT INTO stated_thresholds (${common}, too_cheap_minor, cheap_minor, expensive_minor,
        too_expensive_minor, likelihood_cheap, likelihood_expensive)
      SELECT ${commonValues('thresholds')}, round(t.wt * 0.4 / 10) * 1000,
        round(t.wt * 0.6 / 10) * 1000, round(t.wt * 0.9 / 10) * 1000,
        round(t.wt * 1.2 / 10) * 1000, 4, 2
      FROM seeded_respondents r CROSS JOIN LATERAL (SELECT greatest(50, least(r.w, 16000)) AS wt) t`);
    await run(sql`
      INSERT INTO stated_wtp_amounts (${common}, amount_minor)
      SELECT ${commonValues('most_pay')}, round(greatest(0, least(r.w, 20000)) / 50) * 5000
      FROM seeded_respondents r`);
    await run(sql`
      INSERT INTO stated_card_intervals (${common}, lower_minor, upper_minor)
      SELECT ${commonValues('card')},
        coalesce((SELECT max(a) FROM unnest(${numbers(cardAmounts)}) AS a WHERE a <= r.w), 0) * 100,
        (SELECT min(a) FROM unnest(${numbers(cardAmounts)}) AS a WHERE a > r.w) * 100
      FROM seeded_respondents r`);
    await run(sql`
      INSERT INTO stated_bid_answers (${common}, bounds, bid_minor, yes, bid2_minor, yes2)
      SELECT ${commonValues('bid')}, 'double', b.bid * 100, r.w >= b.bid, b.bid2 * 100, r.w >= b.bid2
      FROM seeded_respondents r CROSS JOIN LATERAL (
        SELECT bid, CASE WHEN r.w >= bid THEN after_yes ELSE after_no END AS bid2
        FROM (SELECT (${numbers(bidLevels.map((l) => l.bid))})[1 + r.i % ${bidLevels.length}] AS bid,
                     (${numbers(bidLevels.map((l) => l.afterYes))})[1 + r.i % ${bidLevels.length}] AS after_yes,
                     (${numbers(bidLevels.map((l) => l.afterNo))})[1 + r.i % ${bidLevels.length}] AS after_no) l
      ) b`);
  } finally {
    await run(sql`DROP TABLE IF EXISTS seeded_respondents`).catch(() => undefined);
    client.release();
  }
}
