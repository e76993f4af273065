import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class BakeDayMenuItem extends Model<InferAttributes<BakeDayMenuItem>, InferCreationAttributes<BakeDayMenuItem>> {
  declare bakeDayId: string;
  declare menuItemId: string;

  static initModel(sequelize: Sequelize) {
    BakeDayMenuItem.init(
      {
        bakeDayId: { type: DataTypes.UUID, primaryKey: true },
        menuItemId: { type: DataTypes.UUID, primaryKey: true },
      },
      { sequelize, tableName: 'bake_day_menu_items', underscored: true, timestamps: false },
    );
  }
}
