'use strict';
// Installs and their append-only event log, attachments, office reviews and the audit trail.
const { DataTypes } = require('sequelize');
const { id, companyId, ref, timestamps, inList, addCheck, indexCompany } = require('../scripts/migration-helpers.cjs');

const EVENT_TYPES = [
  'safety_acknowledged',
  'checks_done',
  'dry_run_started',
  'dry_run_finished',
  'conditions_recorded',
  'go_decision',
  'resin_mixed',
  'patch_loaded',
  'packer_in_position',
  'bladder_inflated',
  'pressure_reading',
  'bladder_deflated',
  'inspection_recorded',
  'signed_off',
  'note',
  'correction',
];

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'installs',
        {
          id: id(),
          company_id: companyId(),
          repair_id: ref('repairs', { onDelete: 'CASCADE' }),
          job_id: ref('jobs', { onDelete: 'CASCADE' }),
          crew_id: ref('crews', { allowNull: true, onDelete: 'SET NULL' }),
          status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'not_started' },
          resin_system_id: ref('resin_systems', { allowNull: true }),
          resin_kit_id: ref('resin_kits', { allowNull: true }),
          packer_id: ref('packers', { allowNull: true }),
          checklist_template_id: ref('checklist_templates', { allowNull: true, onDelete: 'SET NULL' }),
          mix_temp_c: { type: DataTypes.DECIMAL(5, 2) },
          pipe_temp_c: { type: DataTypes.DECIMAL(5, 2) },
          patch_length_mm: { type: DataTypes.INTEGER },
          dry_run_seconds: { type: DataTypes.INTEGER },
          no_go_override_reason: { type: DataTypes.TEXT },
          inspection_result: { type: DataTypes.STRING(8) },
          inspection_notes: { type: DataTypes.TEXT },
          signed_off_by_id: ref('users', { allowNull: true, onDelete: 'SET NULL' }),
          signed_off_at: { type: DataTypes.DATE },
          started_at: { type: DataTypes.DATE },
          finished_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'installs',
        'installs_status_check',
        inList('status', ['not_started', 'in_progress', 'awaiting_review', 'approved', 'sent_back', 'abandoned']),
        transaction,
      );
      await addCheck(
        queryInterface,
        'installs',
        'installs_inspection_check',
        "inspection_result IS NULL OR inspection_result IN ('pass', 'fail')",
        transaction,
      );
      await addCheck(
        queryInterface,
        'installs',
        'installs_values_check',
        '(dry_run_seconds IS NULL OR dry_run_seconds >= 0) AND (patch_length_mm IS NULL OR patch_length_mm > 0)',
        transaction,
      );
      await indexCompany(queryInterface, 'installs', transaction);
      await queryInterface.addIndex('installs', ['repair_id'], { transaction });
      await queryInterface.addIndex('installs', ['job_id'], { transaction });
      await queryInterface.addIndex('installs', ['company_id', 'status'], { transaction });

      await queryInterface.createTable(
        'install_events',
        {
          id: id(),
          company_id: companyId(),
          install_id: ref('installs', { onDelete: 'CASCADE' }),
          client_event_id: { type: DataTypes.UUID, allowNull: false },
          type: { type: DataTypes.STRING(24), allowNull: false },
          device_time: { type: DataTypes.DATE, allowNull: false },
          received_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
          user_id: ref('users'),
          payload: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
          corrects_event_id: ref('install_events', { allowNull: true }),
          created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'install_events',
        'install_events_type_check',
        inList('type', EVENT_TYPES),
        transaction,
      );
      await addCheck(
        queryInterface,
        'install_events',
        'install_events_correction_check',
        "(type = 'correction') = (corrects_event_id IS NOT NULL)",
        transaction,
      );
      await indexCompany(queryInterface, 'install_events', transaction);
      await queryInterface.addIndex('install_events', ['company_id', 'client_event_id'], {
        unique: true,
        name: 'install_events_company_client_event_unique',
        transaction,
      });
      await queryInterface.addIndex('install_events', ['install_id', 'device_time'], { transaction });
      // The log is evidence: rows are never edited. (Deleting a whole install still cascades.)
      await queryInterface.sequelize.query(
        `
        CREATE FUNCTION install_events_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
        BEGIN
          RAISE EXCEPTION 'install events are append-only: record a correction instead';
        END $$;
        CREATE TRIGGER install_events_no_update BEFORE UPDATE ON install_events
          FOR EACH ROW EXECUTE FUNCTION install_events_append_only();
      `,
        { transaction },
      );

      await queryInterface.createTable(
        'attachments',
        {
          id: id(),
          company_id: companyId(),
          job_id: ref('jobs', { allowNull: true, onDelete: 'CASCADE' }),
          repair_id: ref('repairs', { allowNull: true, onDelete: 'CASCADE' }),
          install_id: ref('installs', { allowNull: true, onDelete: 'CASCADE' }),
          kind: { type: DataTypes.STRING(16), allowNull: false },
          storage_key: { type: DataTypes.STRING(300), allowNull: false, unique: true },
          thumbnail_key: { type: DataTypes.STRING(300) },
          content_type: { type: DataTypes.STRING(100), allowNull: false },
          byte_size: { type: DataTypes.INTEGER, allowNull: false },
          original_name: { type: DataTypes.STRING(255) },
          caption: { type: DataTypes.STRING(300) },
          uploaded_by_id: ref('users', { allowNull: true, onDelete: 'SET NULL' }),
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'attachments',
        'attachments_kind_check',
        inList('kind', ['before', 'after', 'inspection', 'document', 'other']),
        transaction,
      );
      await addCheck(queryInterface, 'attachments', 'attachments_size_check', 'byte_size > 0', transaction);
      await addCheck(
        queryInterface,
        'attachments',
        'attachments_owner_check',
        'job_id IS NOT NULL OR repair_id IS NOT NULL OR install_id IS NOT NULL',
        transaction,
      );
      await indexCompany(queryInterface, 'attachments', transaction);
      await queryInterface.addIndex('attachments', ['install_id'], { transaction });
      await queryInterface.addIndex('attachments', ['repair_id'], { transaction });

      await queryInterface.createTable(
        'reviews',
        {
          id: id(),
          company_id: companyId(),
          install_id: ref('installs', { onDelete: 'CASCADE' }),
          reviewer_id: ref('users'),
          decision: { type: DataTypes.STRING(16), allowNull: false },
          comment: { type: DataTypes.TEXT },
          created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'reviews',
        'reviews_decision_check',
        inList('decision', ['approved', 'sent_back']),
        transaction,
      );
      await addCheck(
        queryInterface,
        'reviews',
        'reviews_comment_check',
        "decision = 'approved' OR length(trim(comment)) > 0",
        transaction,
      );
      await indexCompany(queryInterface, 'reviews', transaction);
      await queryInterface.addIndex('reviews', ['install_id'], { transaction });

      await queryInterface.createTable(
        'audit_entries',
        {
          id: id(),
          company_id: companyId(),
          user_id: ref('users', { allowNull: true, onDelete: 'SET NULL' }),
          action: { type: DataTypes.STRING(40), allowNull: false },
          entity_type: { type: DataTypes.STRING(40), allowNull: false },
          entity_id: { type: DataTypes.UUID, allowNull: false },
          changes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
          reason: { type: DataTypes.TEXT },
          created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        },
        { transaction },
      );
      await indexCompany(queryInterface, 'audit_entries', transaction);
      await queryInterface.addIndex('audit_entries', ['entity_type', 'entity_id'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      for (const table of ['audit_entries', 'reviews', 'attachments', 'install_events', 'installs']) {
        await queryInterface.dropTable(table, { transaction });
      }
      await queryInterface.sequelize.query('DROP FUNCTION IF EXISTS install_events_append_only()', { transaction });
    });
  },
};
