ALTER TABLE "lots" ADD COLUMN "drought_stressed" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "lots" ADD COLUMN "heavy_nitrogen" boolean DEFAULT false NOT NULL;