import { DataTypes, type QueryInterface } from 'sequelize';

/** Cached years of hourly weather history per grid point and source (dialect-neutral). */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('weather_years', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    sourceKey: { type: DataTypes.STRING, allowNull: false },
    gridLatitudeDeg: { type: DataTypes.DOUBLE, allowNull: false },
    gridLongitudeDeg: { type: DataTypes.DOUBLE, allowNull: false },
    year: { type: DataTypes.INTEGER, allowNull: false },
    elevationM: { type: DataTypes.DOUBLE, allowNull: false },
    startAt: { type: DataTypes.DATE, allowNull: false },
    hourCount: { type: DataTypes.INTEGER, allowNull: false },
    missingHourCount: { type: DataTypes.INTEGER, allowNull: false },
    hours: { type: DataTypes.JSON, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('weather_years', ['sourceKey', 'gridLatitudeDeg', 'gridLongitudeDeg', 'year'], {
    unique: true,
    name: 'weather_years_grid_year',
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('weather_years');
}
