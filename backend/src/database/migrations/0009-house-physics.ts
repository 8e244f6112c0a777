import { DataTypes, QueryInterface } from 'sequelize';

/**
 * House fields for the physics a practitioner expects: the opaque kneewall (height and
 * construction). Nullable, so existing houses read as "no kneewall".
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('houses', 'kneewallHeightM', { type: DataTypes.DOUBLE, allowNull: true });
  await qi.addColumn('houses', 'kneewallId', { type: DataTypes.STRING, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('houses', 'kneewallId');
  await qi.removeColumn('houses', 'kneewallHeightM');
}
