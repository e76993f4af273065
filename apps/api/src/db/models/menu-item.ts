import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { PieceKind } from '@fryline/schemas';

export class MenuItem extends Model<InferAttributes<MenuItem>, InferCreationAttributes<MenuItem>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare flavour: string;
  declare glaze: string;
  declare description: CreationOptional<string>;
  declare kind: PieceKind;
  declare surchargeCents: CreationOptional<number>;
  declare allergens: CreationOptional<string[]>;
  declare photoUrl: CreationOptional<string | null>;
  /** The glaze recipe (production settings) this item takes; null for plain. */
  declare glazeRecipeId: CreationOptional<string | null>;
  declare active: CreationOptional<boolean>;
  /** The item's photo (menu_photos), if it has one. */
  declare photoId: CreationOptional<string | null>;
  /** When it was taken off the menu; it stays for past orders. */
  declare archivedAt: CreationOptional<Date | null>;
  declare sortOrder: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MenuItem.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        name: { type: DataTypes.TEXT, allowNull: false },
        flavour: { type: DataTypes.TEXT, allowNull: false },
        glaze: { type: DataTypes.TEXT, allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        kind: { type: DataTypes.TEXT, allowNull: false },
        surchargeCents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        allergens: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
        photoUrl: { type: DataTypes.TEXT, allowNull: true },
        glazeRecipeId: { type: DataTypes.TEXT, allowNull: true },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        photoId: { type: DataTypes.UUID, allowNull: true },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        sortOrder: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'menu_items', underscored: true },
    );
  }
}
