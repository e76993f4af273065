import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// Production planning: versioned formulas (a bake day keeps the version it
// was planned with), the baker's equipment and schedule settings, and which
// glaze recipe each menu item takes.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE formula_versions (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      version integer NOT NULL UNIQUE CHECK (version > 0),
      formula jsonb NOT NULL,
      note text NOT NULL DEFAULT '',
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE production_settings (
      id integer PRIMARY KEY DEFAULT 1 CHECK (id = 1),
      equipment jsonb NOT NULL,
      schedule jsonb NOT NULL,
      spare jsonb NOT NULL,
      glazes jsonb NOT NULL,
      prices jsonb NOT NULL,
      room_temp_c numeric(4, 1) NOT NULL,
      updated_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    ALTER TABLE bake_days ADD COLUMN formula_version_id uuid REFERENCES formula_versions(id) ON DELETE RESTRICT;
    ALTER TABLE menu_items ADD COLUMN glaze_recipe_id text;
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE menu_items DROP COLUMN glaze_recipe_id;
    ALTER TABLE bake_days DROP COLUMN formula_version_id;
    DROP TABLE production_settings, formula_versions;
  `);
};
