import { DataTypes, QueryInterface } from 'sequelize';

/**
 * Season data: logged outdoor temperatures per farm, a production calendar per house and the
 * farm's fuel prices (one per fuel).
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('temperature_logs', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING, allowNull: false },
    resolution: { type: DataTypes.STRING, allowNull: false },
    startDate: { type: DataTypes.STRING(10), allowNull: false },
    endDate: { type: DataTypes.STRING(10), allowNull: false },
    rowCount: { type: DataTypes.INTEGER, allowNull: false },
    readingCount: { type: DataTypes.INTEGER, allowNull: false },
    /** the column mapping the user confirmed, kept to show how the file was read */
    mapping: { type: DataTypes.JSON, allowNull: false },
    /** readings in °C: [{ at, temperatureC, minC?, maxC? }] */
    readings: { type: DataTypes.JSON, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('temperature_logs', ['farmId']);

  await qi.createTable('house_calendars', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    houseId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      unique: true,
      references: { model: 'houses', key: 'id' },
      onDelete: 'CASCADE',
    },
    periods: { type: DataTypes.JSON, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });

  await qi.createTable('farm_fuel_prices', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    fuelId: { type: DataTypes.STRING, allowNull: false },
    pricePerUnit: { type: DataTypes.DOUBLE, allowNull: false },
    priceUnit: { type: DataTypes.STRING(2), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('farm_fuel_prices', ['farmId', 'fuelId'], { unique: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('farm_fuel_prices');
  await qi.dropTable('house_calendars');
  await qi.dropTable('temperature_logs');
}
