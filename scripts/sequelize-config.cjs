// Connection settings for sequelize-cli (migrations and seeders). The app itself reads
// DATABASE_URL through lib/env.ts; both use the same variable.
const url = process.env.DATABASE_URL;
if (!url) {
  throw new Error('DATABASE_URL is not set. Start the database with `npm run db:start` and export the URL it prints.');
}

const common = {
  url,
  dialect: 'postgres',
  logging: false,
  migrationStorageTableName: 'sequelize_meta',
  seederStorage: 'sequelize',
  seederStorageTableName: 'sequelize_data',
  define: { underscored: true },
};

module.exports = { development: common, test: common, production: common };
