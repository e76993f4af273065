import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The owner's back office: menu photos kept in the database (so a backup of
// the database holds them), archived menu items, the shop settings the owner
// edits, and a kind on every audit entry so the log can be filtered.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE menu_photos (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      width integer NOT NULL CHECK (width > 0),
      height integer NOT NULL CHECK (height > 0),
      uploaded_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );

    -- each photo resized to a few widths; the file name is the hash of its bytes
    CREATE TABLE menu_photo_files (
      photo_id uuid NOT NULL REFERENCES menu_photos(id) ON DELETE CASCADE,
      width integer NOT NULL CHECK (width > 0),
      height integer NOT NULL CHECK (height > 0),
      hash text NOT NULL CHECK (hash ~ '^[0-9a-f]{32}$'),
      content_type text NOT NULL,
      bytes bytea NOT NULL,
      PRIMARY KEY (photo_id, width)
    );
    CREATE INDEX menu_photo_files_hash ON menu_photo_files (hash);

    ALTER TABLE menu_items
      ADD COLUMN photo_id uuid REFERENCES menu_photos(id) ON DELETE SET NULL,
      ADD COLUMN archived_at timestamptz,
      ADD CONSTRAINT menu_items_known_allergens CHECK (
        allergens <@ ARRAY['milk', 'eggs', 'fish', 'crustacean shellfish', 'tree nuts', 'peanuts', 'wheat', 'soybeans', 'sesame']::text[]
      );

    ALTER TABLE shop_settings
      ADD COLUMN time_zone text NOT NULL DEFAULT 'UTC',
      -- null: the server's HOLD_MINUTES setting
      ADD COLUMN hold_minutes integer CHECK (hold_minutes IS NULL OR hold_minutes BETWEEN 1 AND 120),
      ADD COLUMN refund_policy text NOT NULL DEFAULT '' CHECK (length(refund_policy) <= 2000),
      ADD COLUMN updated_by uuid REFERENCES users(id) ON DELETE SET NULL;
    -- a shop that exists already takes the zone of its latest bake day
    UPDATE shop_settings SET time_zone = COALESCE((SELECT time_zone FROM bake_days ORDER BY date DESC LIMIT 1), 'UTC');

    -- what the audit log page filters by, worked out from the action so every
    -- writer of audit entries gets it without knowing about it
    ALTER TABLE audit_log ADD COLUMN kind text GENERATED ALWAYS AS (
      CASE
        WHEN action LIKE '%capacity%' THEN 'capacity'
        WHEN action LIKE '%call_off%' OR action LIKE '%called_off%' OR action LIKE '%call-off%' THEN 'call-offs'
        WHEN action LIKE '%refund%' THEN 'refunds'
        WHEN action LIKE '%price%' OR action LIKE 'bake_day.boxes%' THEN 'prices'
        WHEN action LIKE 'menu%' THEN 'menu'
        WHEN action LIKE 'staff.%' THEN 'roles'
        WHEN action LIKE 'order.collect%' OR action LIKE 'order.no_show%' OR action LIKE 'order.handed%'
          OR action LIKE 'pickup%' OR action LIKE 'walk_up%' OR action LIKE 'counter.%' THEN 'pickups'
        WHEN action LIKE 'shop.%' THEN 'settings'
        WHEN action LIKE 'bake_day.%' THEN 'bake-days'
        WHEN action LIKE 'production.%' OR action LIKE 'formula.%' THEN 'production'
        WHEN action LIKE 'order.%' THEN 'orders'
        WHEN action LIKE 'account.%' THEN 'accounts'
        ELSE 'other'
      END
    ) STORED;
    CREATE INDEX audit_log_kind_time ON audit_log (kind, created_at DESC);
    CREATE INDEX audit_log_actor_time ON audit_log (actor_id, created_at DESC);
    CREATE INDEX audit_log_time ON audit_log (created_at DESC);
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE audit_log DROP COLUMN IF EXISTS kind;
    ALTER TABLE shop_settings DROP COLUMN IF EXISTS time_zone, DROP COLUMN IF EXISTS hold_minutes,
      DROP COLUMN IF EXISTS refund_policy, DROP COLUMN IF EXISTS updated_by;
    ALTER TABLE menu_items DROP CONSTRAINT IF EXISTS menu_items_known_allergens,
      DROP COLUMN IF EXISTS archived_at, DROP COLUMN IF EXISTS photo_id;
    DROP TABLE IF EXISTS menu_photo_files, menu_photos;
  `);
};
