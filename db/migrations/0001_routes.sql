CREATE TYPE "public"."unit_system" AS ENUM('metric', 'imperial');--> statement-breakpoint
CREATE TABLE "routes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"organisation_id" uuid NOT NULL,
	"name" text NOT NULL,
	"file_name" text NOT NULL,
	"content_sha256" text NOT NULL,
	"gpx" "bytea" NOT NULL,
	"size_bytes" integer NOT NULL,
	"track_id" text NOT NULL,
	"tracks" jsonb NOT NULL,
	"point_count" integer NOT NULL,
	"sample_count" integer NOT NULL,
	"step_m" double precision NOT NULL,
	"length_m" double precision NOT NULL,
	"total_ascent_m" double precision NOT NULL,
	"total_descent_m" double precision NOT NULL,
	"highest_m" double precision NOT NULL,
	"lowest_m" double precision NOT NULL,
	"descent_count" integer NOT NULL,
	"steepest_grade" double precision,
	"stats" jsonb NOT NULL,
	"descents" jsonb NOT NULL,
	"warnings" jsonb NOT NULL,
	"waypoints" jsonb NOT NULL,
	"profile" "bytea" NOT NULL,
	"view" jsonb NOT NULL,
	"uploaded_by_user_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "routes_length_finite" CHECK (length_m > '-Infinity'::float8 and length_m < 'Infinity'::float8),
	CONSTRAINT "routes_ascent_finite" CHECK (total_ascent_m > '-Infinity'::float8 and total_ascent_m < 'Infinity'::float8),
	CONSTRAINT "routes_descent_finite" CHECK (total_descent_m > '-Infinity'::float8 and total_descent_m < 'Infinity'::float8),
	CONSTRAINT "routes_highest_finite" CHECK (highest_m > '-Infinity'::float8 and highest_m < 'Infinity'::float8),
	CONSTRAINT "routes_lowest_finite" CHECK (lowest_m > '-Infinity'::float8 and lowest_m < 'Infinity'::float8),
	CONSTRAINT "routes_step_finite" CHECK (step_m > '-Infinity'::float8 and step_m < 'Infinity'::float8),
	CONSTRAINT "routes_steepest_finite" CHECK (steepest_grade is null or (steepest_grade > '-Infinity'::float8 and steepest_grade < 'Infinity'::float8))
);
--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "unit_system" "unit_system" DEFAULT 'metric' NOT NULL;--> statement-breakpoint
ALTER TABLE "routes" ADD CONSTRAINT "routes_organisation_id_organisations_id_fk" FOREIGN KEY ("organisation_id") REFERENCES "public"."organisations"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "routes" ADD CONSTRAINT "routes_uploaded_by_user_id_users_id_fk" FOREIGN KEY ("uploaded_by_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "routes_content_unique" ON "routes" USING btree ("organisation_id","content_sha256","track_id");--> statement-breakpoint
CREATE INDEX "routes_organisation_idx" ON "routes" USING btree ("organisation_id","created_at");