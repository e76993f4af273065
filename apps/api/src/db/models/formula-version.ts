import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { FormulaInput } from '@fryline/schemas';

export class FormulaVersion extends Model<InferAttributes<FormulaVersion>, InferCreationAttributes<FormulaVersion>> {
  declare id: CreationOptional<string>;
  declare version: number;
  declare formula: FormulaInput;
  declare note: CreationOptional<string>;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    FormulaVersion.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        version: { type: DataTypes.INTEGER, allowNull: false },
        formula: { type: DataTypes.JSONB, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'formula_versions', underscored: true, updatedAt: false },
    );
  }
}
