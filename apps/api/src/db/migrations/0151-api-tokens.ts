import { DataTypes, type QueryInterface } from 'sequelize';

// Personal API tokens for pipelines. Only the SHA-256 of the secret is kept,
// plus a short prefix so that people can tell their tokens apart.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('api_tokens', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    prefix: { type: DataTypes.STRING(16), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    last_used_at: { type: DataTypes.DATE(3), allowNull: true },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
    revoked_by: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' } },
  });
  await qi.addIndex('api_tokens', ['user_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('api_tokens');
}
