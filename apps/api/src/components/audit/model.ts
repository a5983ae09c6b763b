import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class AuditEventModel extends Model<InferAttributes<AuditEventModel>, InferCreationAttributes<AuditEventModel>> {
  declare id: CreationOptional<number>;
  declare occurredAt: Date;
  declare actorId: number | null;
  declare actorEmail: string | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string | null;
  declare productLineId: number | null;
  declare beforeJson: string | null;
  declare afterJson: string | null;
  declare prevHash: string;
  declare hash: string;
}

export class AuditHeadModel extends Model<InferAttributes<AuditHeadModel>, InferCreationAttributes<AuditHeadModel>> {
  declare id: number;
  declare lastId: number | null;
  declare lastHash: string;
}

export function initAuditModels(sequelize: Sequelize): void {
  AuditEventModel.init(
    {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      occurredAt: { type: DataTypes.DATE(3), allowNull: false },
      actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      actorEmail: { type: DataTypes.STRING(254), allowNull: true },
      action: { type: DataTypes.STRING(64), allowNull: false },
      entityType: { type: DataTypes.STRING(64), allowNull: false },
      entityId: { type: DataTypes.STRING(64), allowNull: true },
      productLineId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      beforeJson: { type: DataTypes.TEXT('long'), allowNull: true },
      afterJson: { type: DataTypes.TEXT('long'), allowNull: true },
      prevHash: { type: DataTypes.CHAR(64), allowNull: false },
      hash: { type: DataTypes.CHAR(64), allowNull: false },
    },
    { sequelize, tableName: 'audit_events', modelName: 'AuditEvent', timestamps: false },
  );
  AuditHeadModel.init(
    {
      id: { type: DataTypes.TINYINT.UNSIGNED, primaryKey: true },
      lastId: { type: DataTypes.BIGINT.UNSIGNED, allowNull: true },
      lastHash: { type: DataTypes.CHAR(64), allowNull: false },
    },
    { sequelize, tableName: 'audit_head', modelName: 'AuditHead', timestamps: false },
  );
}
