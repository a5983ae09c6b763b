import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class AssessmentModel extends Model<InferAttributes<AssessmentModel>, InferCreationAttributes<AssessmentModel>> {
  declare id: CreationOptional<number>;
  declare candidateId: number;
  declare revisionId: number;
  declare revisionSha256: string;
  declare engineVersion: string;
  declare verdict: string;
  declare resultJson: string;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
}

export function initAssessmentModel(sequelize: Sequelize): void {
  AssessmentModel.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      candidateId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      revisionId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      revisionSha256: { type: DataTypes.CHAR(64), allowNull: false },
      engineVersion: { type: DataTypes.STRING(32), allowNull: false },
      verdict: { type: DataTypes.STRING(16), allowNull: false },
      resultJson: { type: DataTypes.TEXT('long'), allowNull: false },
      createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: 'assessments', modelName: 'Assessment', updatedAt: false },
  );
}
