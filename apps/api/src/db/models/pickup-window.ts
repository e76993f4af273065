import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class PickupWindow extends Model<InferAttributes<PickupWindow>, InferCreationAttributes<PickupWindow>> {
  declare id: CreationOptional<string>;
  declare bakeDayId: string;
  declare startsAt: Date;
  declare endsAt: Date;
  declare maxOrders: number | null;
  declare ordersRemaining: number | null;
  /** Set when the owner took the window off the day while orders were in it. */
  declare removedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PickupWindow.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        bakeDayId: { type: DataTypes.UUID, allowNull: false },
        startsAt: { type: DataTypes.DATE, allowNull: false },
        endsAt: { type: DataTypes.DATE, allowNull: false },
        maxOrders: { type: DataTypes.INTEGER, allowNull: true },
        ordersRemaining: { type: DataTypes.INTEGER, allowNull: true },
        removedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'pickup_windows', underscored: true },
    );
  }
}
