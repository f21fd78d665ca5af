CREATE TYPE "public"."attachment_owner" AS ENUM('work_order', 'session');--> statement-breakpoint
CREATE TYPE "public"."compression_release" AS ENUM('yes', 'no', 'unknown');--> statement-breakpoint
CREATE TYPE "public"."equipment_kind" AS ENUM('string_trimmer', 'chainsaw', 'leaf_blower', 'hedge_trimmer', 'walk_behind_mower', 'generator', 'tiller', 'other');--> statement-breakpoint
CREATE TYPE "public"."review_state" AS ENUM('not_submitted', 'waiting', 'approved', 'returned');--> statement-breakpoint
CREATE TYPE "public"."session_status" AS ENUM('open', 'completed', 'abandoned');--> statement-breakpoint
CREATE TYPE "public"."tank_contents" AS ENUM('fresh', 'stale', 'premix', 'empty', 'unknown');--> statement-breakpoint
CREATE TYPE "public"."work_order_state" AS ENUM('waiting_for_diagnosis', 'diagnosing', 'waiting_for_approval', 'approved', 'declined', 'waiting_for_parts', 'in_repair', 'test_run', 'ready_for_pickup', 'picked_up');--> statement-breakpoint
CREATE TABLE "attachments" (
	"id" uuid PRIMARY KEY NOT NULL,
	"storage_key" text NOT NULL,
	"owner_type" "attachment_owner" NOT NULL,
	"owner_id" uuid NOT NULL,
	"step_id" text,
	"mime_type" text NOT NULL,
	"size" integer NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"sha256" text NOT NULL,
	"thumb_key" text NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "attachments_storage_key_unique" UNIQUE("storage_key"),
	CONSTRAINT "attachments_thumb_key_unique" UNIQUE("thumb_key")
);
--> statement-breakpoint
CREATE TABLE "customers" (
	"id" uuid PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"email" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "diagnostic_sessions" (
	"id" uuid PRIMARY KEY NOT NULL,
	"work_order_id" uuid NOT NULL,
	"flow_version_id" uuid NOT NULL,
	"tech_id" text NOT NULL,
	"status" "session_status" DEFAULT 'open' NOT NULL,
	"abandon_reason" text,
	"current_step_id" text NOT NULL,
	"finding_step_id" text,
	"review_state" "review_state" DEFAULT 'not_submitted' NOT NULL,
	"reviewer_id" text,
	"review_comment" text,
	"input" jsonb NOT NULL,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"completed_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "flow_versions" (
	"id" uuid PRIMARY KEY NOT NULL,
	"flow_id" text NOT NULL,
	"number" integer NOT NULL,
	"definition" jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "flow_versions_flow_number_unique" UNIQUE("flow_id","number"),
	CONSTRAINT "flow_versions_number_positive" CHECK ("flow_versions"."number" >= 1)
);
--> statement-breakpoint
CREATE TABLE "flows" (
	"id" text PRIMARY KEY NOT NULL,
	"title" text NOT NULL,
	"retired" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "session_events" (
	"id" uuid PRIMARY KEY NOT NULL,
	"session_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"type" text NOT NULL,
	"payload" jsonb NOT NULL,
	"recorded_at" timestamp with time zone NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "session_events_session_seq_unique" UNIQUE("session_id","seq")
);
--> statement-breakpoint
CREATE TABLE "units" (
	"id" uuid PRIMARY KEY NOT NULL,
	"customer_id" uuid NOT NULL,
	"equipment_kind" "equipment_kind" NOT NULL,
	"make" text NOT NULL,
	"model" text NOT NULL,
	"engine_model" text DEFAULT '' NOT NULL,
	"engine_type" text DEFAULT '' NOT NULL,
	"engine_serial" text DEFAULT '' NOT NULL,
	"cycle" integer NOT NULL,
	"displacement_cc" double precision,
	"compression_release" "compression_release" DEFAULT 'unknown' NOT NULL,
	"hours" double precision,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "units_cycle" CHECK ("units"."cycle" in (2, 4))
);
--> statement-breakpoint
CREATE TABLE "work_order_state_history" (
	"id" uuid PRIMARY KEY NOT NULL,
	"work_order_id" uuid NOT NULL,
	"from_state" "work_order_state",
	"to_state" "work_order_state" NOT NULL,
	"user_id" text,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "work_orders" (
	"id" uuid PRIMARY KEY NOT NULL,
	"number" integer GENERATED ALWAYS AS IDENTITY (sequence name "work_orders_number_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1001 CACHE 1),
	"customer_id" uuid NOT NULL,
	"unit_id" uuid NOT NULL,
	"state" "work_order_state" DEFAULT 'waiting_for_diagnosis' NOT NULL,
	"complaint" text NOT NULL,
	"already_tried" text DEFAULT '' NOT NULL,
	"tank_contents" "tank_contents" NOT NULL,
	"intake_photo_id" uuid,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "work_orders_number_unique" UNIQUE("number")
);
--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagnostic_sessions" ADD CONSTRAINT "diagnostic_sessions_work_order_id_work_orders_id_fk" FOREIGN KEY ("work_order_id") REFERENCES "public"."work_orders"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagnostic_sessions" ADD CONSTRAINT "diagnostic_sessions_flow_version_id_flow_versions_id_fk" FOREIGN KEY ("flow_version_id") REFERENCES "public"."flow_versions"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagnostic_sessions" ADD CONSTRAINT "diagnostic_sessions_tech_id_users_id_fk" FOREIGN KEY ("tech_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagnostic_sessions" ADD CONSTRAINT "diagnostic_sessions_reviewer_id_users_id_fk" FOREIGN KEY ("reviewer_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "flow_versions" ADD CONSTRAINT "flow_versions_flow_id_flows_id_fk" FOREIGN KEY ("flow_id") REFERENCES "public"."flows"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "flow_versions" ADD CONSTRAINT "flow_versions_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "session_events" ADD CONSTRAINT "session_events_session_id_diagnostic_sessions_id_fk" FOREIGN KEY ("session_id") REFERENCES "public"."diagnostic_sessions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "units" ADD CONSTRAINT "units_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_order_state_history" ADD CONSTRAINT "work_order_state_history_work_order_id_work_orders_id_fk" FOREIGN KEY ("work_order_id") REFERENCES "public"."work_orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_order_state_history" ADD CONSTRAINT "work_order_state_history_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_orders" ADD CONSTRAINT "work_orders_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_orders" ADD CONSTRAINT "work_orders_unit_id_units_id_fk" FOREIGN KEY ("unit_id") REFERENCES "public"."units"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_orders" ADD CONSTRAINT "work_orders_intake_photo_id_attachments_id_fk" FOREIGN KEY ("intake_photo_id") REFERENCES "public"."attachments"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_orders" ADD CONSTRAINT "work_orders_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "attachments_owner_idx" ON "attachments" USING btree ("owner_type","owner_id");--> statement-breakpoint
CREATE INDEX "customers_name_idx" ON "customers" USING btree ("name");--> statement-breakpoint
CREATE UNIQUE INDEX "diagnostic_sessions_one_open_idx" ON "diagnostic_sessions" USING btree ("work_order_id","tech_id") WHERE "diagnostic_sessions"."status" = 'open';--> statement-breakpoint
CREATE INDEX "diagnostic_sessions_work_order_idx" ON "diagnostic_sessions" USING btree ("work_order_id");--> statement-breakpoint
CREATE INDEX "diagnostic_sessions_tech_idx" ON "diagnostic_sessions" USING btree ("tech_id","status");--> statement-breakpoint
CREATE INDEX "units_customer_idx" ON "units" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "work_order_state_history_order_idx" ON "work_order_state_history" USING btree ("work_order_id","at");--> statement-breakpoint
CREATE INDEX "work_orders_state_idx" ON "work_orders" USING btree ("state");--> statement-breakpoint
CREATE INDEX "work_orders_customer_idx" ON "work_orders" USING btree ("customer_id");--> statement-breakpoint
CREATE INDEX "work_orders_unit_idx" ON "work_orders" USING btree ("unit_id");