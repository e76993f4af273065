import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// Hardening: rate-limit counters shared by every API process, a per-customer
// share of each bake day, refunds recorded as intents before the payments
// service is called, payments that did not match their order flagged for
// the owner, and where the reconciliation job got to.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE rate_limit_hits (
      key text PRIMARY KEY,
      hits integer NOT NULL CHECK (hits >= 0),
      resets_at timestamptz NOT NULL
    );
    CREATE INDEX rate_limit_hits_resets ON rate_limit_hits (resets_at);

    ALTER TABLE shop_settings
      ADD COLUMN max_pieces_per_customer integer NOT NULL DEFAULT 36 CHECK (max_pieces_per_customer BETWEEN 1 AND 10000);

    -- a refund is written as 'pending' (with the key the payments service sees)
    -- before the service is called, then confirmed; a pending one is retried
    -- with the same key, so it is made once however often it is retried
    ALTER TABLE refunds
      ADD COLUMN status text NOT NULL DEFAULT 'succeeded' CHECK (status IN ('pending', 'succeeded', 'failed')),
      -- owner: the owner's refund (mailed to the customer when confirmed); cancel: a customer's cancellation;
      -- late: a payment that came after its hold lapsed and found the pieces gone
      ADD COLUMN kind text NOT NULL DEFAULT 'owner' CHECK (kind IN ('owner', 'cancel', 'late')),
      ADD COLUMN provider_key text UNIQUE,
      ADD COLUMN refunded_total_cents integer CHECK (refunded_total_cents > 0),
      ADD COLUMN last_error text,
      ADD COLUMN confirmed_at timestamptz;
    CREATE INDEX refunds_pending ON refunds (created_at) WHERE status = 'pending';

    -- a completed checkout session that did not match its order: never marks it paid, refunded in full
    CREATE TABLE payment_flags (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      order_id uuid REFERENCES orders(id) ON DELETE SET NULL,
      checkout_session_id text NOT NULL UNIQUE,
      payment_intent_id text,
      problem text NOT NULL,
      amount_cents integer NOT NULL CHECK (amount_cents >= 0),
      currency text NOT NULL,
      refund_status text NOT NULL DEFAULT 'pending' CHECK (refund_status IN ('pending', 'succeeded', 'failed', 'none')),
      provider_refund_id text,
      last_error text,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE job_cursors (
      name text PRIMARY KEY,
      value text NOT NULL,
      updated_at timestamptz NOT NULL DEFAULT now()
    );
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE IF EXISTS job_cursors, payment_flags, rate_limit_hits;
    DROP INDEX IF EXISTS refunds_pending;
    ALTER TABLE refunds DROP COLUMN IF EXISTS status, DROP COLUMN IF EXISTS kind, DROP COLUMN IF EXISTS provider_key,
      DROP COLUMN IF EXISTS refunded_total_cents, DROP COLUMN IF EXISTS last_error, DROP COLUMN IF EXISTS confirmed_at;
    ALTER TABLE shop_settings DROP COLUMN IF EXISTS max_pieces_per_customer;
  `);
};
