'use strict';
// Uploads go straight from the browser to object storage: a row is 'pending' until the server has
// checked the stored bytes, then 'ready'. Every attachment also names its job (listing by job, keys).
const { DataTypes } = require('sequelize');
const { addCheck } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      // Rows from before this step were stored whole: they are ready. New rows start pending.
      await queryInterface.addColumn(
        'attachments',
        'status',
        { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'ready' },
        { transaction },
      );
      await queryInterface.sequelize.query("ALTER TABLE attachments ALTER COLUMN status SET DEFAULT 'pending'", {
        transaction,
      });
      await queryInterface.addColumn('attachments', 'width', { type: DataTypes.INTEGER }, { transaction });
      await queryInterface.addColumn('attachments', 'height', { type: DataTypes.INTEGER }, { transaction });
      await addCheck(
        queryInterface,
        'attachments',
        'attachments_status_check',
        "status IN ('pending', 'ready')",
        transaction,
      );
      await addCheck(
        queryInterface,
        'attachments',
        'attachments_dimensions_check',
        '(width IS NULL OR width > 0) AND (height IS NULL OR height > 0)',
        transaction,
      );
      await queryInterface.sequelize.query(
        `
        UPDATE attachments a SET job_id = i.job_id, repair_id = COALESCE(a.repair_id, i.repair_id)
          FROM installs i WHERE a.install_id = i.id AND a.job_id IS NULL;
        UPDATE attachments a SET job_id = r.job_id FROM repairs r WHERE a.repair_id = r.id AND a.job_id IS NULL;
      `,
        { transaction },
      );
      await queryInterface.addIndex('attachments', ['job_id'], { transaction });
      await queryInterface.addIndex('attachments', ['status', 'created_at'], {
        name: 'attachments_status_created_at',
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.removeIndex('attachments', 'attachments_status_created_at', { transaction });
      await queryInterface.removeIndex('attachments', ['job_id'], { transaction });
      await queryInterface.sequelize.query(
        'ALTER TABLE attachments DROP CONSTRAINT attachments_dimensions_check, DROP CONSTRAINT attachments_status_check',
        { transaction },
      );
      // Pending rows name objects nobody checked: they go with the column.
      await queryInterface.sequelize.query("DELETE FROM attachments WHERE status = 'pending'", { transaction });
      for (const column of ['height', 'width', 'status'])
        await queryInterface.removeColumn('attachments', column, { transaction });
    });
  },
};
