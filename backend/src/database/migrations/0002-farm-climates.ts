import { DataTypes, QueryInterface } from 'sequelize';

/** One climate per farm: design temperatures and 12 months of normals (SI). */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('farm_climates', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      unique: true,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    winterDesignC: { type: DataTypes.DOUBLE, allowNull: false },
    summerDesignC: { type: DataTypes.DOUBLE, allowNull: false },
    summerDesignWetBulbC: { type: DataTypes.DOUBLE, allowNull: false },
    summerDailyRangeK: { type: DataTypes.DOUBLE, allowNull: false },
    monthly: { type: DataTypes.JSON, allowNull: false },
    sourceNote: { type: DataTypes.TEXT, allowNull: true },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('farm_climates');
}
