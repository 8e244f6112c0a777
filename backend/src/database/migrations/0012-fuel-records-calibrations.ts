import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Fuel bills and tank deliveries of a farm, the houses each one serves, and the calibrations
 * fitted to them (dialect-neutral: SQLite and PostgreSQL).
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('fuel_records', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    /** id of a row in reference-data/fuels.json */
    fuelId: { type: DataTypes.STRING, allowNull: false },
    /** in `quantityUnit`, one of the fuel's purchase units */
    quantity: { type: DataTypes.DOUBLE, allowNull: false },
    quantityUnit: { type: DataTypes.STRING, allowNull: false },
    /** money in the farm's currency; null = not entered */
    cost: { type: DataTypes.DOUBLE, allowNull: true },
    /** 'YYYY-MM-DD', first and last day the bill covers (inclusive) */
    startDate: { type: DataTypes.STRING(10), allowNull: false },
    endDate: { type: DataTypes.STRING(10), allowNull: false },
    /** fuel for other uses than heating, in `quantityUnit` per day; null = none */
    nonHeatingPerDay: { type: DataTypes.DOUBLE, allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: true },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('fuel_records', ['farmId']);

  await qi.createTable('fuel_record_houses', {
    fuelRecordId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      primaryKey: true,
      references: { model: 'fuel_records', key: 'id' },
      onDelete: 'CASCADE',
    },
    houseId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      primaryKey: true,
      references: { model: 'houses', key: 'id' },
      onDelete: 'CASCADE',
    },
  });
  await qi.addIndex('fuel_record_houses', ['houseId']);

  await qi.createTable('saved_calibrations', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    /** the bills, houses and climate the fit ran on, as they were */
    inputs: { type: DataTypes.JSON, allowNull: false },
    /** factors per meter and per house, statistics, billed and modelled per period */
    result: { type: DataTypes.JSON, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('saved_calibrations', ['farmId']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('saved_calibrations');
  await qi.dropTable('fuel_record_houses');
  await qi.dropTable('fuel_records');
}
