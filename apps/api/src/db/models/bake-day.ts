import {
  DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes,
  type NonAttribute, type Sequelize,
} from 'sequelize';
import type { PickupWindow } from './pickup-window.js';
import type { MenuItem } from './menu-item.js';
import type { BakeDayBox } from './bake-day-box.js';

export class BakeDay extends Model<InferAttributes<BakeDay>, InferCreationAttributes<BakeDay>> {
  declare id: CreationOptional<string>;
  /** Calendar date (YYYY-MM-DD) in the bake day's own time zone. */
  declare date: string;
  declare place: string;
  declare address: CreationOptional<string>;
  declare timeZone: string;
  declare status: CreationOptional<'draft' | 'published' | 'cancelled' | 'done'>;
  declare ordersOpenAt: Date;
  declare cutoffAt: Date;
  declare ringCapacity: number;
  declare holeCapacity: number;
  declare ringsRemaining: number;
  declare holesRemaining: number;
  declare notes: CreationOptional<string>;
  /** The formula version this day's sheet is planned with (set when first planned). */
  declare formulaVersionId: CreationOptional<string | null>;
  /** When subscribers were told its orders are open. */
  declare announcedAt: CreationOptional<Date | null>;
  declare calledOffAt: CreationOptional<Date | null>;
  declare calledOffReason: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare pickupWindows?: NonAttribute<PickupWindow[]>;
  declare menuItems?: NonAttribute<MenuItem[]>;
  declare boxes?: NonAttribute<BakeDayBox[]>;

  static initModel(sequelize: Sequelize) {
    BakeDay.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        place: { type: DataTypes.TEXT, allowNull: false },
        address: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        timeZone: { type: DataTypes.TEXT, allowNull: false },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
        ordersOpenAt: { type: DataTypes.DATE, allowNull: false },
        cutoffAt: { type: DataTypes.DATE, allowNull: false },
        ringCapacity: { type: DataTypes.INTEGER, allowNull: false },
        holeCapacity: { type: DataTypes.INTEGER, allowNull: false },
        ringsRemaining: { type: DataTypes.INTEGER, allowNull: false },
        holesRemaining: { type: DataTypes.INTEGER, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        formulaVersionId: { type: DataTypes.UUID, allowNull: true },
        announcedAt: { type: DataTypes.DATE, allowNull: true },
        calledOffAt: { type: DataTypes.DATE, allowNull: true },
        calledOffReason: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'bake_days', underscored: true },
    );
  }
}
