import { DataTypes, QueryInterface } from 'sequelize';

/**
 * Alternatives of a house: named patches over the house's fields (JSON), an optional production
 * calendar in place of the house's own, and an optional installed cost. They go with their house.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('house_alternatives', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    houseId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'houses', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: true },
    /** the house fields this alternative changes, merged onto the house as it is when read */
    patch: { type: DataTypes.JSON, allowNull: false },
    /** production periods in place of the house's calendar; null = the house's own calendar */
    calendar: { type: DataTypes.JSON, allowNull: true },
    /** installed cost, money in the farm's currency; null = not entered */
    costAmount: { type: DataTypes.DOUBLE, allowNull: true },
    createdById: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('house_alternatives', ['houseId']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('house_alternatives');
}
