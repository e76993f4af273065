import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export interface StoredAttachment {
  filename: string;
  contentType: string;
  /** base64 */
  content: string;
  cid?: string;
}

export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<string>;
  declare messageId: string;
  declare dedupeKey: string | null;
  declare kind: string;
  declare toAddress: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string | null;
  declare attachments: CreationOptional<StoredAttachment[]>;
  /** Extra header lines, e.g. List-Unsubscribe. */
  declare headers: CreationOptional<Record<string, string>>;
  declare status: CreationOptional<'pending' | 'sent' | 'failed'>;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: CreationOptional<Date>;
  declare lastError: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OutboxMessage.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        messageId: { type: DataTypes.TEXT, allowNull: false },
        dedupeKey: { type: DataTypes.TEXT, allowNull: true },
        kind: { type: DataTypes.TEXT, allowNull: false },
        toAddress: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        htmlBody: { type: DataTypes.TEXT, allowNull: true },
        attachments: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        headers: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'pending' },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'outbox', underscored: true, updatedAt: false },
    );
  }
}
