import { DataTypes, type QueryInterface } from 'sequelize';

// Audit events are chained: each stores the hash of the one before it, and
// audit_head holds the chain's tip under a row lock so writers line up.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('audit_events', {
    id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
    occurred_at: { type: DataTypes.DATE(3), allowNull: false },
    actor_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    actor_email: { type: DataTypes.STRING(254), allowNull: true },
    action: { type: DataTypes.STRING(64), allowNull: false },
    entity_type: { type: DataTypes.STRING(64), allowNull: false },
    entity_id: { type: DataTypes.STRING(64), allowNull: true },
    product_line_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    before_json: { type: DataTypes.TEXT('long'), allowNull: true },
    after_json: { type: DataTypes.TEXT('long'), allowNull: true },
    prev_hash: { type: DataTypes.CHAR(64), allowNull: false },
    hash: { type: DataTypes.CHAR(64), allowNull: false },
  });
  await qi.addIndex('audit_events', ['occurred_at']);
  await qi.addIndex('audit_events', ['entity_type', 'entity_id']);
  await qi.addIndex('audit_events', ['actor_id']);
  await qi.addIndex('audit_events', ['product_line_id']);
  await qi.createTable('audit_head', {
    id: { type: DataTypes.TINYINT.UNSIGNED, primaryKey: true },
    last_id: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
    last_hash: { type: DataTypes.CHAR(64), allowNull: false },
  });
  await qi.bulkInsert('audit_head', [{ id: 1, last_id: null, last_hash: '0'.repeat(64) }]);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('audit_head');
  await qi.dropTable('audit_events');
}
