'use strict';
// Jobs (numbered per company and year, never reused) and the repairs planned on them.
const { DataTypes } = require('sequelize');
const { id, companyId, ref, timestamps, inList, addCheck, indexCompany } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      // One row per company and year holding the last number handed out: numbers are never reused.
      await queryInterface.createTable(
        'job_number_sequences',
        {
          company_id: { ...companyId(), primaryKey: true },
          year: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
          last_number: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        },
        { transaction },
      );

      await queryInterface.createTable(
        'jobs',
        {
          id: id(),
          company_id: companyId(),
          number: { type: DataTypes.STRING(20), allowNull: false },
          customer_id: ref('customers'),
          site_id: ref('sites'),
          crew_id: ref('crews', { allowNull: true, onDelete: 'SET NULL' }),
          status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
          scheduled_date: { type: DataTypes.DATEONLY },
          title: { type: DataTypes.STRING(200) },
          notes: { type: DataTypes.TEXT },
          review_comment: { type: DataTypes.TEXT },
          archived_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'jobs',
        'jobs_status_check',
        inList('status', [
          'draft',
          'scheduled',
          'in_progress',
          'awaiting_review',
          'sent_back',
          'approved',
          'reported',
          'closed',
          'cancelled',
        ]),
        transaction,
      );
      await indexCompany(queryInterface, 'jobs', transaction);
      await queryInterface.addIndex('jobs', ['company_id', 'number'], {
        unique: true,
        name: 'jobs_company_number_unique',
        transaction,
      });
      await queryInterface.addIndex('jobs', ['company_id', 'scheduled_date'], { transaction });
      await queryInterface.addIndex('jobs', ['crew_id', 'scheduled_date'], { transaction });

      await queryInterface.createTable(
        'repairs',
        {
          id: id(),
          company_id: companyId(),
          job_id: ref('jobs', { onDelete: 'CASCADE' }),
          segment_id: ref('segments'),
          from_access_point_id: ref('access_points', { allowNull: true }),
          position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
          distance_mm: { type: DataTypes.INTEGER, allowNull: false },
          defect_type: { type: DataTypes.STRING(32), allowNull: false },
          condition_grade: { type: DataTypes.SMALLINT, allowNull: false },
          defect_length_mm: { type: DataTypes.INTEGER, allowNull: false },
          clock_position: { type: DataTypes.STRING(5) },
          planned_patch_length_mm: { type: DataTypes.INTEGER },
          status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'planned' },
          notes: { type: DataTypes.TEXT },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'repairs',
        'repairs_defect_type_check',
        inList('defect_type', [
          'crack_longitudinal',
          'crack_circumferential',
          'crack_multiple',
          'fracture',
          'broken',
          'hole',
          'joint_offset',
          'joint_separated',
          'root_intrusion',
          'infiltration',
          'deformation',
          'corrosion',
          'lateral_intrusion',
          'other',
        ]),
        transaction,
      );
      await addCheck(queryInterface, 'repairs', 'repairs_grade_check', 'condition_grade BETWEEN 1 AND 5', transaction);
      await addCheck(
        queryInterface,
        'repairs',
        'repairs_lengths_check',
        'distance_mm >= 0 AND defect_length_mm > 0 AND (planned_patch_length_mm IS NULL OR planned_patch_length_mm > 0)',
        transaction,
      );
      await addCheck(
        queryInterface,
        'repairs',
        'repairs_clock_check',
        "clock_position IS NULL OR clock_position ~ '^(1[0-2]|[1-9])(-(1[0-2]|[1-9]))?$'",
        transaction,
      );
      await addCheck(
        queryInterface,
        'repairs',
        'repairs_status_check',
        inList('status', ['planned', 'installed', 'failed', 'cancelled']),
        transaction,
      );
      await indexCompany(queryInterface, 'repairs', transaction);
      await queryInterface.addIndex('repairs', ['job_id', 'position'], { transaction });
      await queryInterface.addIndex('repairs', ['segment_id'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      for (const table of ['repairs', 'jobs', 'job_number_sequences']) {
        await queryInterface.dropTable(table, { transaction });
      }
    });
  },
};
