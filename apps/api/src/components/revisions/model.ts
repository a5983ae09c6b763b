import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

import type { RevisionStatus } from '@polecourt/contracts';

export class RevisionModel extends Model<InferAttributes<RevisionModel>, InferCreationAttributes<RevisionModel>> {
  declare id: CreationOptional<number>;
  declare requirementSetId: number;
  declare number: number;
  declare status: RevisionStatus;
  declare requirementsJson: string;
  declare rationale: string;
  declare version: CreationOptional<number>;
  declare authorId: number;
  declare approverId: CreationOptional<number | null>;
  declare submittedAt: CreationOptional<Date | null>;
  declare approvedAt: CreationOptional<Date | null>;
  declare retiredAt: CreationOptional<Date | null>;
  declare sha256: CreationOptional<string | null>;
  declare approvalMeaning: CreationOptional<string | null>;
  declare impactJson: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initRevisionModel(sequelize: Sequelize): void {
  RevisionModel.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      requirementSetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      status: { type: DataTypes.ENUM('draft', 'in_review', 'approved', 'retired'), allowNull: false },
      requirementsJson: { type: DataTypes.TEXT, allowNull: false },
      rationale: { type: DataTypes.TEXT, allowNull: false },
      version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
      authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      approverId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      submittedAt: { type: DataTypes.DATE(3), allowNull: true },
      approvedAt: { type: DataTypes.DATE(3), allowNull: true },
      retiredAt: { type: DataTypes.DATE(3), allowNull: true },
      sha256: { type: DataTypes.CHAR(64), allowNull: true },
      approvalMeaning: { type: DataTypes.STRING(32), allowNull: true },
      impactJson: { type: DataTypes.TEXT('long'), allowNull: true },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: 'revisions', modelName: 'Revision' },
  );
}
