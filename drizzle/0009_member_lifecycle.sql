CREATE TABLE "field_devices" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"session_id" text NOT NULL,
	"user_id" uuid NOT NULL,
	"organisation_id" uuid NOT NULL,
	"label" text NOT NULL,
	"first_seen_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_sync_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_sync_sent" integer NOT NULL,
	"last_sync_accepted" integer NOT NULL,
	"queued_at_last_sync" integer,
	"signed_out_at" timestamp with time zone,
	"signed_out_by" uuid
);
--> statement-breakpoint
CREATE TABLE "rate_limits" (
	"key" varchar(255) PRIMARY KEY NOT NULL,
	"points" integer DEFAULT 0 NOT NULL,
	"expire" bigint
);
--> statement-breakpoint
ALTER TABLE "memberships" ADD COLUMN "deactivated_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "api_tokens" ADD COLUMN "revoked_reason" text;--> statement-breakpoint
ALTER TABLE "api_tokens" ADD COLUMN "expires_at" timestamp with time zone DEFAULT now() + interval '90 days' NOT NULL;--> statement-breakpoint
ALTER TABLE "api_tokens" ADD COLUMN "study_ids" uuid[];--> statement-breakpoint
ALTER TABLE "field_devices" ADD CONSTRAINT "field_devices_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_devices" ADD CONSTRAINT "field_devices_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "field_devices" ADD CONSTRAINT "field_devices_signed_out_by_users_id_fk" FOREIGN KEY ("signed_out_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "field_devices_session" ON "field_devices" USING btree ("session_id");--> statement-breakpoint
CREATE INDEX "field_devices_user" ON "field_devices" USING btree ("user_id","organisation_id");