-- Orders placed before the fee became a setting were all sold at the fixed 3 % (300 basis points).
ALTER TABLE "orders" ADD COLUMN "platform_fee_bps" integer NOT NULL DEFAULT 300;--> statement-breakpoint
ALTER TABLE "orders" ALTER COLUMN "platform_fee_bps" DROP DEFAULT;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_fee_bps_range" CHECK ("orders"."platform_fee_bps" between 0 and 10000);
