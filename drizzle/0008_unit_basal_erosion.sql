ALTER TABLE "units" ADD COLUMN "basal_erosion_m" double precision;--> statement-breakpoint
ALTER TABLE "units" ADD CONSTRAINT "units_basal_erosion_not_negative" CHECK ("units"."basal_erosion_m" >= 0);