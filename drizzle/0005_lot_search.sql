CREATE TABLE "lot_search" (
	"lot_id" integer PRIMARY KEY NOT NULL,
	"farm_id" integer NOT NULL,
	"title" text NOT NULL,
	"farm_name" text NOT NULL,
	"published_at" timestamp with time zone,
	"forage_type" "forage_type" NOT NULL,
	"bale_type" "bale_type" NOT NULL,
	"cutting" integer NOT NULL,
	"harvest_year" integer NOT NULL,
	"price_cents_per_ton" integer NOT NULL,
	"price_cents_per_dm_ton" double precision NOT NULL,
	"tons_available" double precision NOT NULL,
	"rfv" double precision NOT NULL,
	"rfq" double precision,
	"crude_protein_pct" double precision NOT NULL,
	"adf_pct" double precision NOT NULL,
	"ndf_pct" double precision NOT NULL,
	"nsc_pct" double precision,
	"sampling_compliant" boolean NOT NULL,
	"lab_verified" boolean NOT NULL,
	"latitude" double precision NOT NULL,
	"longitude" double precision NOT NULL
);
--> statement-breakpoint
ALTER TABLE "lot_search" ADD CONSTRAINT "lot_search_lot_id_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."lots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "lot_search_newest_idx" ON "lot_search" USING btree ("published_at" DESC NULLS FIRST,"lot_id" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "lot_search_price_idx" ON "lot_search" USING btree ("price_cents_per_ton","lot_id" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "lot_search_price_dm_idx" ON "lot_search" USING btree ("price_cents_per_dm_ton","lot_id" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "lot_search_rfv_idx" ON "lot_search" USING btree ("rfv" DESC NULLS LAST,"lot_id" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "lot_search_protein_idx" ON "lot_search" USING btree ("crude_protein_pct" DESC NULLS LAST,"lot_id" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "lot_search_forage_price_idx" ON "lot_search" USING btree ("forage_type","price_cents_per_ton");--> statement-breakpoint
CREATE INDEX "lot_search_place_idx" ON "lot_search" USING gist (point("longitude", "latitude"));