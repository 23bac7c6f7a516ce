CREATE TABLE "branch_day_figures" (
	"organisation_id" uuid NOT NULL,
	"branch_id" uuid NOT NULL,
	"business_date" date NOT NULL,
	"service_revenue" numeric(12, 2) NOT NULL,
	"colour_service_revenue" numeric(12, 2) NOT NULL,
	"colour_product_cost" numeric(12, 2) NOT NULL,
	"retail_revenue" numeric(12, 2) NOT NULL,
	"tips" numeric(12, 2) NOT NULL,
	"tickets" integer NOT NULL,
	"voids" integer NOT NULL,
	"refunds" integer NOT NULL,
	"refunded_amount" numeric(12, 2) NOT NULL,
	"hours" numeric(12, 3) NOT NULL,
	"revenue_with_hours" numeric(12, 2) NOT NULL,
	"day_closed" boolean NOT NULL,
	CONSTRAINT "branch_day_figures_branch_id_business_date_pk" PRIMARY KEY("branch_id","business_date")
);
--> statement-breakpoint
CREATE TABLE "client_visits" (
	"organisation_id" uuid NOT NULL,
	"client_id" uuid NOT NULL,
	"branch_id" uuid NOT NULL,
	"business_date" date NOT NULL,
	"previous_visit_on" date,
	"next_visit_on" date,
	"first_in_organisation" boolean NOT NULL,
	CONSTRAINT "client_visits_branch_id_business_date_client_id_pk" PRIMARY KEY("branch_id","business_date","client_id")
);
--> statement-breakpoint
CREATE TABLE "compare_rebuilds" (
	"organisation_id" uuid PRIMARY KEY NOT NULL,
	"rebuilt_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
CREATE TABLE "staff_day_figures" (
	"organisation_id" uuid NOT NULL,
	"staff_id" uuid NOT NULL,
	"branch_id" uuid NOT NULL,
	"business_date" date NOT NULL,
	"service_revenue" numeric(12, 2) NOT NULL,
	"colour_service_revenue" numeric(12, 2) NOT NULL,
	"colour_product_cost" numeric(12, 2) NOT NULL,
	"retail_revenue" numeric(12, 2) NOT NULL,
	"tips" numeric(12, 2) NOT NULL,
	"tickets" integer NOT NULL,
	"hours" numeric(12, 3) NOT NULL,
	CONSTRAINT "staff_day_figures_branch_id_business_date_staff_id_pk" PRIMARY KEY("branch_id","business_date","staff_id")
);
--> statement-breakpoint
ALTER TABLE "branch_day_figures" ADD CONSTRAINT "branch_day_figures_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "branch_day_figures" ADD CONSTRAINT "branch_day_figures_branch_id_branches_id_fk" FOREIGN KEY ("branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_visits" ADD CONSTRAINT "client_visits_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_visits" ADD CONSTRAINT "client_visits_client_id_clients_id_fk" FOREIGN KEY ("client_id") REFERENCES "public"."clients"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "client_visits" ADD CONSTRAINT "client_visits_branch_id_branches_id_fk" FOREIGN KEY ("branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "compare_rebuilds" ADD CONSTRAINT "compare_rebuilds_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_day_figures" ADD CONSTRAINT "staff_day_figures_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_day_figures" ADD CONSTRAINT "staff_day_figures_staff_id_staff_id_fk" FOREIGN KEY ("staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_day_figures" ADD CONSTRAINT "staff_day_figures_branch_id_branches_id_fk" FOREIGN KEY ("branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "client_visits_client_idx" ON "client_visits" USING btree ("client_id");