CREATE TABLE "payout_adjustments" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "payout_adjustments_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"farm_id" integer NOT NULL,
	"order_id" integer NOT NULL,
	"amount_cents" integer NOT NULL,
	"reason" text NOT NULL,
	"source_key" text NOT NULL,
	"payout_id" integer,
	"created_at" timestamp with time zone NOT NULL,
	CONSTRAINT "payout_adjustments_sourceKey_unique" UNIQUE("source_key"),
	CONSTRAINT "payout_adjustments_negative" CHECK ("payout_adjustments"."amount_cents" < 0)
);
--> statement-breakpoint
CREATE TABLE "payout_batches" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "payout_batches_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"request_key" text NOT NULL,
	"created_by" integer,
	"created_at" timestamp with time zone NOT NULL,
	"settled_at" timestamp with time zone,
	CONSTRAINT "payout_batches_requestKey_unique" UNIQUE("request_key")
);
--> statement-breakpoint
CREATE TABLE "payout_lines" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "payout_lines_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"payout_id" integer NOT NULL,
	"order_id" integer NOT NULL,
	"goods_cents" integer NOT NULL,
	"freight_cents" integer NOT NULL,
	"refunded_cents" integer NOT NULL,
	"amount_cents" integer NOT NULL,
	CONSTRAINT "payout_lines_orderId_unique" UNIQUE("order_id")
);
--> statement-breakpoint
ALTER TABLE "payouts" DROP CONSTRAINT "payouts_orderId_unique";--> statement-breakpoint
ALTER TABLE "payouts" DROP CONSTRAINT "payouts_amount_nonnegative";--> statement-breakpoint
ALTER TABLE "payouts" DROP CONSTRAINT "payouts_order_id_orders_id_fk";
--> statement-breakpoint
ALTER TABLE "quality_claims" ALTER COLUMN "status" SET DATA TYPE text;--> statement-breakpoint
ALTER TABLE "quality_claims" ALTER COLUMN "status" SET DEFAULT 'open'::text;--> statement-breakpoint
DROP TYPE "public"."claim_status";--> statement-breakpoint
CREATE TYPE "public"."claim_status" AS ENUM('open', 'declined', 'upheld', 'withdrawn');--> statement-breakpoint
ALTER TABLE "quality_claims" ALTER COLUMN "status" SET DEFAULT 'open'::"public"."claim_status";--> statement-breakpoint
ALTER TABLE "quality_claims" ALTER COLUMN "status" SET DATA TYPE "public"."claim_status" USING "status"::"public"."claim_status";--> statement-breakpoint
ALTER TABLE "payouts" ALTER COLUMN "status" DROP DEFAULT;--> statement-breakpoint
ALTER TABLE "payouts" ALTER COLUMN "created_at" DROP DEFAULT;--> statement-breakpoint
ALTER TABLE "quality_claims" ADD COLUMN "retest_lab_name" text;--> statement-breakpoint
ALTER TABLE "quality_claims" ADD COLUMN "retest_lab_certified" boolean;--> statement-breakpoint
ALTER TABLE "quality_claims" ADD COLUMN "retest_report_date" date;--> statement-breakpoint
ALTER TABLE "quality_claims" ADD COLUMN "retest_values" jsonb;--> statement-breakpoint
ALTER TABLE "payouts" ADD COLUMN "batch_id" integer NOT NULL;--> statement-breakpoint
ALTER TABLE "payouts" ADD COLUMN "idempotency_key" text NOT NULL;--> statement-breakpoint
ALTER TABLE "payouts" ADD COLUMN "held_reason" text;--> statement-breakpoint
ALTER TABLE "payout_adjustments" ADD CONSTRAINT "payout_adjustments_farm_id_farms_id_fk" FOREIGN KEY ("farm_id") REFERENCES "public"."farms"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payout_adjustments" ADD CONSTRAINT "payout_adjustments_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payout_adjustments" ADD CONSTRAINT "payout_adjustments_payout_id_payouts_id_fk" FOREIGN KEY ("payout_id") REFERENCES "public"."payouts"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payout_batches" ADD CONSTRAINT "payout_batches_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payout_lines" ADD CONSTRAINT "payout_lines_payout_id_payouts_id_fk" FOREIGN KEY ("payout_id") REFERENCES "public"."payouts"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payout_lines" ADD CONSTRAINT "payout_lines_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "payout_adjustments_farm_idx" ON "payout_adjustments" USING btree ("farm_id","payout_id");--> statement-breakpoint
CREATE INDEX "payout_lines_payout_idx" ON "payout_lines" USING btree ("payout_id");--> statement-breakpoint
ALTER TABLE "payouts" ADD CONSTRAINT "payouts_batch_id_payout_batches_id_fk" FOREIGN KEY ("batch_id") REFERENCES "public"."payout_batches"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "quality_claims_one_open_per_order" ON "quality_claims" USING btree ("order_id") WHERE "quality_claims"."status" = 'open';--> statement-breakpoint
CREATE INDEX "payouts_batch_idx" ON "payouts" USING btree ("batch_id");--> statement-breakpoint
ALTER TABLE "payouts" DROP COLUMN "order_id";--> statement-breakpoint
ALTER TABLE "payouts" ADD CONSTRAINT "payouts_idempotencyKey_unique" UNIQUE("idempotency_key");--> statement-breakpoint
ALTER TABLE "payouts" ADD CONSTRAINT "payouts_amount_positive" CHECK ("payouts"."amount_cents" > 0);