CREATE TYPE "public"."estimate_status" AS ENUM('draft', 'sent', 'approved', 'declined', 'superseded');--> statement-breakpoint
CREATE TYPE "public"."mail_kind" AS ENUM('estimate', 'invite', 'password_reset');--> statement-breakpoint
CREATE TYPE "public"."mail_status" AS ENUM('sending', 'sent', 'failed');--> statement-breakpoint
CREATE TYPE "public"."user_token_purpose" AS ENUM('invite', 'password_reset');--> statement-breakpoint
CREATE TABLE "work_order_test_runs" (
	"id" uuid PRIMARY KEY NOT NULL,
	"work_order_id" uuid NOT NULL,
	"checks" jsonb NOT NULL,
	"passed" boolean NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"user_id" text,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "estimate_links" (
	"id" uuid PRIMARY KEY NOT NULL,
	"estimate_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"revoked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "estimate_links_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "estimate_options" (
	"id" uuid PRIMARY KEY NOT NULL,
	"estimate_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"title" text NOT NULL,
	"labour_hours" double precision DEFAULT 0 NOT NULL,
	"parts" jsonb DEFAULT '[]'::jsonb NOT NULL,
	CONSTRAINT "estimate_options_position" UNIQUE("estimate_id","position"),
	CONSTRAINT "estimate_options_labour" CHECK ("estimate_options"."labour_hours" >= 0)
);
--> statement-breakpoint
CREATE TABLE "estimates" (
	"id" uuid PRIMARY KEY NOT NULL,
	"work_order_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"revises_id" uuid,
	"session_id" uuid,
	"finding_step_id" text,
	"finding_title" text DEFAULT '' NOT NULL,
	"status" "estimate_status" DEFAULT 'draft' NOT NULL,
	"currency" text NOT NULL,
	"labour_rate_cents" integer NOT NULL,
	"diagnostic_fee_cents" integer NOT NULL,
	"credit_diagnostic_fee" boolean NOT NULL,
	"tax_rate_basis_points" integer NOT NULL,
	"tax_labour" boolean DEFAULT false NOT NULL,
	"replacement_price_cents" integer,
	"replace_threshold_percent" integer NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	"sent_by" text,
	"valid_until" timestamp with time zone,
	"decided_at" timestamp with time zone,
	"approved_option_id" uuid,
	"customer_comment" text DEFAULT '' NOT NULL,
	CONSTRAINT "estimates_work_order_revision" UNIQUE("work_order_id","revision"),
	CONSTRAINT "estimates_money_non_negative" CHECK ("estimates"."labour_rate_cents" >= 0 and "estimates"."diagnostic_fee_cents" >= 0 and ("estimates"."replacement_price_cents" is null or "estimates"."replacement_price_cents" > 0)),
	CONSTRAINT "estimates_currency_code" CHECK ("estimates"."currency" ~ '^[A-Z]{3}$'),
	CONSTRAINT "estimates_tax_rate" CHECK ("estimates"."tax_rate_basis_points" between 0 and 10000),
	CONSTRAINT "estimates_threshold" CHECK ("estimates"."replace_threshold_percent" between 1 and 100)
);
--> statement-breakpoint
CREATE TABLE "captured_mail" (
	"id" uuid PRIMARY KEY NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL,
	"mail_from" text NOT NULL,
	"rcpt_to" jsonb NOT NULL,
	"subject" text DEFAULT '' NOT NULL,
	"message_id" text,
	"text_body" text DEFAULT '' NOT NULL,
	"html_body" text DEFAULT '' NOT NULL,
	"attachments" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"raw" text NOT NULL
);
--> statement-breakpoint
CREATE TABLE "outgoing_mail" (
	"id" uuid PRIMARY KEY NOT NULL,
	"kind" "mail_kind" NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"status" "mail_status" DEFAULT 'sending' NOT NULL,
	"error" text,
	"message_id" text,
	"record_type" text NOT NULL,
	"record_id" text,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "user_tokens" (
	"id" uuid PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"purpose" "user_token_purpose" NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "user_tokens_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "tax_labour" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "replace_threshold_percent" integer DEFAULT 50 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "estimate_valid_days" integer DEFAULT 30 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "warranty_note" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "invited_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "joined_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "work_order_test_runs" ADD CONSTRAINT "work_order_test_runs_work_order_id_work_orders_id_fk" FOREIGN KEY ("work_order_id") REFERENCES "public"."work_orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "work_order_test_runs" ADD CONSTRAINT "work_order_test_runs_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_links" ADD CONSTRAINT "estimate_links_estimate_id_estimates_id_fk" FOREIGN KEY ("estimate_id") REFERENCES "public"."estimates"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimate_options" ADD CONSTRAINT "estimate_options_estimate_id_estimates_id_fk" FOREIGN KEY ("estimate_id") REFERENCES "public"."estimates"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_work_order_id_work_orders_id_fk" FOREIGN KEY ("work_order_id") REFERENCES "public"."work_orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_session_id_diagnostic_sessions_id_fk" FOREIGN KEY ("session_id") REFERENCES "public"."diagnostic_sessions"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "estimates" ADD CONSTRAINT "estimates_sent_by_users_id_fk" FOREIGN KEY ("sent_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outgoing_mail" ADD CONSTRAINT "outgoing_mail_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "user_tokens" ADD CONSTRAINT "user_tokens_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "user_tokens" ADD CONSTRAINT "user_tokens_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "work_order_test_runs_order_idx" ON "work_order_test_runs" USING btree ("work_order_id","at");--> statement-breakpoint
CREATE INDEX "estimate_links_estimate_idx" ON "estimate_links" USING btree ("estimate_id");--> statement-breakpoint
CREATE INDEX "estimates_work_order_idx" ON "estimates" USING btree ("work_order_id");--> statement-breakpoint
CREATE INDEX "captured_mail_received_idx" ON "captured_mail" USING btree ("received_at");--> statement-breakpoint
CREATE INDEX "outgoing_mail_record_idx" ON "outgoing_mail" USING btree ("record_type","record_id");--> statement-breakpoint
CREATE INDEX "outgoing_mail_created_idx" ON "outgoing_mail" USING btree ("created_at");--> statement-breakpoint
CREATE INDEX "user_tokens_user_idx" ON "user_tokens" USING btree ("user_id");--> statement-breakpoint
ALTER TABLE "shop_settings" ADD CONSTRAINT "shop_settings_tax_rate" CHECK ("shop_settings"."tax_rate_basis_points" between 0 and 10000);--> statement-breakpoint
ALTER TABLE "shop_settings" ADD CONSTRAINT "shop_settings_replace_threshold" CHECK ("shop_settings"."replace_threshold_percent" between 1 and 100);--> statement-breakpoint
ALTER TABLE "shop_settings" ADD CONSTRAINT "shop_settings_estimate_valid_days" CHECK ("shop_settings"."estimate_valid_days" between 1 and 365);