CREATE TABLE "lot_view_marks" (
	"lot_id" integer NOT NULL,
	"visitor" text NOT NULL,
	"day" date NOT NULL,
	CONSTRAINT "lot_view_marks_lot_id_visitor_day_pk" PRIMARY KEY("lot_id","visitor","day")
);
--> statement-breakpoint
CREATE TABLE "rate_limit_hits" (
	"key" text PRIMARY KEY NOT NULL,
	"hits" integer NOT NULL,
	"reset_at" timestamp with time zone NOT NULL
);
--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "email_verified_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "lots" ADD COLUMN "revision" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
CREATE INDEX "lot_view_marks_day_idx" ON "lot_view_marks" USING btree ("day");--> statement-breakpoint
-- Accounts made before addresses were verified keep working: their sign-up date counts as verification.
UPDATE "users" SET "email_verified_at" = "created_at";
