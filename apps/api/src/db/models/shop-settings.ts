import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class ShopSettings extends Model<InferAttributes<ShopSettings>, InferCreationAttributes<ShopSettings>> {
  declare id: CreationOptional<number>;
  declare shopName: string;
  declare currency: CreationOptional<string>;
  declare taxMode: CreationOptional<'included' | 'added'>;
  declare taxRateBp: CreationOptional<number>;
  declare maxPiecesPerCustomer: CreationOptional<number>;
  declare timeZone: CreationOptional<string>;
  /** Minutes an unpaid box is held; null means the server's HOLD_MINUTES. */
  declare holdMinutes: CreationOptional<number | null>;
  declare noShowGraceMinutes: CreationOptional<number>;
  declare refundPolicy: CreationOptional<string>;
  declare updatedBy: CreationOptional<string | null>;
  /** How long a hand-over can be undone. */
  declare handOverUndoSeconds: CreationOptional<number>;
  /** The business's logo, stored as a menu photo is; null for none. */
  declare logoPhotoId: CreationOptional<string | null>;
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
        maxPiecesPerCustomer: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 36 },
        timeZone: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'UTC' },
        holdMinutes: { type: DataTypes.INTEGER, allowNull: true },
        noShowGraceMinutes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 30 },
        refundPolicy: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        updatedBy: { type: DataTypes.UUID, allowNull: true },
        handOverUndoSeconds: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 15 },
        logoPhotoId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'shop_settings', underscored: true },
    );
  }
}
