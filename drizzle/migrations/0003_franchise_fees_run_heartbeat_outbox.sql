CREATE TYPE "public"."outbound_message_status" AS ENUM('sent', 'failed');--> statement-breakpoint
CREATE TABLE "outbound_messages" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"recipient" text NOT NULL,
	"recipient_staff_id" uuid,
	"subject" text NOT NULL,
	"text_body" text NOT NULL,
	"attachment_name" text,
	"subject_ref" text,
	"status" "outbound_message_status" NOT NULL,
	"error" text,
	"transport_message_id" text,
	"sent_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "branches" ADD COLUMN "royalty_rate" numeric(12, 5) DEFAULT '0' NOT NULL;--> statement-breakpoint
ALTER TABLE "branches" ADD COLUMN "marketing_fund_rate" numeric(12, 5) DEFAULT '0' NOT NULL;--> statement-breakpoint
ALTER TABLE "payroll_runs" ADD COLUMN "heartbeat_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "outbound_messages" ADD CONSTRAINT "outbound_messages_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outbound_messages" ADD CONSTRAINT "outbound_messages_recipient_staff_id_staff_id_fk" FOREIGN KEY ("recipient_staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outbound_messages" ADD CONSTRAINT "outbound_messages_sent_by_id_users_id_fk" FOREIGN KEY ("sent_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "outbound_messages_organisation_created" ON "outbound_messages" USING btree ("organisation_id","created_at");