import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class RequirementSetModel extends Model<InferAttributes<RequirementSetModel>, InferCreationAttributes<RequirementSetModel>> {
  declare id: CreationOptional<number>;
  declare productLineId: number;
  declare name: string;
  declare purpose: string;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initRequirementSetModel(sequelize: Sequelize): void {
  RequirementSetModel.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      productLineId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      purpose: { type: DataTypes.TEXT, allowNull: false },
      createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: 'requirement_sets', modelName: 'RequirementSet' },
  );
}
