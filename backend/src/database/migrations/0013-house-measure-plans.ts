import { DataTypes, type QueryInterface } from 'sequelize';

/** The measures a house's owner is weighing, with what each would cost (dialect-neutral). */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('house_measure_plans', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    houseId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      unique: true,
      references: { model: 'houses', key: 'id' },
      onDelete: 'CASCADE',
    },
    measures: { type: DataTypes.JSON, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('house_measure_plans');
}
