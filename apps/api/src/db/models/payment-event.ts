import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Each payment event id is recorded once, in the same transaction as its effect. */
export class PaymentEvent extends Model<InferAttributes<PaymentEvent>, InferCreationAttributes<PaymentEvent>> {
  declare id: string;
  declare type: string;
  declare orderId: string | null;
  declare outcome: CreationOptional<string>;
  declare receivedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PaymentEvent.init(
      {
        id: { type: DataTypes.TEXT, primaryKey: true },
        type: { type: DataTypes.TEXT, allowNull: false },
        orderId: { type: DataTypes.UUID, allowNull: true },
        outcome: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'payment_events', underscored: true, timestamps: false },
    );
  }
}
