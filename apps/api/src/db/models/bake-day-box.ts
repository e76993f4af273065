import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { BoxSize } from '@fryline/schemas';

export class BakeDayBox extends Model<InferAttributes<BakeDayBox>, InferCreationAttributes<BakeDayBox>> {
  declare bakeDayId: string;
  declare size: BoxSize;
  declare pieces: number;
  declare priceCents: number;

  static initModel(sequelize: Sequelize) {
    BakeDayBox.init(
      {
        bakeDayId: { type: DataTypes.UUID, primaryKey: true },
        size: { type: DataTypes.TEXT, primaryKey: true },
        pieces: { type: DataTypes.INTEGER, allowNull: false },
        priceCents: { type: DataTypes.INTEGER, allowNull: false },
      },
      { sequelize, tableName: 'bake_day_boxes', underscored: true, timestamps: false },
    );
  }
}
