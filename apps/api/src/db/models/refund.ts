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
  /** pending (recorded, not yet confirmed by the payments service), succeeded, or failed (refused for good). */
  declare status: CreationOptional<'pending' | 'succeeded' | 'failed'>;
  declare kind: CreationOptional<'owner' | 'cancel' | 'late'>;
  /** The idempotency key the payments service sees: the order and the refunded total this refund brings it to. */
  declare providerKey: CreationOptional<string | null>;
  declare refundedTotalCents: CreationOptional<number | null>;
  declare lastError: CreationOptional<string | null>;
  declare confirmedAt: CreationOptional<Date | null>;
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
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'succeeded' },
        kind: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'owner' },
        providerKey: { type: DataTypes.TEXT, allowNull: true },
        refundedTotalCents: { type: DataTypes.INTEGER, allowNull: true },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        confirmedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'refunds', underscored: true, updatedAt: false },
    );
  }
}
