DROP INDEX "scenarios_team_name_idx";--> statement-breakpoint
CREATE INDEX "scenarios_team_lower_name_idx" ON "scenarios" USING btree ("team_id",lower("name"));