import {
  DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes,
  type NonAttribute, type Sequelize,
} from 'sequelize';
import type { OrderStatus } from '@fryline/schemas';
import type { OrderBox } from './order-box.js';
import type { PickupWindow } from './pickup-window.js';
import type { BakeDay } from './bake-day.js';
import type { User } from './user.js';

export class Order extends Model<InferAttributes<Order>, InferCreationAttributes<Order>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare bakeDayId: string;
  declare pickupWindowId: string;
  declare status: OrderStatus;
  declare rings: number;
  declare holes: number;
  /** True while the order's pieces are counted against the bake day's capacity. */
  declare holdsCapacity: CreationOptional<boolean>;
  declare subtotalCents: number;
  declare taxCents: number;
  declare totalCents: number;
  /** ISO 4217, lower case: the shop's currency when the order was written (filled in by the database). */
  declare currency: CreationOptional<string>;
  declare refundedCents: CreationOptional<number>;
  declare feeCents: CreationOptional<number>;
  declare pickupCode: CreationOptional<string | null>;
  declare holdExpiresAt: CreationOptional<Date | null>;
  declare checkoutSessionId: CreationOptional<string | null>;
  declare paymentIntentId: CreationOptional<string | null>;
  declare source: CreationOptional<'online' | 'walk-up'>;
  declare paidAt: CreationOptional<Date | null>;
  declare collectedAt: CreationOptional<Date | null>;
  declare collectedBy: CreationOptional<string | null>;
  declare noShowAt: CreationOptional<Date | null>;
  declare noShowBy: CreationOptional<string | null>;
  declare cancelledAt: CreationOptional<Date | null>;
  /** After the owner changed this order's window or place: move or cancel with a full refund until then. */
  declare changeGraceUntil: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare boxes?: NonAttribute<OrderBox[]>;
  declare pickupWindow?: NonAttribute<PickupWindow>;
  declare bakeDay?: NonAttribute<BakeDay>;
  declare user?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Order.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        userId: { type: DataTypes.UUID, allowNull: false },
        bakeDayId: { type: DataTypes.UUID, allowNull: false },
        pickupWindowId: { type: DataTypes.UUID, allowNull: false },
        status: { type: DataTypes.TEXT, allowNull: false },
        rings: { type: DataTypes.INTEGER, allowNull: false },
        holes: { type: DataTypes.INTEGER, allowNull: false },
        holdsCapacity: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        subtotalCents: { type: DataTypes.INTEGER, allowNull: false },
        taxCents: { type: DataTypes.INTEGER, allowNull: false },
        totalCents: { type: DataTypes.INTEGER, allowNull: false },
        // NOT NULL in the database, whose trigger fills it in on insert
        currency: { type: DataTypes.TEXT, allowNull: true },
        refundedCents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        feeCents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        pickupCode: { type: DataTypes.TEXT, allowNull: true },
        holdExpiresAt: { type: DataTypes.DATE, allowNull: true },
        checkoutSessionId: { type: DataTypes.TEXT, allowNull: true },
        paymentIntentId: { type: DataTypes.TEXT, allowNull: true },
        source: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'online' },
        paidAt: { type: DataTypes.DATE, allowNull: true },
        collectedAt: { type: DataTypes.DATE, allowNull: true },
        collectedBy: { type: DataTypes.UUID, allowNull: true },
        noShowAt: { type: DataTypes.DATE, allowNull: true },
        noShowBy: { type: DataTypes.UUID, allowNull: true },
        cancelledAt: { type: DataTypes.DATE, allowNull: true },
        changeGraceUntil: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'orders', underscored: true },
    );
  }
}
