import {
  DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes,
  type NonAttribute, type Sequelize,
} from 'sequelize';
import type { BoxSize } from '@fryline/schemas';
import type { OrderLine } from './order-line.js';

export class OrderBox extends Model<InferAttributes<OrderBox>, InferCreationAttributes<OrderBox>> {
  declare id: CreationOptional<string>;
  declare orderId: string;
  declare position: number;
  declare size: BoxSize;
  declare pieces: number;
  declare priceCents: number;
  declare lines?: NonAttribute<OrderLine[]>;

  static initModel(sequelize: Sequelize) {
    OrderBox.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        orderId: { type: DataTypes.UUID, allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        size: { type: DataTypes.TEXT, allowNull: false },
        pieces: { type: DataTypes.INTEGER, allowNull: false },
        priceCents: { type: DataTypes.INTEGER, allowNull: false },
      },
      { sequelize, tableName: 'order_boxes', underscored: true, timestamps: false },
    );
  }
}
