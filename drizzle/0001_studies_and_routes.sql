CREATE TYPE "public"."interview_status" AS ENUM('received', 'flagged', 'accepted', 'returned', 'rejected');--> statement-breakpoint
CREATE TYPE "public"."questionnaire_version_status" AS ENUM('draft', 'published');--> statement-breakpoint
CREATE TYPE "public"."study_status" AS ENUM('draft', 'in_field', 'closed');--> statement-breakpoint
CREATE TABLE "interviews" (
	"id" uuid PRIMARY KEY NOT NULL,
	"study_id" uuid NOT NULL,
	"questionnaire_version_id" uuid NOT NULL,
	"route_id" uuid,
	"point_id" uuid,
	"enumerator_id" uuid,
	"status" "interview_status" DEFAULT 'received' NOT NULL,
	"answers" jsonb NOT NULL,
	"flags" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"started_at" timestamp with time zone NOT NULL,
	"finished_at" timestamp with time zone NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "questionnaire_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"questionnaire_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"status" "questionnaire_version_status" DEFAULT 'draft' NOT NULL,
	"definition" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"published_at" timestamp with time zone,
	"published_by" uuid
);
--> statement-breakpoint
CREATE TABLE "questionnaires" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"study_id" uuid NOT NULL,
	"title" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "route_stops" (
	"route_id" uuid NOT NULL,
	"study_id" uuid NOT NULL,
	"point_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"quota" integer NOT NULL,
	CONSTRAINT "route_stops_route_id_point_id_pk" PRIMARY KEY("route_id","point_id"),
	CONSTRAINT "route_stops_quota" CHECK ("route_stops"."quota" > 0)
);
--> statement-breakpoint
CREATE TABLE "routes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"study_id" uuid NOT NULL,
	"name" text NOT NULL,
	"enumerator_id" uuid,
	"window_start" date NOT NULL,
	"window_end" date NOT NULL,
	"assigned_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "routes_study_id" UNIQUE("study_id","id"),
	CONSTRAINT "routes_window" CHECK ("routes"."window_end" >= "routes"."window_start")
);
--> statement-breakpoint
CREATE TABLE "sampling_points" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"study_id" uuid NOT NULL,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"kind" text NOT NULL,
	"latitude" double precision NOT NULL,
	"longitude" double precision NOT NULL,
	"stratum" text NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sampling_points_code" UNIQUE("study_id","code"),
	CONSTRAINT "sampling_points_study_id" UNIQUE("study_id","id")
);
--> statement-breakpoint
CREATE TABLE "studies" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"name" text NOT NULL,
	"product_name" text NOT NULL,
	"second_product_name" text,
	"currency" text NOT NULL,
	"locale" text NOT NULL,
	"market" text NOT NULL,
	"target_sample" integer NOT NULL,
	"price_min_minor" bigint NOT NULL,
	"price_max_minor" bigint NOT NULL,
	"status" "study_status" DEFAULT 'draft' NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "studies_price_range" CHECK ("studies"."price_min_minor" > 0 and "studies"."price_max_minor" > "studies"."price_min_minor"),
	CONSTRAINT "studies_target_sample" CHECK ("studies"."target_sample" > 0)
);
--> statement-breakpoint
CREATE TABLE "study_members" (
	"study_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"roles" "role"[] NOT NULL,
	"added_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "study_members_study_id_user_id_pk" PRIMARY KEY("study_id","user_id")
);
--> statement-breakpoint
ALTER TABLE "interviews" ADD CONSTRAINT "interviews_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "interviews" ADD CONSTRAINT "interviews_questionnaire_version_id_questionnaire_versions_id_fk" FOREIGN KEY ("questionnaire_version_id") REFERENCES "public"."questionnaire_versions"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "interviews" ADD CONSTRAINT "interviews_route_id_routes_id_fk" FOREIGN KEY ("route_id") REFERENCES "public"."routes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "interviews" ADD CONSTRAINT "interviews_point_id_sampling_points_id_fk" FOREIGN KEY ("point_id") REFERENCES "public"."sampling_points"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "interviews" ADD CONSTRAINT "interviews_enumerator_id_users_id_fk" FOREIGN KEY ("enumerator_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "questionnaire_versions" ADD CONSTRAINT "questionnaire_versions_questionnaire_id_questionnaires_id_fk" FOREIGN KEY ("questionnaire_id") REFERENCES "public"."questionnaires"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "questionnaire_versions" ADD CONSTRAINT "questionnaire_versions_published_by_users_id_fk" FOREIGN KEY ("published_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "questionnaires" ADD CONSTRAINT "questionnaires_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "route_stops" ADD CONSTRAINT "route_stops_study_id_route_id_routes_study_id_id_fk" FOREIGN KEY ("study_id","route_id") REFERENCES "public"."routes"("study_id","id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "route_stops" ADD CONSTRAINT "route_stops_study_id_point_id_sampling_points_study_id_id_fk" FOREIGN KEY ("study_id","point_id") REFERENCES "public"."sampling_points"("study_id","id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "routes" ADD CONSTRAINT "routes_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "routes" ADD CONSTRAINT "routes_enumerator_id_users_id_fk" FOREIGN KEY ("enumerator_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sampling_points" ADD CONSTRAINT "sampling_points_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studies" ADD CONSTRAINT "studies_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "studies" ADD CONSTRAINT "studies_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "study_members" ADD CONSTRAINT "study_members_study_id_studies_id_fk" FOREIGN KEY ("study_id") REFERENCES "public"."studies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "study_members" ADD CONSTRAINT "study_members_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "interviews_study_status" ON "interviews" USING btree ("study_id","status");--> statement-breakpoint
CREATE INDEX "interviews_route_point" ON "interviews" USING btree ("route_id","point_id");--> statement-breakpoint
CREATE UNIQUE INDEX "questionnaire_versions_number" ON "questionnaire_versions" USING btree ("questionnaire_id","version");