ALTER TABLE "samples" ADD COLUMN "delta_r_source" text;--> statement-breakpoint
ALTER TABLE "samples" ADD COLUMN "inheritance_scale_years" double precision;--> statement-breakpoint
ALTER TABLE "samples" ADD CONSTRAINT "samples_inheritance_scale_range" CHECK ("samples"."inheritance_scale_years" is null or ("samples"."inheritance_scale_years" >= 1 and "samples"."inheritance_scale_years" <= 10000));