CREATE TYPE "public"."driving_style" AS ENUM('steady', 'snub');--> statement-breakpoint
CREATE TYPE "public"."speed_policy" AS ENUM('standard', 'cautious', 'cap');--> statement-breakpoint
CREATE TABLE "heat_runs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"plan_rig_id" uuid NOT NULL,
	"inputs_hash" text NOT NULL,
	"model_version" text NOT NULL,
	"result" jsonb NOT NULL,
	"computed_ms" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plan_rigs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"plan_id" uuid NOT NULL,
	"rig_id" uuid NOT NULL,
	"label" text NOT NULL,
	"position" integer NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"name" text NOT NULL,
	"route_id" uuid NOT NULL,
	"trip_date" date,
	"ambient_c" double precision NOT NULL,
	"start_temp_c" double precision,
	"speed_policy" "speed_policy" DEFAULT 'standard' NOT NULL,
	"speed_cap_ms" double precision,
	"driving_style" "driving_style" DEFAULT 'steady' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_by_user_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "scenarios" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"plan_id" uuid NOT NULL,
	"name" text NOT NULL,
	"settings" jsonb NOT NULL,
	"created_by_user_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "heat_runs" ADD CONSTRAINT "heat_runs_plan_rig_id_plan_rigs_id_fk" FOREIGN KEY ("plan_rig_id") REFERENCES "public"."plan_rigs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_rigs" ADD CONSTRAINT "plan_rigs_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_rigs" ADD CONSTRAINT "plan_rigs_rig_id_rigs_id_fk" FOREIGN KEY ("rig_id") REFERENCES "public"."rigs"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_route_id_routes_id_fk" FOREIGN KEY ("route_id") REFERENCES "public"."routes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_created_by_user_id_users_id_fk" FOREIGN KEY ("created_by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "scenarios" ADD CONSTRAINT "scenarios_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "scenarios" ADD CONSTRAINT "scenarios_created_by_user_id_users_id_fk" FOREIGN KEY ("created_by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "heat_runs_inputs_unique" ON "heat_runs" USING btree ("plan_rig_id","inputs_hash");--> statement-breakpoint
CREATE INDEX "plan_rigs_plan_idx" ON "plan_rigs" USING btree ("plan_id","position");--> statement-breakpoint
CREATE INDEX "plan_rigs_rig_idx" ON "plan_rigs" USING btree ("rig_id");--> statement-breakpoint
CREATE INDEX "plans_organisation_idx" ON "plans" USING btree ("organisation_id","updated_at");--> statement-breakpoint
CREATE INDEX "plans_route_idx" ON "plans" USING btree ("route_id");--> statement-breakpoint
CREATE INDEX "scenarios_plan_idx" ON "scenarios" USING btree ("plan_id","created_at");