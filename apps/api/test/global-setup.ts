import { Sequelize } from 'sequelize';
import pg from 'pg';
import { migrate } from '../src/db/migrate.js';

export const testDatabaseUrl = () => {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error('TEST_DATABASE_URL is not set: run the tests with `npm test`, which starts a test PostgreSQL');
  return url;
};

/** A fresh schema, migrated once for the whole run. */
export default async function setup() {
  const sequelize = new Sequelize(testDatabaseUrl(), { dialect: 'postgres', dialectModule: pg, logging: false });
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
  await migrate(sequelize);
  await sequelize.close();
}
