-- Trigram indexes need pg_trgm (shipped with PostgreSQL's contrib modules, trusted since 13).
CREATE EXTENSION IF NOT EXISTS pg_trgm;--> statement-breakpoint
DROP INDEX "change_requests_project_idx";--> statement-breakpoint
CREATE INDEX "projects_name_trgm_idx" ON "projects" USING gin ("name" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "projects_structure_number_trgm_idx" ON "projects" USING gin ("structure_number" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "change_requests_project_state_idx" ON "change_requests" USING btree ("project_id","state");--> statement-breakpoint
CREATE INDEX "change_requests_title_trgm_idx" ON "change_requests" USING gin ("title" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "change_requests_number_trgm_idx" ON "change_requests" USING gin ("number" gin_trgm_ops);