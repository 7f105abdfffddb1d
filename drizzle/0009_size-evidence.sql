ALTER TABLE "segments" ADD COLUMN "down_dip_width_km" double precision;--> statement-breakpoint
ALTER TABLE "event_horizons" ADD COLUMN "subsidence_m" double precision;--> statement-breakpoint
ALTER TABLE "event_horizons" ADD COLUMN "subsidence_error_m" double precision;--> statement-breakpoint
ALTER TABLE "event_horizons" ADD COLUMN "displacement_m" double precision;--> statement-breakpoint
ALTER TABLE "event_horizons" ADD COLUMN "displacement_error_m" double precision;--> statement-breakpoint
ALTER TABLE "segments" ADD CONSTRAINT "segments_width_positive" CHECK ("segments"."down_dip_width_km" is null or "segments"."down_dip_width_km" > 0);--> statement-breakpoint
ALTER TABLE "event_horizons" ADD CONSTRAINT "event_horizons_subsidence_error_positive" CHECK ("event_horizons"."subsidence_error_m" is null or "event_horizons"."subsidence_error_m" > 0);--> statement-breakpoint
ALTER TABLE "event_horizons" ADD CONSTRAINT "event_horizons_displacement_error_positive" CHECK ("event_horizons"."displacement_error_m" is null or "event_horizons"."displacement_error_m" > 0);