CREATE TABLE "parameter_set_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"set_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"values" jsonb NOT NULL,
	"provenance" jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "parameter_sets" ADD COLUMN "version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "parameter_set_versions" ADD CONSTRAINT "parameter_set_versions_set_id_parameter_sets_id_fk" FOREIGN KEY ("set_id") REFERENCES "public"."parameter_sets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "parameter_set_versions" ADD CONSTRAINT "parameter_set_versions_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "parameter_set_versions_set_version_idx" ON "parameter_set_versions" USING btree ("set_id","version");--> statement-breakpoint
-- Backfill (added by hand: drizzle-kit cannot express data): every existing set becomes its version 1, as it stands today.
INSERT INTO "parameter_set_versions" ("set_id", "version", "values", "provenance", "created_by", "created_at") SELECT "id", 1, "values", "provenance", coalesce("updated_by", "created_by"), "updated_at" FROM "parameter_sets";
