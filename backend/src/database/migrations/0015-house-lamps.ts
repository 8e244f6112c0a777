import { DataTypes, QueryInterface } from 'sequelize';

/**
 * Supplemental lamps of a house (power density, hours per day by month, the share of their input
 * that heats the house, an optional lamp type) as one JSON column. Nullable, so existing houses
 * read as "no lamps".
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('houses', 'lamps', { type: DataTypes.JSON, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('houses', 'lamps');
}
