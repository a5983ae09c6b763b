import { DataTypes, type QueryInterface } from 'sequelize';

// mail_queue: what the app has decided to send (written in the same transaction
// as its cause); outbox_messages: what the local mail fake received.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('mail_queue', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    kind: { type: DataTypes.STRING(64), allowNull: false },
    to_address: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    text_body: { type: DataTypes.TEXT('medium'), allowNull: false },
    html_body: { type: DataTypes.TEXT('medium'), allowNull: true },
    status: { type: DataTypes.ENUM('queued', 'sending', 'sent', 'failed'), allowNull: false, defaultValue: 'queued' },
    attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    next_attempt_at: { type: DataTypes.DATE(3), allowNull: false },
    last_error: { type: DataTypes.STRING(1000), allowNull: true },
    message_id: { type: DataTypes.STRING(255), allowNull: true },
    sent_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('mail_queue', ['status', 'next_attempt_at']);
  await qi.createTable('outbox_messages', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    to_address: { type: DataTypes.STRING(1000), allowNull: false },
    from_address: { type: DataTypes.STRING(1000), allowNull: true },
    subject: { type: DataTypes.STRING(1000), allowNull: false },
    text_body: { type: DataTypes.TEXT('medium'), allowNull: false },
    html_body: { type: DataTypes.TEXT('medium'), allowNull: true },
    message_id: { type: DataTypes.STRING(255), allowNull: true },
    sent_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('outbox_messages', ['sent_at']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('outbox_messages');
  await qi.dropTable('mail_queue');
}
