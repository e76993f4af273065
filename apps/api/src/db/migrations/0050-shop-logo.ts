import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The business's logo: stored like a menu photo (menu_photos and its files,
// in PostgreSQL so the backup holds it); removing the image leaves no logo.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE shop_settings ADD COLUMN logo_photo_id uuid REFERENCES menu_photos(id) ON DELETE SET NULL`);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`ALTER TABLE shop_settings DROP COLUMN logo_photo_id`);
};
