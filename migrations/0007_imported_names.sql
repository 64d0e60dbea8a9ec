ALTER TABLE "revision_comments" ADD COLUMN "imported_author" text;--> statement-breakpoint
ALTER TABLE "review_events" ADD COLUMN "imported_actor" text;--> statement-breakpoint
ALTER TABLE "scenario_revisions" ADD COLUMN "imported_review_by" text;