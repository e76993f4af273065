import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class ShopSettings extends Model<InferAttributes<ShopSettings>, InferCreationAttributes<ShopSettings>> {
  declare id: CreationOptional<number>;
  declare shopName: string;
  declare currency: CreationOptional<string>;
  declare taxMode: CreationOptional<'included' | 'added'>;
  declare taxRateBp: CreationOptional<number>;
  /** After a window closes, how long before its unclaimed orders may be marked no-show. */
  declare noShowGraceMinutes: CreationOptional<number>;
  /** How long a hand-over can be undone. */
  declare handOverUndoSeconds: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ShopSettings.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, defaultValue: 1 },
        shopName: { type: DataTypes.TEXT, allowNull: false },
        currency: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'usd' },
        taxMode: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'included' },
        taxRateBp: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'tax_rate_bp' },
        noShowGraceMinutes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 30 },
        handOverUndoSeconds: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 15 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'shop_settings', underscored: true },
    );
  }
}
