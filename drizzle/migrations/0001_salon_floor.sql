CREATE TYPE "public"."container_unit" AS ENUM('g', 'oz', 'mL', 'fl oz');--> statement-breakpoint
CREATE TYPE "public"."product_kind" AS ENUM('permanent', 'demi_permanent', 'lightener', 'developer', 'treatment', 'retail');--> statement-breakpoint
CREATE TYPE "public"."bowl_component_kind" AS ENUM('colour', 'lightener', 'developer', 'additive');--> statement-breakpoint
CREATE TYPE "public"."payment_kind" AS ENUM('charge', 'refund');--> statement-breakpoint
CREATE TYPE "public"."payment_method" AS ENUM('cash', 'card');--> statement-breakpoint
CREATE TYPE "public"."payment_status" AS ENUM('pending', 'succeeded', 'failed');--> statement-breakpoint
CREATE TYPE "public"."ticket_status" AS ENUM('open', 'closed', 'void');--> statement-breakpoint
CREATE TYPE "public"."adjustment_category" AS ENUM('service', 'retail', 'tip', 'product_charge', 'cash');--> statement-breakpoint
CREATE TABLE "levels" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"name" text NOT NULL,
	"rank" integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE "products" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"kind" "product_kind" NOT NULL,
	"developer_volume" numeric(12, 3),
	"container_size" numeric(12, 3) NOT NULL,
	"container_unit" "container_unit" NOT NULL,
	"density_grams_per_ml" numeric(12, 4),
	"container_cost" numeric(12, 2) NOT NULL,
	"retail_price" numeric(12, 2),
	"cost_per_gram" numeric(12, 6) NOT NULL,
	"cost_per_gram_approximate" boolean DEFAULT false NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "service_prices" (
	"service_id" uuid NOT NULL,
	"level_id" uuid NOT NULL,
	"price" numeric(12, 2) NOT NULL,
	CONSTRAINT "service_prices_service_id_level_id_pk" PRIMARY KEY("service_id","level_id")
);
--> statement-breakpoint
CREATE TABLE "services" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"name" text NOT NULL,
	"category" text NOT NULL,
	"duration_minutes" integer NOT NULL,
	"is_colour" boolean DEFAULT false NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "staff" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"home_branch_id" uuid NOT NULL,
	"display_name" text NOT NULL,
	"email" text,
	"level_id" uuid NOT NULL,
	"hourly_rate" numeric(12, 2),
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "clients" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"home_branch_id" uuid NOT NULL,
	"first_name" text NOT NULL,
	"last_name" text NOT NULL,
	"phone" text,
	"email" text,
	"notes" text DEFAULT '' NOT NULL,
	"allergy_notes" text DEFAULT '' NOT NULL,
	"last_patch_test_on" date,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "bowl_components" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"bowl_id" uuid NOT NULL,
	"product_id" uuid NOT NULL,
	"product_name" text NOT NULL,
	"kind" "bowl_component_kind" NOT NULL,
	"grams" numeric(12, 3) NOT NULL,
	"cost_per_gram" numeric(12, 6) NOT NULL,
	"developer_volume" numeric(12, 3),
	"position" integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE "bowls" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"service_line_id" uuid NOT NULL,
	"mixed_by_staff_id" uuid NOT NULL,
	"leftover_grams" numeric(12, 3) DEFAULT '0' NOT NULL,
	"processing_minutes" integer,
	"note" text DEFAULT '' NOT NULL,
	"total_grams" numeric(12, 3) NOT NULL,
	"ratio" numeric(12, 2),
	"developer_volume" numeric(12, 1),
	"cost" numeric(12, 2) NOT NULL,
	"waste_grams" numeric(12, 3) NOT NULL,
	"waste_cost" numeric(12, 2) NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"ticket_id" uuid NOT NULL,
	"method" "payment_method" NOT NULL,
	"kind" "payment_kind" DEFAULT 'charge' NOT NULL,
	"status" "payment_status" NOT NULL,
	"amount" numeric(12, 2) NOT NULL,
	"tendered" numeric(12, 2),
	"processor_payment_id" text,
	"processor_refund_id" text,
	"idempotency_key" text NOT NULL,
	"booked_on" date NOT NULL,
	"taken_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "retail_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"ticket_id" uuid NOT NULL,
	"product_id" uuid NOT NULL,
	"product_name" text NOT NULL,
	"quantity" integer NOT NULL,
	"unit_price" numeric(12, 2) NOT NULL,
	"amount" numeric(12, 2) NOT NULL,
	"tax_rate" numeric(12, 5) NOT NULL,
	"tax" numeric(12, 2) NOT NULL,
	"seller_staff_id" uuid NOT NULL,
	"booked_on" date NOT NULL,
	"refund_of_line_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "ticket_service_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"ticket_id" uuid NOT NULL,
	"service_id" uuid NOT NULL,
	"service_name" text NOT NULL,
	"is_colour" boolean NOT NULL,
	"staff_id" uuid NOT NULL,
	"level_id" uuid NOT NULL,
	"assistant_staff_id" uuid,
	"assistant_share" numeric(12, 4),
	"list_price" numeric(12, 2) NOT NULL,
	"discount" numeric(12, 2) DEFAULT '0' NOT NULL,
	"price" numeric(12, 2) NOT NULL,
	"no_product_reason" text,
	"booked_on" date NOT NULL,
	"refund_of_line_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "tickets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"branch_id" uuid NOT NULL,
	"business_date" date NOT NULL,
	"number" integer NOT NULL,
	"client_id" uuid,
	"status" "ticket_status" DEFAULT 'open' NOT NULL,
	"opened_by_id" uuid NOT NULL,
	"opened_at" timestamp with time zone DEFAULT now() NOT NULL,
	"closed_by_id" uuid,
	"closed_at" timestamp with time zone,
	"voided_by_id" uuid,
	"voided_at" timestamp with time zone,
	"void_reason" text,
	"patch_test_acknowledged_by_id" uuid,
	"patch_test_acknowledged_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "tips" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"ticket_id" uuid NOT NULL,
	"staff_id" uuid NOT NULL,
	"amount" numeric(12, 2) NOT NULL,
	"booked_on" date NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "adjustments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"branch_id" uuid NOT NULL,
	"booked_on" date NOT NULL,
	"ticket_id" uuid,
	"staff_id" uuid,
	"category" "adjustment_category" NOT NULL,
	"amount" numeric(12, 2) NOT NULL,
	"reason" text NOT NULL,
	"created_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "day_closes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"branch_id" uuid NOT NULL,
	"business_date" date NOT NULL,
	"expected_cash" numeric(12, 2) NOT NULL,
	"counted_cash" numeric(12, 2) NOT NULL,
	"cash_denominations" jsonb,
	"cash_variance" numeric(12, 2) NOT NULL,
	"card_total_tickets" numeric(12, 2) NOT NULL,
	"card_total_processor" numeric(12, 2) NOT NULL,
	"card_variance" numeric(12, 2) NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"closed_by_id" uuid NOT NULL,
	"closed_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "processor_events" (
	"id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "branches" ADD COLUMN "variance_note_threshold" numeric(12, 2) DEFAULT '5.00' NOT NULL;--> statement-breakpoint
ALTER TABLE "branches" ADD COLUMN "patch_test_max_age_days" integer DEFAULT 180 NOT NULL;--> statement-breakpoint
ALTER TABLE "levels" ADD CONSTRAINT "levels_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "products" ADD CONSTRAINT "products_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_prices" ADD CONSTRAINT "service_prices_service_id_services_id_fk" FOREIGN KEY ("service_id") REFERENCES "public"."services"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_prices" ADD CONSTRAINT "service_prices_level_id_levels_id_fk" FOREIGN KEY ("level_id") REFERENCES "public"."levels"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "services" ADD CONSTRAINT "services_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff" ADD CONSTRAINT "staff_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff" ADD CONSTRAINT "staff_home_branch_id_branches_id_fk" FOREIGN KEY ("home_branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff" ADD CONSTRAINT "staff_level_id_levels_id_fk" FOREIGN KEY ("level_id") REFERENCES "public"."levels"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clients" ADD CONSTRAINT "clients_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clients" ADD CONSTRAINT "clients_home_branch_id_branches_id_fk" FOREIGN KEY ("home_branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bowl_components" ADD CONSTRAINT "bowl_components_bowl_id_bowls_id_fk" FOREIGN KEY ("bowl_id") REFERENCES "public"."bowls"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bowl_components" ADD CONSTRAINT "bowl_components_product_id_products_id_fk" FOREIGN KEY ("product_id") REFERENCES "public"."products"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bowls" ADD CONSTRAINT "bowls_service_line_id_ticket_service_lines_id_fk" FOREIGN KEY ("service_line_id") REFERENCES "public"."ticket_service_lines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bowls" ADD CONSTRAINT "bowls_mixed_by_staff_id_staff_id_fk" FOREIGN KEY ("mixed_by_staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_taken_by_id_users_id_fk" FOREIGN KEY ("taken_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "retail_lines" ADD CONSTRAINT "retail_lines_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "retail_lines" ADD CONSTRAINT "retail_lines_product_id_products_id_fk" FOREIGN KEY ("product_id") REFERENCES "public"."products"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "retail_lines" ADD CONSTRAINT "retail_lines_seller_staff_id_staff_id_fk" FOREIGN KEY ("seller_staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ticket_service_lines" ADD CONSTRAINT "ticket_service_lines_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ticket_service_lines" ADD CONSTRAINT "ticket_service_lines_service_id_services_id_fk" FOREIGN KEY ("service_id") REFERENCES "public"."services"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ticket_service_lines" ADD CONSTRAINT "ticket_service_lines_staff_id_staff_id_fk" FOREIGN KEY ("staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ticket_service_lines" ADD CONSTRAINT "ticket_service_lines_level_id_levels_id_fk" FOREIGN KEY ("level_id") REFERENCES "public"."levels"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ticket_service_lines" ADD CONSTRAINT "ticket_service_lines_assistant_staff_id_staff_id_fk" FOREIGN KEY ("assistant_staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_branch_id_branches_id_fk" FOREIGN KEY ("branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_opened_by_id_users_id_fk" FOREIGN KEY ("opened_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_closed_by_id_users_id_fk" FOREIGN KEY ("closed_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_voided_by_id_users_id_fk" FOREIGN KEY ("voided_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tickets" ADD CONSTRAINT "tickets_patch_test_acknowledged_by_id_users_id_fk" FOREIGN KEY ("patch_test_acknowledged_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tips" ADD CONSTRAINT "tips_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tips" ADD CONSTRAINT "tips_staff_id_staff_id_fk" FOREIGN KEY ("staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "adjustments" ADD CONSTRAINT "adjustments_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "adjustments" ADD CONSTRAINT "adjustments_branch_id_branches_id_fk" FOREIGN KEY ("branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "adjustments" ADD CONSTRAINT "adjustments_ticket_id_tickets_id_fk" FOREIGN KEY ("ticket_id") REFERENCES "public"."tickets"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "adjustments" ADD CONSTRAINT "adjustments_staff_id_staff_id_fk" FOREIGN KEY ("staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "adjustments" ADD CONSTRAINT "adjustments_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "day_closes" ADD CONSTRAINT "day_closes_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "day_closes" ADD CONSTRAINT "day_closes_branch_id_branches_id_fk" FOREIGN KEY ("branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "day_closes" ADD CONSTRAINT "day_closes_closed_by_id_users_id_fk" FOREIGN KEY ("closed_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "levels_organisation_name_unique" ON "levels" USING btree ("organisation_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "products_organisation_code_unique" ON "products" USING btree ("organisation_id","code");--> statement-breakpoint
CREATE UNIQUE INDEX "services_organisation_name_unique" ON "services" USING btree ("organisation_id","name");--> statement-breakpoint
CREATE INDEX "staff_home_branch_idx" ON "staff" USING btree ("home_branch_id");--> statement-breakpoint
CREATE INDEX "clients_home_branch_idx" ON "clients" USING btree ("home_branch_id");--> statement-breakpoint
CREATE INDEX "clients_name_idx" ON "clients" USING btree ("last_name","first_name");--> statement-breakpoint
CREATE INDEX "bowl_components_bowl_idx" ON "bowl_components" USING btree ("bowl_id");--> statement-breakpoint
CREATE INDEX "bowls_service_line_idx" ON "bowls" USING btree ("service_line_id");--> statement-breakpoint
CREATE UNIQUE INDEX "payments_idempotency_unique" ON "payments" USING btree ("ticket_id","idempotency_key");--> statement-breakpoint
CREATE INDEX "payments_ticket_idx" ON "payments" USING btree ("ticket_id");--> statement-breakpoint
CREATE INDEX "retail_lines_ticket_idx" ON "retail_lines" USING btree ("ticket_id");--> statement-breakpoint
CREATE INDEX "retail_lines_seller_day_idx" ON "retail_lines" USING btree ("seller_staff_id","booked_on");--> statement-breakpoint
CREATE INDEX "ticket_service_lines_ticket_idx" ON "ticket_service_lines" USING btree ("ticket_id");--> statement-breakpoint
CREATE INDEX "ticket_service_lines_staff_day_idx" ON "ticket_service_lines" USING btree ("staff_id","booked_on");--> statement-breakpoint
CREATE UNIQUE INDEX "tickets_branch_day_number_unique" ON "tickets" USING btree ("branch_id","business_date","number");--> statement-breakpoint
CREATE INDEX "tickets_client_idx" ON "tickets" USING btree ("client_id");--> statement-breakpoint
CREATE INDEX "tips_ticket_idx" ON "tips" USING btree ("ticket_id");--> statement-breakpoint
CREATE INDEX "tips_staff_day_idx" ON "tips" USING btree ("staff_id","booked_on");--> statement-breakpoint
CREATE INDEX "adjustments_branch_day_idx" ON "adjustments" USING btree ("branch_id","booked_on");--> statement-breakpoint
CREATE UNIQUE INDEX "day_closes_branch_day_unique" ON "day_closes" USING btree ("branch_id","business_date");--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_staff_id_staff_id_fk" FOREIGN KEY ("staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;