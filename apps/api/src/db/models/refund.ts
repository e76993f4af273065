import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Refund extends Model<InferAttributes<Refund>, InferCreationAttributes<Refund>> {
  declare id: CreationOptional<string>;
  declare orderId: string;
  declare providerRefundId: string | null;
  /** The key a client sent with the request, so a double-click refunds once. */
  declare requestKey: string | null;
  declare amountCents: number;
  declare reason: string;
  declare requestedBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Refund.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        orderId: { type: DataTypes.UUID, allowNull: false },
        providerRefundId: { type: DataTypes.TEXT, allowNull: true },
        requestKey: { type: DataTypes.TEXT, allowNull: true },
        amountCents: { type: DataTypes.INTEGER, allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        requestedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'refunds', underscored: true, updatedAt: false },
    );
  }
}
