'use strict';
// The store of the sign-in and report-link limits (rate-limiter-flexible's PostgreSQL store, lib/throttle.ts).
// One shared table so every app server counts the same attempts; the columns are the ones the library
// reads and writes (key, points, expire in epoch milliseconds). Rows are counters, not records: the
// library deletes expired ones.

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.query(`
      CREATE TABLE rate_limits (
        key varchar(255) PRIMARY KEY,
        points integer NOT NULL DEFAULT 0,
        expire bigint
      );
      CREATE INDEX rate_limits_expire_idx ON rate_limits (expire);
    `);
  },
  async down(queryInterface) {
    await queryInterface.sequelize.query('DROP TABLE IF EXISTS rate_limits;');
  },
};
