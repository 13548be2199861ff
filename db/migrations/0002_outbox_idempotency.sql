ALTER TABLE "fake_outbox" ADD COLUMN "idempotency_key" text;--> statement-breakpoint
ALTER TABLE "fake_outbox" ADD CONSTRAINT "fake_outbox_idempotency_key_unique" UNIQUE("idempotency_key");