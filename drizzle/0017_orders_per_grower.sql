-- Orders placed after 0013 filled order_lines were still written with their lot on the order: give each its line too.
INSERT INTO "order_lines" ("order_id", "lot_id", "bales", "tons", "pricing_unit", "price_cents_per_ton", "goods_cents", "weighed_tons", "created_at")
SELECT "id", "lot_id", "bales", "tons", "pricing_unit", "price_cents_per_ton", "goods_cents", "weighed_tons", "created_at" FROM "orders"
WHERE NOT EXISTS (SELECT 1 FROM "order_lines" WHERE "order_lines"."order_id" = "orders"."id");--> statement-breakpoint
UPDATE "quality_claims" SET "order_line_id" = "order_lines"."id" FROM "order_lines" WHERE "order_lines"."order_id" = "quality_claims"."order_id" AND "quality_claims"."order_line_id" IS NULL;--> statement-breakpoint
ALTER TABLE "orders" DROP CONSTRAINT "orders_bales_positive";--> statement-breakpoint
ALTER TABLE "orders" DROP CONSTRAINT "orders_tons_positive";--> statement-breakpoint
ALTER TABLE "orders" DROP CONSTRAINT "orders_total_sum";--> statement-breakpoint
ALTER TABLE "orders" DROP CONSTRAINT "orders_amounts_nonnegative";--> statement-breakpoint
ALTER TABLE "orders" DROP CONSTRAINT "orders_lot_id_lots_id_fk";
--> statement-breakpoint
DROP INDEX "orders_lot_idx";--> statement-breakpoint
ALTER TABLE "orders" DROP COLUMN "lot_id";--> statement-breakpoint
ALTER TABLE "orders" DROP COLUMN "bales";--> statement-breakpoint
ALTER TABLE "orders" DROP COLUMN "tons";--> statement-breakpoint
ALTER TABLE "orders" DROP COLUMN "pricing_unit";--> statement-breakpoint
ALTER TABLE "orders" DROP COLUMN "price_cents_per_ton";--> statement-breakpoint
ALTER TABLE "orders" DROP COLUMN "goods_cents";--> statement-breakpoint
ALTER TABLE "orders" DROP COLUMN "weighed_tons";--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_amounts_nonnegative" CHECK ("orders"."freight_cents" >= 0 and "orders"."platform_fee_cents" >= 0 and "orders"."total_cents" >= "orders"."freight_cents" + "orders"."platform_fee_cents");