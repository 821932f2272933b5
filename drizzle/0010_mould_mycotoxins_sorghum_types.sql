ALTER TYPE "public"."forage_type" ADD VALUE 'sudangrass' BEFORE 'alfalfa_grass_mix';--> statement-breakpoint
ALTER TYPE "public"."forage_type" ADD VALUE 'sorghum_sudangrass' BEFORE 'alfalfa_grass_mix';--> statement-breakpoint
ALTER TYPE "public"."forage_type" ADD VALUE 'forage_sorghum' BEFORE 'alfalfa_grass_mix';--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD COLUMN "mould_cfu_per_g" double precision;--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD COLUMN "visual_mould_score" text;--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD COLUMN "aflatoxin_ppb" double precision;--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD COLUMN "don_ppm" double precision;--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD COLUMN "fumonisin_ppm" double precision;--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD CONSTRAINT "lab_mould_count_range" CHECK ("lab_analyses"."mould_cfu_per_g" is null or "lab_analyses"."mould_cfu_per_g" between 0 and 1e10);--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD CONSTRAINT "lab_visual_mould_score" CHECK ("lab_analyses"."visual_mould_score" is null or "lab_analyses"."visual_mould_score" in ('none', 'slight', 'moderate', 'heavy'));--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD CONSTRAINT "lab_aflatoxin_range" CHECK ("lab_analyses"."aflatoxin_ppb" is null or "lab_analyses"."aflatoxin_ppb" between 0 and 10000);--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD CONSTRAINT "lab_don_range" CHECK ("lab_analyses"."don_ppm" is null or "lab_analyses"."don_ppm" between 0 and 1000);--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD CONSTRAINT "lab_fumonisin_range" CHECK ("lab_analyses"."fumonisin_ppm" is null or "lab_analyses"."fumonisin_ppm" between 0 and 1000);