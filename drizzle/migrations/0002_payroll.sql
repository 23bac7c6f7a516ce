CREATE TYPE "public"."pay_frequency" AS ENUM('weekly', 'biweekly', 'semi-monthly');--> statement-breakpoint
CREATE TYPE "public"."pay_tier_mode" AS ENUM('marginal', 'whole-period');--> statement-breakpoint
CREATE TYPE "public"."payroll_run_status" AS ENUM('computing', 'draft', 'failed', 'approved', 'exported');--> statement-breakpoint
CREATE TYPE "public"."product_charge_mode" AS ENUM('none', 'actual-cost', 'percent-of-price', 'fixed-per-colour-service');--> statement-breakpoint
CREATE TABLE "pay_periods" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"start_date" date NOT NULL,
	"end_date" date NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pay_plan_assignments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"staff_id" uuid NOT NULL,
	"plan_id" uuid NOT NULL,
	"effective_from" date NOT NULL,
	"created_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pay_plan_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"plan_id" uuid NOT NULL,
	"effective_from" date NOT NULL,
	"tier_mode" "pay_tier_mode" NOT NULL,
	"tiers" jsonb NOT NULL,
	"product_charge_mode" "product_charge_mode" NOT NULL,
	"product_charge_value" numeric(12, 4),
	"product_charge_markup" numeric(12, 4),
	"retail_rate" numeric(12, 4) NOT NULL,
	"hourly_rate" numeric(12, 2),
	"created_by_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pay_plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "pay_schedules" (
	"organisation_id" uuid PRIMARY KEY NOT NULL,
	"frequency" "pay_frequency" NOT NULL,
	"anchor_date" date NOT NULL,
	"workweek_starts_on" integer NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payroll_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"run_id" uuid NOT NULL,
	"organisation_id" uuid NOT NULL,
	"staff_id" uuid NOT NULL,
	"branch_id" uuid NOT NULL,
	"staff_name" text NOT NULL,
	"branch_name" text NOT NULL,
	"plan_version_id" uuid NOT NULL,
	"input" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"hours" numeric(12, 3) NOT NULL,
	"service_revenue" numeric(12, 2) NOT NULL,
	"product_charge" numeric(12, 2) NOT NULL,
	"commissionable_revenue" numeric(12, 2) NOT NULL,
	"service_commission" numeric(12, 2) NOT NULL,
	"retail_commission" numeric(12, 2) NOT NULL,
	"hourly_pay" numeric(12, 2) NOT NULL,
	"tips" numeric(12, 2) NOT NULL,
	"minimum_wage_top_up" numeric(12, 2) NOT NULL,
	"overtime_premium" numeric(12, 2) NOT NULL,
	"gross_pay" numeric(12, 2) NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payroll_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"period_id" uuid NOT NULL,
	"status" "payroll_run_status" DEFAULT 'computing' NOT NULL,
	"total_staff" integer DEFAULT 0 NOT NULL,
	"processed_staff" integer DEFAULT 0 NOT NULL,
	"error" text,
	"gross_pay" numeric(12, 2),
	"started_by_id" uuid NOT NULL,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"completed_at" timestamp with time zone,
	"approved_by_id" uuid,
	"approved_at" timestamp with time zone,
	"exported_by_id" uuid,
	"exported_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "timesheet_entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"staff_id" uuid NOT NULL,
	"branch_id" uuid NOT NULL,
	"work_date" date NOT NULL,
	"hours" numeric(12, 3) NOT NULL,
	"updated_by_id" uuid NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "pay_periods" ADD CONSTRAINT "pay_periods_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pay_plan_assignments" ADD CONSTRAINT "pay_plan_assignments_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pay_plan_assignments" ADD CONSTRAINT "pay_plan_assignments_staff_id_staff_id_fk" FOREIGN KEY ("staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pay_plan_assignments" ADD CONSTRAINT "pay_plan_assignments_plan_id_pay_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."pay_plans"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pay_plan_assignments" ADD CONSTRAINT "pay_plan_assignments_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pay_plan_versions" ADD CONSTRAINT "pay_plan_versions_plan_id_pay_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."pay_plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pay_plan_versions" ADD CONSTRAINT "pay_plan_versions_created_by_id_users_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pay_plans" ADD CONSTRAINT "pay_plans_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pay_schedules" ADD CONSTRAINT "pay_schedules_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_lines" ADD CONSTRAINT "payroll_lines_run_id_payroll_runs_id_fk" FOREIGN KEY ("run_id") REFERENCES "public"."payroll_runs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_lines" ADD CONSTRAINT "payroll_lines_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_lines" ADD CONSTRAINT "payroll_lines_staff_id_staff_id_fk" FOREIGN KEY ("staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_lines" ADD CONSTRAINT "payroll_lines_branch_id_branches_id_fk" FOREIGN KEY ("branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_lines" ADD CONSTRAINT "payroll_lines_plan_version_id_pay_plan_versions_id_fk" FOREIGN KEY ("plan_version_id") REFERENCES "public"."pay_plan_versions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_runs" ADD CONSTRAINT "payroll_runs_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_runs" ADD CONSTRAINT "payroll_runs_period_id_pay_periods_id_fk" FOREIGN KEY ("period_id") REFERENCES "public"."pay_periods"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_runs" ADD CONSTRAINT "payroll_runs_started_by_id_users_id_fk" FOREIGN KEY ("started_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_runs" ADD CONSTRAINT "payroll_runs_approved_by_id_users_id_fk" FOREIGN KEY ("approved_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payroll_runs" ADD CONSTRAINT "payroll_runs_exported_by_id_users_id_fk" FOREIGN KEY ("exported_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "timesheet_entries" ADD CONSTRAINT "timesheet_entries_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "timesheet_entries" ADD CONSTRAINT "timesheet_entries_staff_id_staff_id_fk" FOREIGN KEY ("staff_id") REFERENCES "public"."staff"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "timesheet_entries" ADD CONSTRAINT "timesheet_entries_branch_id_branches_id_fk" FOREIGN KEY ("branch_id") REFERENCES "public"."branches"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "timesheet_entries" ADD CONSTRAINT "timesheet_entries_updated_by_id_users_id_fk" FOREIGN KEY ("updated_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "pay_periods_organisation_start_unique" ON "pay_periods" USING btree ("organisation_id","start_date");--> statement-breakpoint
CREATE UNIQUE INDEX "pay_plan_assignments_staff_from_unique" ON "pay_plan_assignments" USING btree ("staff_id","effective_from");--> statement-breakpoint
CREATE UNIQUE INDEX "pay_plan_versions_plan_from_unique" ON "pay_plan_versions" USING btree ("plan_id","effective_from");--> statement-breakpoint
CREATE UNIQUE INDEX "pay_plans_organisation_name_unique" ON "pay_plans" USING btree ("organisation_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "payroll_lines_run_staff_unique" ON "payroll_lines" USING btree ("run_id","staff_id");--> statement-breakpoint
CREATE INDEX "payroll_lines_staff_idx" ON "payroll_lines" USING btree ("staff_id");--> statement-breakpoint
CREATE UNIQUE INDEX "payroll_runs_period_unique" ON "payroll_runs" USING btree ("period_id");--> statement-breakpoint
CREATE UNIQUE INDEX "timesheet_entries_staff_branch_day_unique" ON "timesheet_entries" USING btree ("staff_id","branch_id","work_date");--> statement-breakpoint
CREATE INDEX "timesheet_entries_organisation_day_idx" ON "timesheet_entries" USING btree ("organisation_id","work_date");