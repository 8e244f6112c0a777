import { DataTypes, QueryInterface } from 'sequelize';

/**
 * A house's shade cloth: `{ solarTransmittance, months }` as JSON, or null for none. Houses that
 * exist already have no cloth.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('houses', 'shadeCloth', { type: DataTypes.JSON, allowNull: true, defaultValue: null });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('houses', 'shadeCloth');
}
