CREATE TABLE "stated_bid_answers" (
	"interview_id" uuid NOT NULL,
	"study_id" uuid NOT NULL,
	"questionnaire_version_id" uuid NOT NULL,
	"block_id" text NOT NULL,
	"block_rank" smallint NOT NULL,
	"respondent_key" text,
	"enumerator_id" uuid,
	"route_id" uuid,
	"point_id" uuid,
	"finished_at" timestamp with time zone NOT NULL,
	"status" "interview_status" NOT NULL,
	"flagged" boolean NOT NULL,
	"income_band" text,
	"household_people" integer,
	"bounds" text NOT NULL,
	"bid_minor" bigint NOT NULL,
	"yes" boolean NOT NULL,
	"bid2_minor" bigint,
	"yes2" boolean,
	CONSTRAINT "stated_bid_answers_interview_id_block_id_pk" PRIMARY KEY("interview_id","block_id")
);
--> statement-breakpoint
CREATE TABLE "stated_card_intervals" (
	"interview_id" uuid NOT NULL,
	"study_id" uuid NOT NULL,
	"questionnaire_version_id" uuid NOT NULL,
	"block_id" text NOT NULL,
	"block_rank" smallint NOT NULL,
	"respondent_key" text,
	"enumerator_id" uuid,
	"route_id" uuid,
	"point_id" uuid,
	"finished_at" timestamp with time zone NOT NULL,
	"status" "interview_status" NOT NULL,
	"flagged" boolean NOT NULL,
	"income_band" text,
	"household_people" integer,
	"lower_minor" bigint NOT NULL,
	"upper_minor" bigint,
	CONSTRAINT "stated_card_intervals_interview_id_block_id_pk" PRIMARY KEY("interview_id","block_id")
);
--> statement-breakpoint
CREATE TABLE "stated_interviews" (
	"interview_id" uuid PRIMARY KEY NOT NULL,
	"study_id" uuid NOT NULL,
	"route_id" uuid,
	"point_id" uuid,
	"finished_at" timestamp with time zone NOT NULL,
	"status" "interview_status" NOT NULL,
	"flagged" boolean NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stated_ladder_steps" (
	"interview_id" uuid NOT NULL,
	"study_id" uuid NOT NULL,
	"questionnaire_version_id" uuid NOT NULL,
	"block_id" text NOT NULL,
	"block_rank" smallint NOT NULL,
	"respondent_key" text,
	"enumerator_id" uuid,
	"route_id" uuid,
	"point_id" uuid,
	"finished_at" timestamp with time zone NOT NULL,
	"status" "interview_status" NOT NULL,
	"flagged" boolean NOT NULL,
	"income_band" text,
	"household_people" integer,
	"scale" text NOT NULL,
	"price_minor" bigint NOT NULL,
	"response" smallint NOT NULL,
	CONSTRAINT "stated_ladder_steps_interview_id_block_id_price_minor_pk" PRIMARY KEY("interview_id","block_id","price_minor")
);
--> statement-breakpoint
CREATE TABLE "stated_thresholds" (
	"interview_id" uuid NOT NULL,
	"study_id" uuid NOT NULL,
	"questionnaire_version_id" uuid NOT NULL,
	"block_id" text NOT NULL,
	"block_rank" smallint NOT NULL,
	"respondent_key" text,
	"enumerator_id" uuid,
	"route_id" uuid,
	"point_id" uuid,
	"finished_at" timestamp with time zone NOT NULL,
	"status" "interview_status" NOT NULL,
	"flagged" boolean NOT NULL,
	"income_band" text,
	"household_people" integer,
	"too_cheap_minor" bigint NOT NULL,
	"cheap_minor" bigint NOT NULL,
	"expensive_minor" bigint NOT NULL,
	"too_expensive_minor" bigint NOT NULL,
	"likelihood_cheap" smallint,
	"likelihood_expensive" smallint,
	CONSTRAINT "stated_thresholds_interview_id_block_id_pk" PRIMARY KEY("interview_id","block_id")
);
--> statement-breakpoint
CREATE TABLE "stated_wtp_amounts" (
	"interview_id" uuid NOT NULL,
	"study_id" uuid NOT NULL,
	"questionnaire_version_id" uuid NOT NULL,
	"block_id" text NOT NULL,
	"block_rank" smallint NOT NULL,
	"respondent_key" text,
	"enumerator_id" uuid,
	"route_id" uuid,
	"point_id" uuid,
	"finished_at" timestamp with time zone NOT NULL,
	"status" "interview_status" NOT NULL,
	"flagged" boolean NOT NULL,
	"income_band" text,
	"household_people" integer,
	"amount_minor" bigint NOT NULL,
	CONSTRAINT "stated_wtp_amounts_interview_id_block_id_pk" PRIMARY KEY("interview_id","block_id")
);
--> statement-breakpoint
CREATE INDEX "stated_bid_answers_study" ON "stated_bid_answers" USING btree ("study_id","block_rank","block_id");--> statement-breakpoint
CREATE INDEX "stated_card_intervals_study" ON "stated_card_intervals" USING btree ("study_id","block_rank","block_id");--> statement-breakpoint
CREATE INDEX "stated_interviews_study" ON "stated_interviews" USING btree ("study_id","status");--> statement-breakpoint
CREATE INDEX "stated_ladder_steps_study" ON "stated_ladder_steps" USING btree ("study_id","block_rank","block_id");--> statement-breakpoint
CREATE INDEX "stated_thresholds_study" ON "stated_thresholds" USING btree ("study_id","block_rank","block_id");--> statement-breakpoint
CREATE INDEX "stated_wtp_amounts_study" ON "stated_wtp_amounts" USING btree ("study_id","block_rank","block_id");--> statement-breakpoint
-- Typed analysis rows are derived from an interview's answers and the blocks of its
-- questionnaire version, set by set: one function writes them for any list of interviews,
-- called by the statement-level triggers below (sync's COPY or INSERT, a correction's UPDATE,
-- fixtures and seeds alike, always in the statement that stores the interview) and once here
-- for every interview already stored; deleting interviews deletes their rows (the last trigger).
CREATE FUNCTION write_stated_answer_rows(ids uuid[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  -- IN (SELECT unnest(…)) rather than = ANY (…): a hashed semi-join, not a scan of the whole
  -- list for every row (a batch or a backfill passes many ids).
  DELETE FROM stated_interviews WHERE interview_id IN (SELECT unnest(ids));
  DELETE FROM stated_ladder_steps WHERE interview_id IN (SELECT unnest(ids));
  DELETE FROM stated_thresholds WHERE interview_id IN (SELECT unnest(ids));
  DELETE FROM stated_wtp_amounts WHERE interview_id IN (SELECT unnest(ids));
  DELETE FROM stated_card_intervals WHERE interview_id IN (SELECT unnest(ids));
  DELETE FROM stated_bid_answers WHERE interview_id IN (SELECT unnest(ids));

  INSERT INTO stated_interviews
  SELECT id, study_id, route_id, point_id, finished_at, status, flags <> '[]'::jsonb
  FROM interviews WHERE id IN (SELECT unnest(ids));

  CREATE TEMP TABLE IF NOT EXISTS stated_answered_blocks (
    interview_id uuid, study_id uuid, questionnaire_version_id uuid, block_id text,
    block_rank smallint, kind text, block jsonb, answer jsonb, respondent_key text,
    enumerator_id uuid, route_id uuid, point_id uuid, finished_at timestamptz,
    status interview_status, flagged boolean, income_band text, household_people integer
  ) ON COMMIT DROP;
  TRUNCATE stated_answered_blocks;

  -- The blocks of each version once (a definition is read once, not once per interview), with
  -- each block's rank among the blocks of its kind, and the first income-band and
  -- household-size blocks that raking reads.
  WITH iv AS (
    SELECT * FROM interviews WHERE id IN (SELECT unnest(ids))
  ), version_blocks AS (
    SELECT qv.id AS version_id, b.block, b.ord,
           (row_number() OVER (PARTITION BY qv.id, b.block->>'kind' ORDER BY b.ord) - 1)::smallint AS block_rank
    FROM questionnaire_versions qv
    CROSS JOIN LATERAL jsonb_array_elements(qv.definition->'blocks') WITH ORDINALITY AS b(block, ord)
    WHERE qv.id IN (SELECT DISTINCT questionnaire_version_id FROM iv)
  ), profile_blocks AS (
    SELECT version_id,
           max(block->>'id') FILTER (WHERE block->>'kind' = 'income-band' AND block_rank = 0) AS income_id,
           (array_agg(block) FILTER (WHERE block->>'kind' = 'income-band' AND block_rank = 0))[1] AS income_block,
           max(block->>'id') FILTER (WHERE block->>'kind' = 'household-size' AND block_rank = 0) AS household_id
    FROM version_blocks GROUP BY version_id
  ), profiles AS (
    SELECT iv.id,
           (SELECT band->>'value' FROM jsonb_array_elements(pb.income_block->'bands') AS band
             WHERE band->'value' = iv.answers->pb.income_id->'band' LIMIT 1) AS income_band,
           CASE WHEN jsonb_typeof(iv.answers->pb.household_id->'people') = 'number'
                THEN (iv.answers->pb.household_id->>'people')::integer END AS household_people
    FROM iv JOIN profile_blocks pb ON pb.version_id = iv.questionnaire_version_id
  )
  INSERT INTO stated_answered_blocks
  SELECT iv.id, iv.study_id, iv.questionnaire_version_id, vb.block->>'id', vb.block_rank,
         vb.block->>'kind', vb.block, iv.answers->(vb.block->>'id'), iv.respondent_key,
         iv.enumerator_id, iv.route_id, iv.point_id, iv.finished_at,
         iv.status, iv.flags <> '[]'::jsonb, p.income_band, p.household_people
  FROM iv
  JOIN version_blocks vb ON vb.version_id = iv.questionnaire_version_id
  JOIN profiles p ON p.id = iv.id
  WHERE vb.block->>'kind' IN ('price-ladder', 'price-thresholds', 'wtp-open', 'payment-card', 'dichotomous-choice')
    AND jsonb_typeof(iv.answers->(vb.block->>'id')) IS DISTINCT FROM 'null'
    AND iv.answers ? (vb.block->>'id');

  INSERT INTO stated_ladder_steps
  SELECT a.interview_id, a.study_id, a.questionnaire_version_id, a.block_id, a.block_rank,
         a.respondent_key, a.enumerator_id, a.route_id, a.point_id, a.finished_at,
         a.status, a.flagged, a.income_band, a.household_people, a.block->>'scale',
         (step->>'priceMinor')::bigint,
         CASE WHEN jsonb_typeof(step->'response') = 'number' THEN (step->>'response')::smallint
              WHEN step->>'response' = 'yes' THEN 1 ELSE 0 END
  FROM stated_answered_blocks a
  CROSS JOIN LATERAL jsonb_array_elements(a.answer->'steps') AS step
  WHERE a.kind = 'price-ladder';

  INSERT INTO stated_thresholds
  SELECT a.interview_id, a.study_id, a.questionnaire_version_id, a.block_id, a.block_rank,
         a.respondent_key, a.enumerator_id, a.route_id, a.point_id, a.finished_at,
         a.status, a.flagged, a.income_band, a.household_people,
         (a.answer->>'tooCheapMinor')::bigint, (a.answer->>'cheapMinor')::bigint,
         (a.answer->>'expensiveMinor')::bigint, (a.answer->>'tooExpensiveMinor')::bigint,
         (a.answer->>'likelihoodCheap')::smallint, (a.answer->>'likelihoodExpensive')::smallint
  FROM stated_answered_blocks a WHERE a.kind = 'price-thresholds';

  INSERT INTO stated_wtp_amounts
  SELECT a.interview_id, a.study_id, a.questionnaire_version_id, a.block_id, a.block_rank,
         a.respondent_key, a.enumerator_id, a.route_id, a.point_id, a.finished_at,
         a.status, a.flagged, a.income_band, a.household_people, (a.answer->>'amountMinor')::bigint
  FROM stated_answered_blocks a WHERE a.kind = 'wtp-open';

  -- The card interval: from the highest amount they would pay up to the next amount on the
  -- card (open above the top amount); "none of them" is [0, first amount).
  INSERT INTO stated_card_intervals
  SELECT a.interview_id, a.study_id, a.questionnaire_version_id, a.block_id, a.block_rank,
         a.respondent_key, a.enumerator_id, a.route_id, a.point_id, a.finished_at,
         a.status, a.flagged, a.income_band, a.household_people,
         CASE WHEN k.k < 0 THEN 0 ELSE (a.block->'amountsMinor'->>k.k)::bigint END,
         (a.block->'amountsMinor'->>(k.k + 1))::bigint
  FROM stated_answered_blocks a
  CROSS JOIN LATERAL (
    SELECT coalesce((SELECT (o - 1)::int FROM jsonb_array_elements(a.block->'amountsMinor') WITH ORDINALITY AS x(v, o)
                      WHERE x.v = a.answer->'highestYesMinor' ORDER BY o LIMIT 1), -1) AS k
  ) k
  WHERE a.kind = 'payment-card';

  INSERT INTO stated_bid_answers
  SELECT a.interview_id, a.study_id, a.questionnaire_version_id, a.block_id, a.block_rank,
         a.respondent_key, a.enumerator_id, a.route_id, a.point_id, a.finished_at,
         a.status, a.flagged, a.income_band, a.household_people, a.block->>'bounds',
         (a.answer->>'bidMinor')::bigint, a.answer->>'firstResponse' = 'yes',
         CASE WHEN a.block->>'bounds' = 'double' THEN (a.answer->>'followUpMinor')::bigint END,
         CASE WHEN a.block->>'bounds' = 'double' AND a.answer ? 'secondResponse'
              THEN a.answer->>'secondResponse' = 'yes' END
  FROM stated_answered_blocks a WHERE a.kind = 'dichotomous-choice';
END;
$$;
--> statement-breakpoint
CREATE FUNCTION interviews_write_stated_answer_rows() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM write_stated_answer_rows(ARRAY(SELECT id FROM changed_interviews));
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER interviews_stated_answer_rows_insert AFTER INSERT ON interviews
  REFERENCING NEW TABLE AS changed_interviews
  FOR EACH STATEMENT EXECUTE FUNCTION interviews_write_stated_answer_rows();
--> statement-breakpoint
-- A correction replaces the answers (and may move the interview): its rows are written again.
-- Review changes the status (and so what filters match): the rows are written again too. An
-- update that leaves every copied column alone (a note, a photo arriving) rewrites nothing.
CREATE FUNCTION interviews_rewrite_stated_answer_rows() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM write_stated_answer_rows(ARRAY(
    SELECT n.id FROM changed_interviews n JOIN previous_interviews o ON o.id = n.id
    WHERE (n.answers, n.questionnaire_version_id, n.study_id, n.route_id, n.point_id,
           n.enumerator_id, n.finished_at, n.respondent_key, n.status, n.flags)
      IS DISTINCT FROM (o.answers, o.questionnaire_version_id, o.study_id, o.route_id,
           o.point_id, o.enumerator_id, o.finished_at, o.respondent_key, o.status, o.flags)));
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER interviews_stated_answer_rows_update AFTER UPDATE ON interviews
  REFERENCING OLD TABLE AS previous_interviews NEW TABLE AS changed_interviews
  FOR EACH STATEMENT EXECUTE FUNCTION interviews_rewrite_stated_answer_rows();
--> statement-breakpoint
CREATE FUNCTION interviews_delete_stated_answer_rows() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  DELETE FROM stated_interviews WHERE interview_id IN (SELECT id FROM removed_interviews);
  DELETE FROM stated_ladder_steps WHERE interview_id IN (SELECT id FROM removed_interviews);
  DELETE FROM stated_thresholds WHERE interview_id IN (SELECT id FROM removed_interviews);
  DELETE FROM stated_wtp_amounts WHERE interview_id IN (SELECT id FROM removed_interviews);
  DELETE FROM stated_card_intervals WHERE interview_id IN (SELECT id FROM removed_interviews);
  DELETE FROM stated_bid_answers WHERE interview_id IN (SELECT id FROM removed_interviews);
  RETURN NULL;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER interviews_stated_answer_rows_delete AFTER DELETE ON interviews
  REFERENCING OLD TABLE AS removed_interviews
  FOR EACH STATEMENT EXECUTE FUNCTION interviews_delete_stated_answer_rows();
--> statement-breakpoint
SELECT write_stated_answer_rows(ARRAY(SELECT id FROM interviews));
