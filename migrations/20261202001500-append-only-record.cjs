'use strict';
// The install log and the audit trail are evidence: the database itself refuses to edit, delete or
// truncate their rows, whatever the application does. A correction is a new event; nothing is undone.
// (Deleting a parent whose cascade reaches such rows is refused too: records that have them are archived.)

const TABLES = ['install_events', 'audit_entries'];

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const q = (sql) => queryInterface.sequelize.query(sql, { transaction });
      await q(`
        CREATE FUNCTION setline_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
        BEGIN
          RAISE EXCEPTION '% is append-only: % refused (record a correction instead)', TG_TABLE_NAME, TG_OP
            USING ERRCODE = 'restrict_violation';
        END $$;
      `);
      // The older UPDATE-only trigger of the event log is replaced by the one rule for both tables.
      await q('DROP TRIGGER IF EXISTS install_events_no_update ON install_events');
      for (const table of TABLES) {
        await q(`CREATE TRIGGER ${table}_append_only BEFORE UPDATE OR DELETE ON ${table}
                   FOR EACH ROW EXECUTE FUNCTION setline_append_only()`);
        await q(`CREATE TRIGGER ${table}_no_truncate BEFORE TRUNCATE ON ${table}
                   FOR EACH STATEMENT EXECUTE FUNCTION setline_append_only()`);
      }
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const q = (sql) => queryInterface.sequelize.query(sql, { transaction });
      for (const table of TABLES) {
        await q(`DROP TRIGGER IF EXISTS ${table}_append_only ON ${table}`);
        await q(`DROP TRIGGER IF EXISTS ${table}_no_truncate ON ${table}`);
      }
      await q('DROP FUNCTION IF EXISTS setline_append_only()');
      await q(`CREATE TRIGGER install_events_no_update BEFORE UPDATE ON install_events
                 FOR EACH ROW EXECUTE FUNCTION install_events_append_only()`);
    });
  },
};
