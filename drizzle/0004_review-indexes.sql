CREATE EXTENSION IF NOT EXISTS pg_trgm;--> statement-breakpoint
CREATE INDEX "customers_name_trgm_idx" ON "customers" USING gin ("name" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "diagnostic_sessions_started_idx" ON "diagnostic_sessions" USING btree ("started_at" DESC NULLS LAST,"id");--> statement-breakpoint
CREATE INDEX "diagnostic_sessions_review_completed_idx" ON "diagnostic_sessions" USING btree ("review_state","completed_at" DESC NULLS LAST,"id");--> statement-breakpoint
CREATE INDEX "diagnostic_sessions_tech_started_idx" ON "diagnostic_sessions" USING btree ("tech_id","started_at" DESC NULLS LAST,"id");--> statement-breakpoint
CREATE INDEX "units_make_model_trgm_idx" ON "units" USING gin (("make" || ' ' || "model") gin_trgm_ops);