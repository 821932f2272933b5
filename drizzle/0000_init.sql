CREATE TYPE "public"."analysis_method" AS ENUM('nirs', 'wet_chemistry');--> statement-breakpoint
CREATE TYPE "public"."bale_type" AS ENUM('small_square_2_string', 'small_square_3_string', 'large_square_3x3x8', 'large_square_3x4x8', 'large_square_4x4x8', 'round_4x4', 'round_4x5', 'round_5x5', 'round_5x6');--> statement-breakpoint
CREATE TYPE "public"."claim_status" AS ENUM('open', 'upheld', 'declined', 'withdrawn');--> statement-breakpoint
CREATE TYPE "public"."core_position" AS ENUM('butt-end-centre', 'round-side', 'round-flat-end', 'bale-side', 'grab');--> statement-breakpoint
CREATE TYPE "public"."delivery_method" AS ENUM('delivery', 'pickup');--> statement-breakpoint
CREATE TYPE "public"."delivery_status" AS ENUM('proposed', 'confirmed', 'in_transit', 'done', 'missed');--> statement-breakpoint
CREATE TYPE "public"."forage_class" AS ENUM('legume', 'grass', 'mixed');--> statement-breakpoint
CREATE TYPE "public"."forage_type" AS ENUM('alfalfa', 'clover', 'timothy', 'orchardgrass', 'bermudagrass', 'teff', 'bromegrass', 'fescue', 'oat', 'alfalfa_grass_mix', 'grass_mix');--> statement-breakpoint
CREATE TYPE "public"."lot_status" AS ENUM('draft', 'in_review', 'returned', 'listed', 'withdrawn', 'sold_out');--> statement-breakpoint
CREATE TYPE "public"."order_status" AS ENUM('awaiting_payment', 'paid', 'scheduled', 'delivered', 'claimed', 'refunded', 'cancelled', 'completed');--> statement-breakpoint
CREATE TYPE "public"."payout_status" AS ENUM('held', 'due', 'sent', 'failed');--> statement-breakpoint
CREATE TYPE "public"."storage_kind" AS ENUM('barn', 'tarped', 'outside');--> statement-breakpoint
CREATE TYPE "public"."user_role" AS ENUM('buyer', 'grower', 'admin');--> statement-breakpoint
CREATE TYPE "public"."verification_state" AS ENUM('pending', 'verified', 'rejected');--> statement-breakpoint
CREATE TYPE "public"."pricing_unit" AS ENUM('ton', 'bale');--> statement-breakpoint
CREATE TABLE "session" (
	"sid" text PRIMARY KEY NOT NULL,
	"sess" json NOT NULL,
	"expire" timestamp (6) NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "users_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"email" text NOT NULL,
	"password_hash" text NOT NULL,
	"display_name" text NOT NULL,
	"role" "user_role" DEFAULT 'buyer' NOT NULL,
	"zip" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"disabled_at" timestamp with time zone,
	CONSTRAINT "users_email_shape" CHECK ("users"."email" ~ '^[^@\s]+@[^@\s]+$'),
	CONSTRAINT "users_display_name_nonempty" CHECK (length(trim("users"."display_name")) > 0)
);
--> statement-breakpoint
CREATE TABLE "farms" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "farms_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"owner_id" integer NOT NULL,
	"name" text NOT NULL,
	"address_line" text NOT NULL,
	"city" text NOT NULL,
	"state" text NOT NULL,
	"zip" text NOT NULL,
	"latitude" double precision NOT NULL,
	"longitude" double precision NOT NULL,
	"delivery_radius_mi" integer DEFAULT 100 NOT NULL,
	"loading_facilities" text DEFAULT '' NOT NULL,
	"pickup_hours" text DEFAULT '' NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"payout_account_id" text,
	"payouts_enabled" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "farms_zip_shape" CHECK ("farms"."zip" ~ '^[0-9]{5}$'),
	CONSTRAINT "farms_lat_range" CHECK ("farms"."latitude" between -90 and 90),
	CONSTRAINT "farms_lon_range" CHECK ("farms"."longitude" between -180 and 180),
	CONSTRAINT "farms_radius_range" CHECK ("farms"."delivery_radius_mi" between 0 and 3000)
);
--> statement-breakpoint
CREATE TABLE "stored_files" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "stored_files_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"owner_id" integer,
	"storage_key" text NOT NULL,
	"original_name" text NOT NULL,
	"mime_type" text NOT NULL,
	"size_bytes" bigint NOT NULL,
	"sha256" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stored_files_storageKey_unique" UNIQUE("storage_key"),
	CONSTRAINT "stored_files_size_positive" CHECK ("stored_files"."size_bytes" > 0)
);
--> statement-breakpoint
CREATE TABLE "lots" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "lots_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"title" text NOT NULL,
	"field_name" text NOT NULL,
	"cutting" integer NOT NULL,
	"forage_type" "forage_type" NOT NULL,
	"forage_class" "forage_class" NOT NULL,
	"mix_description" text DEFAULT '' NOT NULL,
	"harvest_started_on" date NOT NULL,
	"harvest_ended_on" date NOT NULL,
	"storage" "storage_kind" NOT NULL,
	"moisture_at_baling_pct" double precision,
	"bale_type" "bale_type" NOT NULL,
	"bale_count" integer NOT NULL,
	"bales_available" integer NOT NULL,
	"avg_bale_weight_lb" double precision NOT NULL,
	"pricing_unit" "pricing_unit" DEFAULT 'ton' NOT NULL,
	"price_cents_per_ton" integer NOT NULL,
	"price_cents_per_bale" integer,
	"min_order_tons" double precision DEFAULT 0 NOT NULL,
	"freight_cents_per_loaded_mile" integer,
	"delivery_terms" text DEFAULT '' NOT NULL,
	"pickup_allowed" boolean DEFAULT true NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"status" "lot_status" DEFAULT 'draft' NOT NULL,
	"draft_step" integer DEFAULT 0 NOT NULL,
	"review_note" text,
	"reviewed_by" integer,
	"reviewed_at" timestamp with time zone,
	"published_at" timestamp with time zone,
	"view_count" integer DEFAULT 0 NOT NULL,
	"copied_from_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "lots_cutting_range" CHECK ("lots"."cutting" between 1 and 8),
	CONSTRAINT "lots_harvest_order" CHECK ("lots"."harvest_ended_on" >= "lots"."harvest_started_on"),
	CONSTRAINT "lots_moisture_range" CHECK ("lots"."moisture_at_baling_pct" is null or "lots"."moisture_at_baling_pct" between 0 and 60),
	CONSTRAINT "lots_bale_count_positive" CHECK ("lots"."bale_count" > 0 and "lots"."bale_count" <= 100000),
	CONSTRAINT "lots_available_range" CHECK ("lots"."bales_available" between 0 and "lots"."bale_count"),
	CONSTRAINT "lots_bale_weight_range" CHECK ("lots"."avg_bale_weight_lb" between 20 and 2500),
	CONSTRAINT "lots_price_positive" CHECK ("lots"."price_cents_per_ton" > 0),
	CONSTRAINT "lots_bale_price_positive" CHECK ("lots"."price_cents_per_bale" is null or "lots"."price_cents_per_bale" > 0),
	CONSTRAINT "lots_min_order_range" CHECK ("lots"."min_order_tons" >= 0),
	CONSTRAINT "lots_freight_range" CHECK ("lots"."freight_cents_per_loaded_mile" is null or "lots"."freight_cents_per_loaded_mile" >= 0),
	CONSTRAINT "lots_title_nonempty" CHECK (length(trim("lots"."title")) > 0)
);
--> statement-breakpoint
CREATE TABLE "sampling_records" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "sampling_records_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"lot_id" integer NOT NULL,
	"sampled_on" date NOT NULL,
	"cores_taken" integer NOT NULL,
	"bales_sampled" integer NOT NULL,
	"probe_diameter_in" double precision NOT NULL,
	"probe_length_in" double precision NOT NULL,
	"core_position" "core_position" NOT NULL,
	"sampled_by" text NOT NULL,
	"compliant" boolean NOT NULL,
	"findings" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sampling_records_lotId_unique" UNIQUE("lot_id"),
	CONSTRAINT "sampling_cores_range" CHECK ("sampling_records"."cores_taken" between 1 and 500),
	CONSTRAINT "sampling_bales_range" CHECK ("sampling_records"."bales_sampled" between 1 and 500),
	CONSTRAINT "sampling_probe_diameter_range" CHECK ("sampling_records"."probe_diameter_in" > 0 and "sampling_records"."probe_diameter_in" <= 3),
	CONSTRAINT "sampling_probe_length_range" CHECK ("sampling_records"."probe_length_in" > 0 and "sampling_records"."probe_length_in" <= 60)
);
--> statement-breakpoint
CREATE TABLE "lab_analyses" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "lab_analyses_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"lot_id" integer NOT NULL,
	"is_current" boolean DEFAULT true NOT NULL,
	"lab_name" text NOT NULL,
	"lab_certified" boolean NOT NULL,
	"report_number" text DEFAULT '' NOT NULL,
	"report_date" date NOT NULL,
	"method" "analysis_method" DEFAULT 'nirs' NOT NULL,
	"report_file_id" integer,
	"entered_basis" text DEFAULT 'dm' NOT NULL,
	"dry_matter_pct" double precision NOT NULL,
	"crude_protein_pct" double precision NOT NULL,
	"adf_pct" double precision NOT NULL,
	"ndf_pct" double precision NOT NULL,
	"ndfd48_pct" double precision,
	"fat_pct" double precision,
	"ash_pct" double precision,
	"esc_pct" double precision,
	"wsc_pct" double precision,
	"starch_pct" double precision,
	"calcium_pct" double precision,
	"phosphorus_pct" double precision,
	"reported_rfv" double precision,
	"rfv" double precision NOT NULL,
	"rfq" double precision,
	"tdn_pct" double precision NOT NULL,
	"tdn_method" text NOT NULL,
	"de_mcal_per_kg_dm" double precision NOT NULL,
	"de_method" text NOT NULL,
	"nsc_pct" double precision,
	"usda_grade" text NOT NULL,
	"afgc_grade" text,
	"findings" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"verification" "verification_state" DEFAULT 'pending' NOT NULL,
	"verified_by" integer,
	"verified_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "lab_dm_range" CHECK ("lab_analyses"."dry_matter_pct" > 0 and "lab_analyses"."dry_matter_pct" <= 100),
	CONSTRAINT "lab_cp_range" CHECK ("lab_analyses"."crude_protein_pct" is null or "lab_analyses"."crude_protein_pct" between 0 and 100),
	CONSTRAINT "lab_adf_range" CHECK ("lab_analyses"."adf_pct" is null or "lab_analyses"."adf_pct" between 0 and 100),
	CONSTRAINT "lab_ndf_range" CHECK ("lab_analyses"."ndf_pct" > 0 and "lab_analyses"."ndf_pct" <= 100),
	CONSTRAINT "lab_ndf_above_adf" CHECK ("lab_analyses"."ndf_pct" > "lab_analyses"."adf_pct"),
	CONSTRAINT "lab_ndfd_range" CHECK ("lab_analyses"."ndfd48_pct" is null or "lab_analyses"."ndfd48_pct" between 0 and 100),
	CONSTRAINT "lab_fat_range" CHECK ("lab_analyses"."fat_pct" is null or "lab_analyses"."fat_pct" between 0 and 100),
	CONSTRAINT "lab_ash_range" CHECK ("lab_analyses"."ash_pct" is null or "lab_analyses"."ash_pct" between 0 and 100),
	CONSTRAINT "lab_esc_range" CHECK ("lab_analyses"."esc_pct" is null or "lab_analyses"."esc_pct" between 0 and 100),
	CONSTRAINT "lab_wsc_range" CHECK ("lab_analyses"."wsc_pct" is null or "lab_analyses"."wsc_pct" between 0 and 100),
	CONSTRAINT "lab_starch_range" CHECK ("lab_analyses"."starch_pct" is null or "lab_analyses"."starch_pct" between 0 and 100),
	CONSTRAINT "lab_ca_range" CHECK ("lab_analyses"."calcium_pct" is null or "lab_analyses"."calcium_pct" between 0 and 100),
	CONSTRAINT "lab_p_range" CHECK ("lab_analyses"."phosphorus_pct" is null or "lab_analyses"."phosphorus_pct" between 0 and 100),
	CONSTRAINT "lab_rfv_range" CHECK ("lab_analyses"."rfv" > 0 and "lab_analyses"."rfv" < 1000)
);
--> statement-breakpoint
CREATE TABLE "photos" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "photos_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"lot_id" integer NOT NULL,
	"original_file_id" integer,
	"position" integer DEFAULT 0 NOT NULL,
	"is_cover" boolean DEFAULT false NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"alt_text" text DEFAULT '' NOT NULL,
	"variants" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "photos_dimensions_positive" CHECK ("photos"."width" > 0 and "photos"."height" > 0)
);
--> statement-breakpoint
CREATE TABLE "orders" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "orders_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"buyer_id" integer NOT NULL,
	"lot_id" integer NOT NULL,
	"farm_id" integer NOT NULL,
	"status" "order_status" DEFAULT 'awaiting_payment' NOT NULL,
	"bales" integer NOT NULL,
	"tons" double precision NOT NULL,
	"price_cents_per_ton" integer NOT NULL,
	"goods_cents" integer NOT NULL,
	"freight_cents" integer DEFAULT 0 NOT NULL,
	"platform_fee_cents" integer DEFAULT 0 NOT NULL,
	"total_cents" integer NOT NULL,
	"currency" text DEFAULT 'usd' NOT NULL,
	"method" "delivery_method" NOT NULL,
	"delivery_zip" text,
	"delivery_address" text,
	"distance_mi" double precision,
	"payment_intent_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "orders_paymentIntentId_unique" UNIQUE("payment_intent_id"),
	CONSTRAINT "orders_bales_positive" CHECK ("orders"."bales" > 0),
	CONSTRAINT "orders_tons_positive" CHECK ("orders"."tons" > 0),
	CONSTRAINT "orders_amounts_nonnegative" CHECK ("orders"."goods_cents" >= 0 and "orders"."freight_cents" >= 0 and "orders"."platform_fee_cents" >= 0),
	CONSTRAINT "orders_total_sum" CHECK ("orders"."total_cents" = "orders"."goods_cents" + "orders"."freight_cents" + "orders"."platform_fee_cents")
);
--> statement-breakpoint
CREATE TABLE "deliveries" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "deliveries_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"order_id" integer NOT NULL,
	"method" "delivery_method" NOT NULL,
	"status" "delivery_status" DEFAULT 'proposed' NOT NULL,
	"window_start" timestamp with time zone NOT NULL,
	"window_end" timestamp with time zone NOT NULL,
	"load_number" integer DEFAULT 1 NOT NULL,
	"scale_ticket_lb" double precision,
	"notes" text DEFAULT '' NOT NULL,
	"completed_at" timestamp with time zone,
	CONSTRAINT "deliveries_window_order" CHECK ("deliveries"."window_end" > "deliveries"."window_start"),
	CONSTRAINT "deliveries_ticket_positive" CHECK ("deliveries"."scale_ticket_lb" is null or "deliveries"."scale_ticket_lb" > 0)
);
--> statement-breakpoint
CREATE TABLE "quality_claims" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "quality_claims_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"order_id" integer NOT NULL,
	"opened_by" integer NOT NULL,
	"reason" text NOT NULL,
	"evidence_file_id" integer,
	"status" "claim_status" DEFAULT 'open' NOT NULL,
	"resolution" text,
	"refund_cents" integer DEFAULT 0 NOT NULL,
	"resolved_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"resolved_at" timestamp with time zone,
	CONSTRAINT "quality_claims_refund_nonnegative" CHECK ("quality_claims"."refund_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "payouts" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "payouts_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"order_id" integer NOT NULL,
	"amount_cents" integer NOT NULL,
	"status" "payout_status" DEFAULT 'held' NOT NULL,
	"transfer_id" text,
	"failure_reason" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	CONSTRAINT "payouts_orderId_unique" UNIQUE("order_id"),
	CONSTRAINT "payouts_transferId_unique" UNIQUE("transfer_id"),
	CONSTRAINT "payouts_amount_nonnegative" CHECK ("payouts"."amount_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "audit_events" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "audit_events_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"actor_id" integer,
	"action" text NOT NULL,
	"entity_type" text NOT NULL,
	"entity_id" text NOT NULL,
	"data" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "saved_searches" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "saved_searches_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"user_id" integer NOT NULL,
	"name" text NOT NULL,
	"query" jsonb NOT NULL,
	"alerts" boolean DEFAULT true NOT NULL,
	"last_alerted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "farms" ADD CONSTRAINT "farms_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stored_files" ADD CONSTRAINT "stored_files_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lots" ADD CONSTRAINT "lots_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lots" ADD CONSTRAINT "lots_reviewed_by_users_id_fk" FOREIGN KEY ("reviewed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sampling_records" ADD CONSTRAINT "sampling_records_lot_id_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."lots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD CONSTRAINT "lab_analyses_lot_id_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."lots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD CONSTRAINT "lab_analyses_report_file_id_stored_files_id_fk" FOREIGN KEY ("report_file_id") REFERENCES "public"."stored_files"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lab_analyses" ADD CONSTRAINT "lab_analyses_verified_by_users_id_fk" FOREIGN KEY ("verified_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_lot_id_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."lots"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_original_file_id_stored_files_id_fk" FOREIGN KEY ("original_file_id") REFERENCES "public"."stored_files"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_buyer_id_users_id_fk" FOREIGN KEY ("buyer_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_lot_id_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."lots"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "deliveries" ADD CONSTRAINT "deliveries_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quality_claims" ADD CONSTRAINT "quality_claims_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quality_claims" ADD CONSTRAINT "quality_claims_opened_by_users_id_fk" FOREIGN KEY ("opened_by") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quality_claims" ADD CONSTRAINT "quality_claims_evidence_file_id_stored_files_id_fk" FOREIGN KEY ("evidence_file_id") REFERENCES "public"."stored_files"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quality_claims" ADD CONSTRAINT "quality_claims_resolved_by_users_id_fk" FOREIGN KEY ("resolved_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payouts" ADD CONSTRAINT "payouts_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payouts" ADD CONSTRAINT "payouts_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saved_searches" ADD CONSTRAINT "saved_searches_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "IDX_session_expire" ON "session" USING btree ("expire");--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_lower_key" ON "users" USING btree (lower("email"));--> statement-breakpoint
CREATE INDEX "users_role_idx" ON "users" USING btree ("role");--> statement-breakpoint
CREATE INDEX "farms_owner_idx" ON "farms" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "farms_lat_lon_idx" ON "farms" USING btree ("latitude","longitude");--> statement-breakpoint
CREATE INDEX "stored_files_owner_idx" ON "stored_files" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "lots_farm_idx" ON "lots" USING btree ("farm_id");--> statement-breakpoint
CREATE INDEX "lots_status_forage_idx" ON "lots" USING btree ("status","forage_type");--> statement-breakpoint
CREATE INDEX "lots_status_bale_idx" ON "lots" USING btree ("status","bale_type");--> statement-breakpoint
CREATE INDEX "lots_status_price_idx" ON "lots" USING btree ("status","price_cents_per_ton");--> statement-breakpoint
CREATE INDEX "lots_status_published_idx" ON "lots" USING btree ("status","published_at");--> statement-breakpoint
CREATE UNIQUE INDEX "lab_analyses_one_current_per_lot" ON "lab_analyses" USING btree ("lot_id") WHERE "lab_analyses"."is_current";--> statement-breakpoint
CREATE INDEX "lab_analyses_rfv_idx" ON "lab_analyses" USING btree ("rfv") WHERE "lab_analyses"."is_current";--> statement-breakpoint
CREATE INDEX "lab_analyses_cp_idx" ON "lab_analyses" USING btree ("crude_protein_pct") WHERE "lab_analyses"."is_current";--> statement-breakpoint
CREATE INDEX "lab_analyses_nsc_idx" ON "lab_analyses" USING btree ("nsc_pct") WHERE "lab_analyses"."is_current";--> statement-breakpoint
CREATE INDEX "photos_lot_position_idx" ON "photos" USING btree ("lot_id","position");--> statement-breakpoint
CREATE UNIQUE INDEX "photos_one_cover_per_lot" ON "photos" USING btree ("lot_id") WHERE "photos"."is_cover";--> statement-breakpoint
CREATE INDEX "orders_buyer_idx" ON "orders" USING btree ("buyer_id","created_at");--> statement-breakpoint
CREATE INDEX "orders_farm_idx" ON "orders" USING btree ("farm_id","created_at");--> statement-breakpoint
CREATE INDEX "orders_lot_idx" ON "orders" USING btree ("lot_id");--> statement-breakpoint
CREATE INDEX "deliveries_order_idx" ON "deliveries" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "deliveries_window_idx" ON "deliveries" USING btree ("window_start");--> statement-breakpoint
CREATE INDEX "quality_claims_order_idx" ON "quality_claims" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "quality_claims_status_idx" ON "quality_claims" USING btree ("status");--> statement-breakpoint
CREATE INDEX "payouts_farm_status_idx" ON "payouts" USING btree ("farm_id","status");--> statement-breakpoint
CREATE INDEX "audit_events_entity_idx" ON "audit_events" USING btree ("entity_type","entity_id");--> statement-breakpoint
CREATE INDEX "audit_events_created_idx" ON "audit_events" USING btree ("created_at");--> statement-breakpoint
CREATE INDEX "saved_searches_user_idx" ON "saved_searches" USING btree ("user_id");