import { DataTypes, QueryInterface } from 'sequelize';

/** Each farm's currency (ISO 4217 code); farms that exist already are taken to pay in US dollars. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('farms', 'currency', { type: DataTypes.STRING(3), allowNull: false, defaultValue: 'USD' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('farms', 'currency');
}
