'use strict';
// Insights read a period of mixes per company and, often, per crew: (company_id, crew_id, mixed_at) serves the
// crew's range scan; (company_id, mixed_at) from the derived-state migration serves "all crews".

module.exports = {
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.addIndex('installs', ['company_id', 'crew_id', 'mixed_at'], {
        name: 'installs_company_crew_mixed_at',
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.removeIndex('installs', 'installs_company_crew_mixed_at', { transaction });
    });
  },
};
