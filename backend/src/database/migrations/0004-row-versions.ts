import { DataTypes, QueryInterface } from 'sequelize';

/**
 * Optimistic concurrency: a `version` on every row people edit, raised by one on each save and
 * named by the client in If-Match (see common/versioning.ts). A farm's fuel prices are one set
 * replaced as a whole, and the set may be empty, so its version lives on the farm row
 * (`fuelPricesVersion`) rather than on the price rows.
 */
const VERSIONED_TABLES = ['houses', 'farms', 'farm_climates', 'house_calendars'] as const;

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const table of VERSIONED_TABLES) {
    await qi.addColumn(table, 'version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 });
  }
  await qi.addColumn('farms', 'fuelPricesVersion', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('farms', 'fuelPricesVersion');
  for (const table of [...VERSIONED_TABLES].reverse()) await qi.removeColumn(table, 'version');
}
