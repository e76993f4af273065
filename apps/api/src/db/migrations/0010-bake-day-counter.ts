import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The counter's bake day: who handed an order over and when, no-shows, and
// walk-up sales of the surplus. Surplus is taken with one conditional UPDATE
// per (bake day, menu item) counter, backed by CHECK (left >= 0), like capacity.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE shop_settings
      ADD COLUMN no_show_grace_minutes integer NOT NULL DEFAULT 30 CHECK (no_show_grace_minutes BETWEEN 0 AND 1440),
      ADD COLUMN hand_over_undo_seconds integer NOT NULL DEFAULT 15 CHECK (hand_over_undo_seconds BETWEEN 5 AND 600);

    ALTER TABLE orders
      ADD COLUMN collected_by uuid REFERENCES users(id) ON DELETE SET NULL,
      ADD COLUMN no_show_at timestamptz,
      ADD COLUMN no_show_by uuid REFERENCES users(id) ON DELETE SET NULL;
    CREATE INDEX orders_day_window ON orders (bake_day_id, pickup_window_id) WHERE status IN ('paid', 'collected', 'no_show');

    -- what the plan made of each menu item for a bake day, minus walk-ups sold
    -- (paid pre-orders are subtracted when the row is first made)
    CREATE TABLE bake_day_surplus (
      bake_day_id uuid NOT NULL REFERENCES bake_days(id) ON DELETE CASCADE,
      menu_item_id uuid NOT NULL REFERENCES menu_items(id) ON DELETE RESTRICT,
      made integer NOT NULL CHECK (made >= 0),
      left_count integer NOT NULL CHECK (left_count >= 0),
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (bake_day_id, menu_item_id),
      CHECK (left_count <= made)
    );

    CREATE TABLE walk_up_sales (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      bake_day_id uuid NOT NULL REFERENCES bake_days(id) ON DELETE RESTRICT,
      method text NOT NULL CHECK (method IN ('cash', 'card')),
      amount_cents integer NOT NULL CHECK (amount_cents >= 0),
      sold_by uuid REFERENCES users(id) ON DELETE SET NULL,
      idempotency_key text UNIQUE,
      sold_at timestamptz NOT NULL DEFAULT now(),
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX walk_up_sales_day ON walk_up_sales (bake_day_id, sold_at);

    CREATE TABLE walk_up_sale_items (
      sale_id uuid NOT NULL REFERENCES walk_up_sales(id) ON DELETE CASCADE,
      menu_item_id uuid NOT NULL REFERENCES menu_items(id) ON DELETE RESTRICT,
      quantity integer NOT NULL CHECK (quantity > 0),
      PRIMARY KEY (sale_id, menu_item_id)
    );

    -- first answer per Idempotency-Key for counter actions (collect, undo, no-show, walk-up)
    CREATE TABLE counter_requests (
      idempotency_key text PRIMARY KEY,
      user_id uuid REFERENCES users(id) ON DELETE SET NULL,
      action text NOT NULL,
      status_code integer NOT NULL,
      body jsonb NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE IF EXISTS counter_requests, walk_up_sale_items, walk_up_sales, bake_day_surplus;
    ALTER TABLE orders DROP COLUMN IF EXISTS collected_by, DROP COLUMN IF EXISTS no_show_at, DROP COLUMN IF EXISTS no_show_by;
    DROP INDEX IF EXISTS orders_day_window;
    ALTER TABLE shop_settings DROP COLUMN IF EXISTS no_show_grace_minutes, DROP COLUMN IF EXISTS hand_over_undo_seconds;
  `);
};
