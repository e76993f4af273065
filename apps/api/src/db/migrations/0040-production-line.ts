import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The dough's own settings beside the equipment: the desired dough
// temperature and what goes into it, the flavoured doughs and which menu
// flavours take them, and the eggs bought. Null until the owner saves them:
// the plan then uses the built-in defaults.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE production_settings ADD COLUMN dough jsonb`);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE production_settings DROP COLUMN dough`);
};
