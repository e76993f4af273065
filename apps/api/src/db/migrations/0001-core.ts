import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The core schema. The database itself enforces what must never break:
// foreign keys, non-negative capacity counters, unique pickup codes and
// payment event ids, one active hold per customer and bake day.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE EXTENSION IF NOT EXISTS pgcrypto;

    CREATE TABLE users (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      google_sub text UNIQUE,
      email text NOT NULL,
      email_verified boolean NOT NULL DEFAULT false,
      name text NOT NULL DEFAULT '',
      role text NOT NULL DEFAULT 'customer' CHECK (role IN ('customer', 'counter', 'baker', 'owner')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX users_email_lower ON users (lower(email));

    CREATE TABLE shop_settings (
      id integer PRIMARY KEY DEFAULT 1 CHECK (id = 1),
      shop_name text NOT NULL,
      currency text NOT NULL DEFAULT 'usd',
      tax_mode text NOT NULL DEFAULT 'included' CHECK (tax_mode IN ('included', 'added')),
      tax_rate_bp integer NOT NULL DEFAULT 0 CHECK (tax_rate_bp BETWEEN 0 AND 5000),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE bake_days (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      date date NOT NULL,
      place text NOT NULL,
      address text NOT NULL DEFAULT '',
      time_zone text NOT NULL,
      status text NOT NULL DEFAULT 'draft' CHECK (status IN ('draft', 'published', 'cancelled', 'done')),
      orders_open_at timestamptz NOT NULL,
      cutoff_at timestamptz NOT NULL,
      ring_capacity integer NOT NULL CHECK (ring_capacity >= 0),
      hole_capacity integer NOT NULL CHECK (hole_capacity >= 0),
      rings_remaining integer NOT NULL CHECK (rings_remaining >= 0),
      holes_remaining integer NOT NULL CHECK (holes_remaining >= 0),
      notes text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (rings_remaining <= ring_capacity),
      CHECK (holes_remaining <= hole_capacity),
      CHECK (orders_open_at < cutoff_at)
    );
    CREATE INDEX bake_days_date ON bake_days (date);

    CREATE TABLE pickup_windows (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      bake_day_id uuid NOT NULL REFERENCES bake_days(id) ON DELETE CASCADE,
      starts_at timestamptz NOT NULL,
      ends_at timestamptz NOT NULL,
      max_orders integer CHECK (max_orders IS NULL OR max_orders >= 0),
      orders_remaining integer CHECK (orders_remaining IS NULL OR orders_remaining >= 0),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (starts_at < ends_at),
      CHECK ((max_orders IS NULL) = (orders_remaining IS NULL)),
      CHECK (orders_remaining IS NULL OR orders_remaining <= max_orders)
    );
    CREATE INDEX pickup_windows_day ON pickup_windows (bake_day_id, starts_at);

    CREATE TABLE menu_items (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name text NOT NULL,
      flavour text NOT NULL,
      glaze text NOT NULL,
      description text NOT NULL DEFAULT '',
      kind text NOT NULL CHECK (kind IN ('ring', 'hole')),
      surcharge_cents integer NOT NULL DEFAULT 0 CHECK (surcharge_cents >= 0),
      allergens text[] NOT NULL DEFAULT '{}',
      photo_url text,
      active boolean NOT NULL DEFAULT true,
      sort_order integer NOT NULL DEFAULT 0,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (name, kind)
    );

    CREATE TABLE bake_day_menu_items (
      bake_day_id uuid NOT NULL REFERENCES bake_days(id) ON DELETE CASCADE,
      menu_item_id uuid NOT NULL REFERENCES menu_items(id) ON DELETE RESTRICT,
      PRIMARY KEY (bake_day_id, menu_item_id)
    );

    CREATE TABLE bake_day_boxes (
      bake_day_id uuid NOT NULL REFERENCES bake_days(id) ON DELETE CASCADE,
      size text NOT NULL CHECK (size IN ('dozen', 'half-dozen', 'holes')),
      pieces integer NOT NULL CHECK (pieces > 0),
      price_cents integer NOT NULL CHECK (price_cents >= 0),
      PRIMARY KEY (bake_day_id, size)
    );

    CREATE TABLE orders (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      bake_day_id uuid NOT NULL REFERENCES bake_days(id) ON DELETE RESTRICT,
      pickup_window_id uuid NOT NULL REFERENCES pickup_windows(id) ON DELETE RESTRICT,
      status text NOT NULL CHECK (status IN ('held', 'paid', 'collected', 'no_show', 'cancelled', 'refunded', 'expired')),
      rings integer NOT NULL CHECK (rings >= 0),
      holes integer NOT NULL CHECK (holes >= 0),
      holds_capacity boolean NOT NULL DEFAULT true,
      subtotal_cents integer NOT NULL CHECK (subtotal_cents >= 0),
      tax_cents integer NOT NULL CHECK (tax_cents >= 0),
      total_cents integer NOT NULL CHECK (total_cents >= 0),
      refunded_cents integer NOT NULL DEFAULT 0 CHECK (refunded_cents >= 0),
      fee_cents integer NOT NULL DEFAULT 0 CHECK (fee_cents >= 0),
      pickup_code text UNIQUE,
      hold_expires_at timestamptz,
      checkout_session_id text UNIQUE,
      payment_intent_id text UNIQUE,
      source text NOT NULL DEFAULT 'online' CHECK (source IN ('online', 'walk-up')),
      paid_at timestamptz,
      collected_at timestamptz,
      cancelled_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (refunded_cents <= total_cents)
    );
    CREATE INDEX orders_user ON orders (user_id, created_at DESC);
    CREATE INDEX orders_day_status ON orders (bake_day_id, status);
    CREATE INDEX orders_held_expiry ON orders (hold_expires_at) WHERE status = 'held';
    CREATE UNIQUE INDEX orders_one_hold ON orders (user_id, bake_day_id) WHERE status = 'held';

    CREATE TABLE order_boxes (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      order_id uuid NOT NULL REFERENCES orders(id) ON DELETE CASCADE,
      position integer NOT NULL,
      size text NOT NULL CHECK (size IN ('dozen', 'half-dozen', 'holes')),
      pieces integer NOT NULL CHECK (pieces > 0),
      price_cents integer NOT NULL CHECK (price_cents >= 0),
      UNIQUE (order_id, position)
    );

    CREATE TABLE order_lines (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      order_box_id uuid NOT NULL REFERENCES order_boxes(id) ON DELETE CASCADE,
      menu_item_id uuid NOT NULL REFERENCES menu_items(id) ON DELETE RESTRICT,
      name text NOT NULL,
      kind text NOT NULL CHECK (kind IN ('ring', 'hole')),
      quantity integer NOT NULL CHECK (quantity > 0),
      surcharge_cents integer NOT NULL CHECK (surcharge_cents >= 0),
      allergens text[] NOT NULL DEFAULT '{}'
    );
    CREATE INDEX order_lines_box ON order_lines (order_box_id);

    CREATE TABLE payment_events (
      id text PRIMARY KEY,
      type text NOT NULL,
      order_id uuid REFERENCES orders(id) ON DELETE SET NULL,
      outcome text NOT NULL DEFAULT '',
      received_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE refunds (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      order_id uuid NOT NULL REFERENCES orders(id) ON DELETE RESTRICT,
      provider_refund_id text UNIQUE,
      request_key text UNIQUE,
      amount_cents integer NOT NULL CHECK (amount_cents > 0),
      reason text NOT NULL,
      requested_by uuid REFERENCES users(id),
      created_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE waitlist_entries (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      bake_day_id uuid NOT NULL REFERENCES bake_days(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      rings integer NOT NULL DEFAULT 0 CHECK (rings >= 0),
      holes integer NOT NULL DEFAULT 0 CHECK (holes >= 0),
      status text NOT NULL DEFAULT 'waiting' CHECK (status IN ('waiting', 'offered', 'claimed', 'lapsed', 'left')),
      claim_token text UNIQUE,
      offer_expires_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (rings + holes > 0)
    );
    CREATE UNIQUE INDEX waitlist_one_per_user ON waitlist_entries (bake_day_id, user_id) WHERE status IN ('waiting', 'offered');

    CREATE TABLE outbox (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      message_id text NOT NULL UNIQUE,
      dedupe_key text UNIQUE,
      kind text NOT NULL,
      to_address text NOT NULL,
      subject text NOT NULL,
      text_body text NOT NULL,
      html_body text,
      attachments jsonb NOT NULL DEFAULT '[]',
      status text NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'sent', 'failed')),
      attempts integer NOT NULL DEFAULT 0,
      next_attempt_at timestamptz NOT NULL DEFAULT now(),
      last_error text,
      sent_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX outbox_due ON outbox (next_attempt_at) WHERE status = 'pending';

    CREATE TABLE audit_log (
      id bigserial PRIMARY KEY,
      actor_id uuid REFERENCES users(id) ON DELETE SET NULL,
      action text NOT NULL,
      subject_type text NOT NULL,
      subject_id text,
      details jsonb NOT NULL DEFAULT '{}',
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX audit_log_subject ON audit_log (subject_type, subject_id);

    -- express-session store (connect-pg-simple's table layout)
    CREATE TABLE "session" (
      sid varchar NOT NULL PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL
    );
    CREATE INDEX session_expire ON "session" (expire);
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE IF EXISTS "session", audit_log, outbox, waitlist_entries, refunds, payment_events, order_lines,
      order_boxes, orders, bake_day_boxes, bake_day_menu_items, menu_items, pickup_windows, bake_days,
      shop_settings, users CASCADE;
  `);
};
