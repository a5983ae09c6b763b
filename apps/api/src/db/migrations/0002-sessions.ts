import { DataTypes, type QueryInterface } from 'sequelize';

// The table connect-session-sequelize reads and writes (its default columns,
// timestamps underscored like every other table).
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING(64), primaryKey: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('sessions', ['expires']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('sessions');
}
