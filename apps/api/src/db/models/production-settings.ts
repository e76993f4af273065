import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ProductionSettingsInput } from '@fryline/schemas';

export class ProductionSettings extends Model<InferAttributes<ProductionSettings>, InferCreationAttributes<ProductionSettings>> {
  declare id: CreationOptional<number>;
  declare equipment: ProductionSettingsInput['equipment'];
  declare schedule: ProductionSettingsInput['schedule'];
  declare spare: ProductionSettingsInput['spare'];
  declare glazes: ProductionSettingsInput['glazes'];
  declare prices: ProductionSettingsInput['prices'];
  declare roomTempC: number;
  /** Null until saved: the defaults apply. */
  declare dough: CreationOptional<ProductionSettingsInput['dough'] | null>;
  declare updatedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ProductionSettings.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, defaultValue: 1 },
        equipment: { type: DataTypes.JSONB, allowNull: false },
        schedule: { type: DataTypes.JSONB, allowNull: false },
        spare: { type: DataTypes.JSONB, allowNull: false },
        glazes: { type: DataTypes.JSONB, allowNull: false },
        prices: { type: DataTypes.JSONB, allowNull: false },
        roomTempC: {
          type: DataTypes.DECIMAL(4, 1),
          allowNull: false,
          field: 'room_temp_c',
          get(this: ProductionSettings) {
            return Number(this.getDataValue('roomTempC'));
          },
        },
        dough: { type: DataTypes.JSONB, allowNull: true },
        updatedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'production_settings', underscored: true },
    );
  }
}
