ALTER TABLE "transfers" ADD COLUMN "sent_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "transfers" ADD COLUMN "reversed_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
-- Transfers paid before these columns existed sent what they were owed then.
UPDATE "transfers" SET "sent_cents" = "amount_cents" WHERE "state" = 'paid' AND "stripe_transfer_id" IS NOT NULL;
