// Column builders shared by the migrations, so every tenant table gets the same id,
// company_id (foreign key + index) and timestamptz columns.
const { DataTypes } = require('sequelize');

const id = () => ({ type: DataTypes.UUID, primaryKey: true, allowNull: false, defaultValue: DataTypes.UUIDV4 });

const companyId = () => ({
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'companies', key: 'id' },
  onDelete: 'CASCADE',
});

// NO ACTION (checked at statement end) still refuses deleting a referenced row, yet lets a whole company cascade away.
const ref = (table, { allowNull = false, onDelete = 'NO ACTION' } = {}) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});

const timestamps = () => ({
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
});

/** SQL IN-list check, e.g. check('status', ['a','b']) -> "status IN ('a','b')". */
const inList = (column, values) => `${column} IN (${values.map((v) => `'${v}'`).join(', ')})`;

async function addCheck(queryInterface, table, name, sql, transaction) {
  await queryInterface.sequelize.query(`ALTER TABLE "${table}" ADD CONSTRAINT "${name}" CHECK (${sql})`, {
    transaction,
  });
}

async function indexCompany(queryInterface, table, transaction) {
  await queryInterface.addIndex(table, ['company_id'], { transaction });
}

module.exports = { id, companyId, ref, timestamps, inList, addCheck, indexCompany };
