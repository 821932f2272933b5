ALTER TYPE "public"."delivery_status" ADD VALUE 'rescheduled' BEFORE 'confirmed';--> statement-breakpoint
CREATE TABLE "order_events" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "order_events_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"order_id" integer NOT NULL,
	"event" text NOT NULL,
	"status" "order_status" NOT NULL,
	"actor" text NOT NULL,
	"actor_id" integer,
	"note" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "order_refunds" (
	"id" integer PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "order_refunds_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 2147483647 START WITH 1 CACHE 1),
	"order_id" integer NOT NULL,
	"amount_cents" integer NOT NULL,
	"reason" text NOT NULL,
	"idempotency_key" text NOT NULL,
	"provider_refund_id" text,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "order_refunds_idempotencyKey_unique" UNIQUE("idempotency_key"),
	CONSTRAINT "order_refunds_providerRefundId_unique" UNIQUE("provider_refund_id"),
	CONSTRAINT "order_refunds_amount_positive" CHECK ("order_refunds"."amount_cents" > 0)
);
--> statement-breakpoint
CREATE TABLE "payment_events" (
	"id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"order_id" integer,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "orders" ALTER COLUMN "status" SET DATA TYPE text;--> statement-breakpoint
ALTER TABLE "orders" ALTER COLUMN "status" SET DEFAULT 'awaiting_payment'::text;--> statement-breakpoint
ALTER TABLE "order_events" ALTER COLUMN "status" SET DATA TYPE text;--> statement-breakpoint
DROP TYPE "public"."order_status";--> statement-breakpoint
CREATE TYPE "public"."order_status" AS ENUM('awaiting_payment', 'paid', 'scheduled', 'delivered', 'completed', 'claimed', 'refunded', 'cancelled', 'expired');--> statement-breakpoint
ALTER TABLE "orders" ALTER COLUMN "status" SET DEFAULT 'awaiting_payment'::"public"."order_status";--> statement-breakpoint
ALTER TABLE "orders" ALTER COLUMN "status" SET DATA TYPE "public"."order_status" USING "status"::"public"."order_status";--> statement-breakpoint
ALTER TABLE "order_events" ALTER COLUMN "status" SET DATA TYPE "public"."order_status" USING "status"::"public"."order_status";--> statement-breakpoint
DROP INDEX "deliveries_order_idx";--> statement-breakpoint
ALTER TABLE "farms" ADD COLUMN "delivery_weekdays" integer[] DEFAULT '{1,2,3,4,5}'::integer[] NOT NULL;--> statement-breakpoint
ALTER TABLE "farms" ADD COLUMN "loads_per_day" integer DEFAULT 2 NOT NULL;--> statement-breakpoint
ALTER TABLE "farms" ADD COLUMN "tons_per_load" double precision DEFAULT 24 NOT NULL;--> statement-breakpoint
ALTER TABLE "farms" ADD COLUMN "bales_per_load" integer;--> statement-breakpoint
ALTER TABLE "farms" ADD COLUMN "pickup_from_hour" integer DEFAULT 8 NOT NULL;--> statement-breakpoint
ALTER TABLE "farms" ADD COLUMN "pickup_to_hour" integer DEFAULT 17 NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "pricing_unit" "pricing_unit" DEFAULT 'ton' NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "refunded_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "loads" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "reserved_until" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "checkout_session_id" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "payment_url" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "cancel_reason" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "weighed_tons" double precision;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "paid_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "delivered_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "accept_by" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "deliveries" ADD COLUMN "scale_ticket_file_id" integer;--> statement-breakpoint
ALTER TABLE "deliveries" ADD COLUMN "updated_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "order_events" ADD CONSTRAINT "order_events_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_events" ADD CONSTRAINT "order_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_refunds" ADD CONSTRAINT "order_refunds_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_refunds" ADD CONSTRAINT "order_refunds_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "order_events_order_idx" ON "order_events" USING btree ("order_id","id");--> statement-breakpoint
CREATE INDEX "order_refunds_order_idx" ON "order_refunds" USING btree ("order_id");--> statement-breakpoint
ALTER TABLE "deliveries" ADD CONSTRAINT "deliveries_scale_ticket_file_id_stored_files_id_fk" FOREIGN KEY ("scale_ticket_file_id") REFERENCES "public"."stored_files"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "orders_status_reserved_idx" ON "orders" USING btree ("status","reserved_until");--> statement-breakpoint
CREATE UNIQUE INDEX "deliveries_order_load_idx" ON "deliveries" USING btree ("order_id","load_number");--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_checkoutSessionId_unique" UNIQUE("checkout_session_id");--> statement-breakpoint
ALTER TABLE "farms" ADD CONSTRAINT "farms_loads_per_day_range" CHECK ("farms"."loads_per_day" between 0 and 50);--> statement-breakpoint
ALTER TABLE "farms" ADD CONSTRAINT "farms_tons_per_load_range" CHECK ("farms"."tons_per_load" > 0 and "farms"."tons_per_load" <= 40);--> statement-breakpoint
ALTER TABLE "farms" ADD CONSTRAINT "farms_pickup_hours_order" CHECK ("farms"."pickup_from_hour" between 0 and 23 and "farms"."pickup_to_hour" between 1 and 24 and "farms"."pickup_to_hour" > "farms"."pickup_from_hour");--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_loads_positive" CHECK ("orders"."loads" > 0);--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_refund_range" CHECK ("orders"."refunded_cents" between 0 and "orders"."total_cents");