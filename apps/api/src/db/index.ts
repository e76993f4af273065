export { connectDatabase, closeDatabase, database } from './sequelize.js';
export { migrate, createMigrator } from './migrate.js';
export * from './models/index.js';
