import { DataTypes, QueryInterface } from 'sequelize';

/**
 * House fields for the physics a practitioner expects: the opaque kneewall (height and
 * construction), and the farm's design wind speed. Nullable, so existing houses read as "no
 * kneewall" and existing climates take the wind the U tables assume.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('houses', 'kneewallHeightM', { type: DataTypes.DOUBLE, allowNull: true });
  await qi.addColumn('houses', 'kneewallId', { type: DataTypes.STRING, allowNull: true });
  await qi.addColumn('farm_climates', 'designWindSpeedMPerS', { type: DataTypes.DOUBLE, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('farm_climates', 'designWindSpeedMPerS');
  await qi.removeColumn('houses', 'kneewallId');
  await qi.removeColumn('houses', 'kneewallHeightM');
}
