import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class CandidateModel extends Model<InferAttributes<CandidateModel>, InferCreationAttributes<CandidateModel>> {
  declare id: CreationOptional<number>;
  declare productLineId: number;
  declare name: string;
  declare notes: string;
  declare designJson: string;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initCandidateModel(sequelize: Sequelize): void {
  CandidateModel.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      productLineId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      notes: { type: DataTypes.TEXT, allowNull: false },
      designJson: { type: DataTypes.TEXT, allowNull: false },
      createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: 'candidates', modelName: 'Candidate' },
  );
}
