CREATE TABLE "order_lines" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "order_lines_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"order_id" integer NOT NULL,
	"lot_id" integer NOT NULL,
	"bales" integer NOT NULL,
	"tons" double precision NOT NULL,
	"pricing_unit" "pricing_unit" DEFAULT 'ton' NOT NULL,
	"price_cents_per_ton" integer NOT NULL,
	"goods_cents" integer NOT NULL,
	"weighed_tons" double precision,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "order_lines_bales_positive" CHECK ("order_lines"."bales" > 0),
	CONSTRAINT "order_lines_tons_positive" CHECK ("order_lines"."tons" > 0),
	CONSTRAINT "order_lines_price_nonnegative" CHECK ("order_lines"."price_cents_per_ton" >= 0),
	CONSTRAINT "order_lines_goods_nonnegative" CHECK ("order_lines"."goods_cents" >= 0),
	CONSTRAINT "order_lines_weighed_positive" CHECK ("order_lines"."weighed_tons" is null or "order_lines"."weighed_tons" > 0)
);
--> statement-breakpoint
ALTER TABLE "quality_claims" ADD COLUMN "order_line_id" integer;--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_lot_id_lots_id_fk" FOREIGN KEY ("lot_id") REFERENCES "public"."lots"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "order_lines_order_idx" ON "order_lines" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "order_lines_lot_idx" ON "order_lines" USING btree ("lot_id");--> statement-breakpoint
CREATE UNIQUE INDEX "order_lines_order_lot_uq" ON "order_lines" USING btree ("order_id","lot_id");--> statement-breakpoint
ALTER TABLE "quality_claims" ADD CONSTRAINT "quality_claims_order_line_id_order_lines_id_fk" FOREIGN KEY ("order_line_id") REFERENCES "public"."order_lines"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
-- Every order so far bought one lot: it becomes that order's one line.
INSERT INTO "order_lines" ("order_id", "lot_id", "bales", "tons", "pricing_unit", "price_cents_per_ton", "goods_cents", "weighed_tons", "created_at")
SELECT "id", "lot_id", "bales", "tons", "pricing_unit", "price_cents_per_ton", "goods_cents", "weighed_tons", "created_at" FROM "orders";--> statement-breakpoint
UPDATE "quality_claims" SET "order_line_id" = "order_lines"."id" FROM "order_lines" WHERE "order_lines"."order_id" = "quality_claims"."order_id";
