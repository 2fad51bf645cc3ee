-- Replaced by statement-level reference checks in the next migration (0007).
ALTER TABLE "interviews" DROP CONSTRAINT "interviews_study_id_studies_id_fk";
--> statement-breakpoint
ALTER TABLE "interviews" DROP CONSTRAINT "interviews_questionnaire_version_id_questionnaire_versions_id_fk";
--> statement-breakpoint
ALTER TABLE "interviews" DROP CONSTRAINT "interviews_route_id_routes_id_fk";
--> statement-breakpoint
ALTER TABLE "interviews" DROP CONSTRAINT "interviews_point_id_sampling_points_id_fk";
--> statement-breakpoint
ALTER TABLE "interviews" DROP CONSTRAINT "interviews_enumerator_id_users_id_fk";
