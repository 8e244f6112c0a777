import { DataTypes, QueryInterface } from 'sequelize';

const timestamps = {
  createdAt: { type: DataTypes.DATE, allowNull: false },
  updatedAt: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    email: { type: DataTypes.STRING, allowNull: false, unique: true },
    name: { type: DataTypes.STRING, allowNull: false },
    passwordHash: { type: DataTypes.STRING, allowNull: false },
    siteRole: { type: DataTypes.STRING, allowNull: false, defaultValue: 'user' },
    unitSystem: { type: DataTypes.STRING, allowNull: false, defaultValue: 'si' },
    tokenVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.createTable('farms', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    name: { type: DataTypes.STRING, allowNull: false },
    latitudeDeg: { type: DataTypes.DOUBLE, allowNull: false },
    longitudeDeg: { type: DataTypes.DOUBLE, allowNull: false },
    elevationM: { type: DataTypes.DOUBLE, allowNull: false },
    timeZone: { type: DataTypes.STRING, allowNull: false },
    ...timestamps,
  });
  await qi.createTable('memberships', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    userId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    role: { type: DataTypes.STRING, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('memberships', ['farmId', 'userId'], { unique: true, name: 'memberships_farm_user' });
  await qi.addIndex('memberships', ['userId'], { name: 'memberships_user' });
  await qi.createTable('houses', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    name: { type: DataTypes.STRING, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: true },
    shape: { type: DataTypes.STRING, allowNull: false },
    spans: { type: DataTypes.INTEGER, allowNull: false },
    widthM: { type: DataTypes.DOUBLE, allowNull: false },
    lengthM: { type: DataTypes.DOUBLE, allowNull: false },
    eaveHeightM: { type: DataTypes.DOUBLE, allowNull: false },
    ridgeHeightM: { type: DataTypes.DOUBLE, allowNull: false },
    coverings: { type: DataTypes.JSON, allowNull: false },
    // JSON defaults are values, not JSON text: the string '{}' would be stored as the JSON
    // string "{}" (on SQLite and PostgreSQL alike), not as an empty object.
    coveringUOverridesWPerM2K: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
    airLeakageClassId: { type: DataTypes.STRING, allowNull: false },
    airChangesPerHourOverride: { type: DataTypes.DOUBLE, allowNull: true },
    perimeterInsulated: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    curtainId: { type: DataTypes.STRING, allowNull: true },
    heaters: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
    exhaustFans: { type: DataTypes.JSON, allowNull: false },
    inletAreaM2: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
    setpoints: { type: DataTypes.JSON, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('houses', ['farmId'], { name: 'houses_farm' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('houses');
  await qi.dropTable('memberships');
  await qi.dropTable('farms');
  await qi.dropTable('users');
}
