'use strict';
// The live stream's order: every install event gets `seq`, a number that grows in the order the events' transactions
// commit within their company. A stream sends it as the SSE id, and a client that reconnects with Last-Event-ID
// is sent every event of its company with a larger seq, so nothing committed in between is lost.
//
// A plain sequence hands out numbers in insert order, not commit order: a tap that inserts first and commits second
// would fall behind an id already sent. The trigger therefore takes a per-company transaction lock before drawing
// the number; it is held until commit, so within a company numbers are drawn and committed one tap at a time.
// (Taps are a few a minute per crew; the lock is held only for the rest of the tap's short transaction.)

const LOCK_CLASS = 1_947_003; // an arbitrary constant of ours: the first key of the two-key advisory lock

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const q = (sql) => queryInterface.sequelize.query(sql, { transaction });
      await q('CREATE SEQUENCE install_events_seq AS bigint');
      await q('ALTER TABLE install_events ADD COLUMN seq bigint');
      // Events stored before this migration are numbered in the order the server received them. The log is
      // append-only: its own trigger is switched off for this one numbering, inside this transaction.
      await q('ALTER TABLE install_events DISABLE TRIGGER install_events_append_only');
      await q(`UPDATE install_events e SET seq = n.seq
                 FROM (SELECT id, nextval('install_events_seq') AS seq
                         FROM (SELECT id FROM install_events ORDER BY received_at, created_at, id) ordered) n
                WHERE e.id = n.id`);
      await q('ALTER TABLE install_events ENABLE TRIGGER install_events_append_only');
      await q('ALTER TABLE install_events ALTER COLUMN seq SET NOT NULL');
      await q('ALTER SEQUENCE install_events_seq OWNED BY install_events.seq');
      await q(`
        CREATE FUNCTION install_events_number() RETURNS trigger LANGUAGE plpgsql AS $$
        BEGIN
          PERFORM pg_advisory_xact_lock(${LOCK_CLASS}, hashtext(NEW.company_id::text));
          NEW.seq := nextval('install_events_seq');
          RETURN NEW;
        END $$;
      `);
      await q(`CREATE TRIGGER install_events_number BEFORE INSERT ON install_events
                 FOR EACH ROW EXECUTE FUNCTION install_events_number()`);
      await q('CREATE UNIQUE INDEX install_events_company_seq ON install_events (company_id, seq)');
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      const q = (sql) => queryInterface.sequelize.query(sql, { transaction });
      await q('DROP TRIGGER IF EXISTS install_events_number ON install_events');
      await q('DROP FUNCTION IF EXISTS install_events_number()');
      await q('DROP INDEX IF EXISTS install_events_company_seq');
      // Dropping a column is no UPDATE or DELETE: the append-only triggers do not fire. The sequence goes with it.
      await q('ALTER TABLE install_events DROP COLUMN seq');
    });
  },
};
