CREATE TABLE "interview_photos" (
	"id" uuid PRIMARY KEY NOT NULL,
	"interview_id" uuid NOT NULL,
	"sha256" text NOT NULL,
	"byte_size" integer NOT NULL,
	"content_type" text,
	"received_bytes" integer DEFAULT 0 NOT NULL,
	"object_key" text,
	"stored_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "photo_upload_chunks" (
	"photo_id" uuid NOT NULL,
	"offset" integer NOT NULL,
	"data" "bytea" NOT NULL,
	CONSTRAINT "photo_upload_chunks_photo_id_offset_pk" PRIMARY KEY("photo_id","offset")
);
--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "latitude" double precision;--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "longitude" double precision;--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "gps_accuracy_m" double precision;--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "respondent_key" text;--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "photo_count" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "complete_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "review_note" text;--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "reviewed_by" uuid;--> statement-breakpoint
ALTER TABLE "interviews" ADD COLUMN "reviewed_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "interview_photos" ADD CONSTRAINT "interview_photos_interview_id_interviews_id_fk" FOREIGN KEY ("interview_id") REFERENCES "public"."interviews"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photo_upload_chunks" ADD CONSTRAINT "photo_upload_chunks_photo_id_interview_photos_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."interview_photos"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "interview_photos_interview" ON "interview_photos" USING btree ("interview_id");--> statement-breakpoint
ALTER TABLE "interviews" ADD CONSTRAINT "interviews_reviewed_by_users_id_fk" FOREIGN KEY ("reviewed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "interviews_respondent" ON "interviews" USING btree ("study_id","respondent_key");