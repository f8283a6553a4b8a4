'use strict';
// Defect types get our own plain-English codes in natural word order, and a repair gets an optional free-text
// "owner's defect code" for owners who require their own coding standard (stored as typed, no built-in list).
const { addCheck, inList } = require('../scripts/migration-helpers.cjs');

// Old code → new code. Down maps back, so a rollback leaves every row as it was.
const RENAMES = [
  ['crack_longitudinal', 'lengthwise_crack'],
  ['crack_circumferential', 'ring_crack'],
  ['crack_multiple', 'crazed_cracks'],
  ['fracture', 'open_fracture'],
  ['broken', 'broken_wall'],
  ['hole', 'hole'],
  ['joint_offset', 'joint_out_of_line'],
  ['joint_separated', 'joint_gap'],
  ['root_intrusion', 'roots'],
  ['infiltration', 'water_getting_in'],
  ['deformation', 'out_of_round'],
  ['corrosion', 'wall_loss'],
  ['lateral_intrusion', 'lateral_sticking_in'],
  ['other', 'other'],
];

async function recode(queryInterface, transaction, pairs) {
  await queryInterface.sequelize.query('ALTER TABLE "repairs" DROP CONSTRAINT IF EXISTS "repairs_defect_type_check"', {
    transaction,
  });
  const cases = pairs.map(([from, to]) => `WHEN '${from}' THEN '${to}'`).join(' ');
  await queryInterface.sequelize.query(
    `UPDATE "repairs" SET defect_type = CASE defect_type ${cases} ELSE defect_type END`,
    { transaction },
  );
  await addCheck(
    queryInterface,
    'repairs',
    'repairs_defect_type_check',
    inList(
      'defect_type',
      pairs.map(([, to]) => to),
    ),
    transaction,
  );
}

module.exports = {
  RENAMES,
  async up(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await recode(queryInterface, transaction, RENAMES);
      // Raw SQL on the unqualified name (not addColumn, which pins "public"), so the test can run this on a scratch schema.
      await queryInterface.sequelize.query('ALTER TABLE "repairs" ADD COLUMN "owner_defect_code" VARCHAR(60)', {
        transaction,
      });
    });
  },

  async down(queryInterface) {
    await queryInterface.sequelize.transaction(async (transaction) => {
      await queryInterface.sequelize.query('ALTER TABLE "repairs" DROP COLUMN "owner_defect_code"', { transaction });
      await recode(
        queryInterface,
        transaction,
        RENAMES.map(([from, to]) => [to, from]),
      );
    });
  },
};
