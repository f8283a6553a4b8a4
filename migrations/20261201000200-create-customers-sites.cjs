'use strict';
// Customers, their sites, the access points on a site and the pipe segments between them.
const { DataTypes } = require('sequelize');
const { id, companyId, ref, timestamps, inList, addCheck, indexCompany } = require('../scripts/migration-helpers.cjs');

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.createTable(
        'customers',
        {
          id: id(),
          company_id: companyId(),
          name: { type: DataTypes.STRING(200), allowNull: false },
          kind: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'homeowner' },
          contact_name: { type: DataTypes.STRING(200) },
          email: { type: DataTypes.STRING(254) },
          phone: { type: DataTypes.STRING(40) },
          billing_address: { type: DataTypes.TEXT },
          notes: { type: DataTypes.TEXT },
          archived_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'customers',
        'customers_kind_check',
        inList('kind', ['homeowner', 'property_manager', 'municipality', 'contractor', 'business', 'other']),
        transaction,
      );
      await indexCompany(queryInterface, 'customers', transaction);

      await queryInterface.createTable(
        'sites',
        {
          id: id(),
          company_id: companyId(),
          customer_id: ref('customers'),
          name: { type: DataTypes.STRING(200), allowNull: false },
          address_line: { type: DataTypes.STRING(300), allowNull: false },
          city: { type: DataTypes.STRING(120), allowNull: false },
          region: { type: DataTypes.STRING(120) },
          postal_code: { type: DataTypes.STRING(20) },
          notes: { type: DataTypes.TEXT },
          archived_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await indexCompany(queryInterface, 'sites', transaction);
      await queryInterface.addIndex('sites', ['customer_id'], { transaction });

      await queryInterface.createTable(
        'access_points',
        {
          id: id(),
          company_id: companyId(),
          site_id: ref('sites', { onDelete: 'CASCADE' }),
          label: { type: DataTypes.STRING(60), allowNull: false },
          kind: { type: DataTypes.STRING(16), allowNull: false },
          depth_mm: { type: DataTypes.INTEGER },
          notes: { type: DataTypes.TEXT },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'access_points',
        'access_points_kind_check',
        inList('kind', ['manhole', 'cleanout', 'other']),
        transaction,
      );
      await addCheck(
        queryInterface,
        'access_points',
        'access_points_depth_check',
        'depth_mm IS NULL OR depth_mm >= 0',
        transaction,
      );
      await indexCompany(queryInterface, 'access_points', transaction);
      await queryInterface.addIndex('access_points', ['site_id', 'label'], { unique: true, transaction });

      await queryInterface.createTable(
        'segments',
        {
          id: id(),
          company_id: companyId(),
          site_id: ref('sites', { onDelete: 'CASCADE' }),
          from_access_point_id: ref('access_points'),
          to_access_point_id: ref('access_points', { allowNull: true }),
          label: { type: DataTypes.STRING(60), allowNull: false },
          material: { type: DataTypes.STRING(24), allowNull: false },
          nominal_size_mm: { type: DataTypes.INTEGER, allowNull: false },
          inside_diameter_mm: { type: DataTypes.DECIMAL(7, 1), allowNull: false },
          length_mm: { type: DataTypes.INTEGER, allowNull: false },
          depth_mm: { type: DataTypes.INTEGER },
          archived_at: { type: DataTypes.DATE },
          ...timestamps(),
        },
        { transaction },
      );
      await addCheck(
        queryInterface,
        'segments',
        'segments_material_check',
        inList('material', [
          'vitrified_clay',
          'concrete',
          'pvc',
          'hdpe',
          'cast_iron',
          'ductile_iron',
          'asbestos_cement',
          'bituminous_fibre',
          'brick',
          'other',
        ]),
        transaction,
      );
      await addCheck(
        queryInterface,
        'segments',
        'segments_sizes_check',
        'nominal_size_mm > 0 AND inside_diameter_mm > 0 AND length_mm > 0 AND (depth_mm IS NULL OR depth_mm >= 0)',
        transaction,
      );
      await addCheck(
        queryInterface,
        'segments',
        'segments_ends_check',
        'to_access_point_id IS NULL OR to_access_point_id <> from_access_point_id',
        transaction,
      );
      await indexCompany(queryInterface, 'segments', transaction);
      await queryInterface.addIndex('segments', ['site_id'], { transaction });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      for (const table of ['segments', 'access_points', 'sites', 'customers']) {
        await queryInterface.dropTable(table, { transaction });
      }
    });
  },
};
