import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { PieceKind } from '@fryline/schemas';

/** One menu item inside a box; name, price and allergens are copied at order time. */
export class OrderLine extends Model<InferAttributes<OrderLine>, InferCreationAttributes<OrderLine>> {
  declare id: CreationOptional<string>;
  declare orderBoxId: string;
  declare menuItemId: string;
  declare name: string;
  declare kind: PieceKind;
  declare quantity: number;
  declare surchargeCents: number;
  declare allergens: string[];

  static initModel(sequelize: Sequelize) {
    OrderLine.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        orderBoxId: { type: DataTypes.UUID, allowNull: false },
        menuItemId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false },
        quantity: { type: DataTypes.INTEGER, allowNull: false },
        surchargeCents: { type: DataTypes.INTEGER, allowNull: false },
        allergens: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
      },
      { sequelize, tableName: 'order_lines', underscored: true, timestamps: false },
    );
  }
}
