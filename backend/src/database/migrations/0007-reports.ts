import { DataTypes, QueryInterface } from 'sequelize';

/**
 * Heater-sizing reports: a saved snapshot of the inputs and results (so later edits never change
 * a report), the adviser's text, and draft/issued status. A report outlives its house (the
 * snapshot holds everything); houseId is cleared when the house is deleted.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('reports', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    houseId: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'houses', key: 'id' },
      onDelete: 'SET NULL',
    },
    houseName: { type: DataTypes.STRING, allowNull: false },
    title: { type: DataTypes.STRING(200), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false },
    recommendations: { type: DataTypes.TEXT, allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    previousReportId: { type: DataTypes.INTEGER, allowNull: true },
    authorUserId: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    authorName: { type: DataTypes.STRING, allowNull: false },
    issuedAt: { type: DataTypes.DATE, allowNull: true },
    snapshot: { type: DataTypes.JSON, allowNull: false },
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('reports', ['farmId']);
  await qi.addIndex('reports', ['houseId']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('reports');
}
