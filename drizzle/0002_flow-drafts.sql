CREATE TABLE "flow_drafts" (
	"flow_id" text PRIMARY KEY NOT NULL,
	"definition" jsonb NOT NULL,
	"revision" integer DEFAULT 1 NOT NULL,
	"based_on_version" integer,
	"updated_by" text,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "flow_drafts_revision_positive" CHECK ("flow_drafts"."revision" >= 1)
);
--> statement-breakpoint
ALTER TABLE "flow_drafts" ADD CONSTRAINT "flow_drafts_flow_id_flows_id_fk" FOREIGN KEY ("flow_id") REFERENCES "public"."flows"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "flow_drafts" ADD CONSTRAINT "flow_drafts_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "diagnostic_sessions_flow_version_idx" ON "diagnostic_sessions" USING btree ("flow_version_id","status");