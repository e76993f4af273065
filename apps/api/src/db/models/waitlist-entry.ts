import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class WaitlistEntry extends Model<InferAttributes<WaitlistEntry>, InferCreationAttributes<WaitlistEntry>> {
  declare id: CreationOptional<string>;
  declare bakeDayId: string;
  declare userId: string;
  declare rings: number;
  declare holes: number;
  declare status: CreationOptional<'waiting' | 'offered' | 'claimed' | 'lapsed' | 'left'>;
  declare claimToken: CreationOptional<string | null>;
  declare offerExpiresAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    WaitlistEntry.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        bakeDayId: { type: DataTypes.UUID, allowNull: false },
        userId: { type: DataTypes.UUID, allowNull: false },
        rings: { type: DataTypes.INTEGER, allowNull: false },
        holes: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'waiting' },
        claimToken: { type: DataTypes.TEXT, allowNull: true },
        offerExpiresAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'waitlist_entries', underscored: true },
    );
  }
}
