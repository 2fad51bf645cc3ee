CREATE TYPE "public"."dataset_fit_status" AS ENUM('queued', 'running', 'done', 'failed');--> statement-breakpoint
CREATE TYPE "public"."dataset_status" AS ENUM('importing', 'imported', 'failed');--> statement-breakpoint
CREATE TABLE "dataset_fits" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"study_id" uuid NOT NULL,
	"dataset_id" uuid,
	"spec" jsonb NOT NULL,
	"status" "dataset_fit_status" DEFAULT 'queued' NOT NULL,
	"progress" integer DEFAULT 0 NOT NULL,
	"result" jsonb,
	"error" jsonb,
	"data_hash" text,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"finished_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "dataset_upload_chunks" (
	"upload_id" uuid NOT NULL,
	"byte_offset" bigint NOT NULL,
	"bytes" "bytea" NOT NULL,
	CONSTRAINT "dataset_upload_chunks_upload_id_byte_offset_pk" PRIMARY KEY("upload_id","byte_offset")
);
--> statement-breakpoint
CREATE TABLE "dataset_uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"study_id" uuid NOT NULL,
	"file_name" text NOT NULL,
	"format" text NOT NULL,
	"total_bytes" bigint NOT NULL,
	"received_bytes" bigint DEFAULT 0 NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	CONSTRAINT "dataset_uploads_bytes" CHECK ("dataset_uploads"."received_bytes" between 0 and "dataset_uploads"."total_bytes")
);
--> statement-breakpoint
CREATE TABLE "datasets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"study_id" uuid NOT NULL,
	"upload_id" uuid,
	"name" text NOT NULL,
	"file_name" text NOT NULL,
	"status" "dataset_status" DEFAULT 'importing' NOT NULL,
	"columns" jsonb NOT NULL,
	"content_hash" text NOT NULL,
	"row_count" bigint DEFAULT 0 NOT NULL,
	"bytes_read" bigint DEFAULT 0 NOT NULL,
	"total_bytes" bigint NOT NULL,
	"problems" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"imported_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"imported_at" timestamp with time zone,
	CONSTRAINT "datasets_content" UNIQUE("study_id","content_hash")
);
--> statement-breakpoint
ALTER TABLE "dataset_fits" ADD CONSTRAINT "dataset_fits_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dataset_fits" ADD CONSTRAINT "dataset_fits_dataset_id_datasets_id_fk" FOREIGN KEY ("dataset_id") REFERENCES "public"."datasets"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dataset_fits" ADD CONSTRAINT "dataset_fits_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dataset_upload_chunks" ADD CONSTRAINT "dataset_upload_chunks_upload_id_dataset_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."dataset_uploads"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dataset_uploads" ADD CONSTRAINT "dataset_uploads_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "dataset_uploads" ADD CONSTRAINT "dataset_uploads_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "datasets" ADD CONSTRAINT "datasets_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "datasets" ADD CONSTRAINT "datasets_upload_id_dataset_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."dataset_uploads"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "datasets" ADD CONSTRAINT "datasets_imported_by_users_id_fk" FOREIGN KEY ("imported_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "dataset_fits_study" ON "dataset_fits" USING btree ("study_id","created_at");--> statement-breakpoint
CREATE INDEX "dataset_uploads_expiry" ON "dataset_uploads" USING btree ("expires_at");--> statement-breakpoint
CREATE INDEX "datasets_study" ON "datasets" USING btree ("study_id","created_at");--> statement-breakpoint
-- Each imported dataset's rows live in a typed table of their own in this schema.
CREATE SCHEMA IF NOT EXISTS "study_data";--> statement-breakpoint
-- A dataset's table goes with its row, in the same transaction (also when a study is deleted).
CREATE FUNCTION "drop_dataset_table"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  EXECUTE format('DROP TABLE IF EXISTS study_data.%I', 'dataset_' || replace(OLD.id::text, '-', ''));
  RETURN OLD;
END $$;--> statement-breakpoint
CREATE TRIGGER "datasets_drop_table" AFTER DELETE ON "datasets"
  FOR EACH ROW EXECUTE FUNCTION "drop_dataset_table"();
--> statement-breakpoint
CREATE TABLE "shelf_observation_rows" (
	"interview_id" uuid NOT NULL,
	"study_id" uuid NOT NULL,
	"block_id" text NOT NULL,
	"price_minor" double precision NOT NULL,
	"pack_size" double precision NOT NULL,
	"quantity" double precision NOT NULL,
	"period_days" integer,
	CONSTRAINT "shelf_observation_rows_interview_id_block_id_pk" PRIMARY KEY("interview_id","block_id")
);
--> statement-breakpoint
CREATE INDEX "shelf_observation_rows_study" ON "shelf_observation_rows" USING btree ("study_id");
--> statement-breakpoint
-- The typed shelf-observation rows of the given interviews, rebuilt from their answers and the
-- blocks of the questionnaire version each was taken with (sync calls it for what it stored).
CREATE FUNCTION "refresh_shelf_observation_rows"(ids uuid[]) RETURNS void LANGUAGE sql AS $$
  DELETE FROM shelf_observation_rows WHERE interview_id = ANY(ids);
  INSERT INTO shelf_observation_rows
    (interview_id, study_id, block_id, price_minor, pack_size, quantity, period_days)
  SELECT i.id, i.study_id, b->>'id', (a->>'priceMinor')::float8, (a->>'packSize')::float8,
         (a->>'quantity')::float8, (b->>'periodDays')::integer
  FROM interviews i
  JOIN questionnaire_versions v ON v.id = i.questionnaire_version_id
  CROSS JOIN LATERAL jsonb_array_elements(v.definition->'blocks') AS b
  CROSS JOIN LATERAL (SELECT i.answers->(b->>'id') AS a) AS answer
  WHERE i.id = ANY(ids) AND b->>'kind' = 'shelf-observation'
    AND jsonb_typeof(a) = 'object'
    AND jsonb_typeof(a->'priceMinor') = 'number' AND jsonb_typeof(a->'packSize') = 'number'
    AND jsonb_typeof(a->'quantity') = 'number';
$$;--> statement-breakpoint
-- What was stored before this migration.
SELECT refresh_shelf_observation_rows(ARRAY(SELECT id FROM interviews));
