import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type MailStatus = 'queued' | 'sending' | 'sent' | 'failed';

export class MailQueueModel extends Model<InferAttributes<MailQueueModel>, InferCreationAttributes<MailQueueModel>> {
  declare id: CreationOptional<number>;
  declare kind: string;
  declare toAddress: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string | null;
  declare status: CreationOptional<MailStatus>;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: Date;
  declare lastError: string | null;
  declare messageId: string | null;
  declare sentAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class OutboxMessageModel extends Model<InferAttributes<OutboxMessageModel>, InferCreationAttributes<OutboxMessageModel>> {
  declare id: CreationOptional<number>;
  declare toAddress: string;
  declare fromAddress: string | null;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string | null;
  declare messageId: string | null;
  declare sentAt: Date;
}

export function initMailModels(sequelize: Sequelize): void {
  MailQueueModel.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      kind: { type: DataTypes.STRING(64), allowNull: false },
      toAddress: { type: DataTypes.STRING(254), allowNull: false },
      subject: { type: DataTypes.STRING(300), allowNull: false },
      textBody: { type: DataTypes.TEXT('medium'), allowNull: false },
      htmlBody: { type: DataTypes.TEXT('medium'), allowNull: true },
      status: { type: DataTypes.ENUM('queued', 'sending', 'sent', 'failed'), allowNull: false, defaultValue: 'queued' },
      attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      nextAttemptAt: { type: DataTypes.DATE(3), allowNull: false },
      lastError: { type: DataTypes.STRING(1000), allowNull: true },
      messageId: { type: DataTypes.STRING(255), allowNull: true },
      sentAt: { type: DataTypes.DATE(3), allowNull: true },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: 'mail_queue', modelName: 'MailQueue' },
  );
  OutboxMessageModel.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      toAddress: { type: DataTypes.STRING(1000), allowNull: false },
      fromAddress: { type: DataTypes.STRING(1000), allowNull: true },
      subject: { type: DataTypes.STRING(1000), allowNull: false },
      textBody: { type: DataTypes.TEXT('medium'), allowNull: false },
      htmlBody: { type: DataTypes.TEXT('medium'), allowNull: true },
      messageId: { type: DataTypes.STRING(255), allowNull: true },
      sentAt: { type: DataTypes.DATE(3), allowNull: false },
    },
    { sequelize, tableName: 'outbox_messages', modelName: 'OutboxMessage', timestamps: false },
  );
}
