ALTER TABLE "diagnostic_sessions" ADD COLUMN "reviewed_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "diagnostic_sessions" ADD COLUMN "flags" jsonb;--> statement-breakpoint
ALTER TABLE "diagnostic_sessions" ADD COLUMN "flag_count" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
CREATE INDEX "diagnostic_sessions_review_idx" ON "diagnostic_sessions" USING btree ("review_state","started_at");