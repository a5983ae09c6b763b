import { DataTypes, type QueryInterface } from 'sequelize';

// Failed sign-ins, kept in the database (not in process memory) so that the
// limit holds per account and per address across every API process.
// A successful sign-in sets cleared_at on that account's rows only.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('login_failures', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false },
    address: { type: DataTypes.STRING(64), allowNull: false },
    failed_at: { type: DataTypes.DATE(3), allowNull: false },
    cleared_at: { type: DataTypes.DATE(3), allowNull: true },
  });
  await qi.addIndex('login_failures', ['email', 'failed_at']);
  await qi.addIndex('login_failures', ['address', 'failed_at']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('login_failures');
}
