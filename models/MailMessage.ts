import 'server-only';
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export const MAIL_STATUSES = ['pending', 'sending', 'sent', 'failed'] as const;
export type MailStatus = (typeof MAIL_STATUSES)[number];

/** One message in the outbox: written with its event, sent by the worker, kept as a record. */
export class MailMessage extends Model<InferAttributes<MailMessage>, InferCreationAttributes<MailMessage>> {
  declare id: CreationOptional<number>;
  declare dedupeKey: string;
  declare userId: number | null;
  declare toAddress: string;
  declare kind: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string | null;
  declare headers: Record<string, string> | null;
  declare status: CreationOptional<MailStatus>;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: Date;
  declare lockedUntil: CreationOptional<Date | null>;
  declare lastError: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MailMessage.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        dedupeKey: { type: DataTypes.STRING(160), allowNull: false, unique: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        toAddress: { type: DataTypes.STRING(254), allowNull: false },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        subject: { type: DataTypes.STRING(300), allowNull: false },
        textBody: { type: DataTypes.TEXT('medium'), allowNull: false },
        htmlBody: { type: DataTypes.TEXT('medium'), allowNull: true },
        headers: { type: DataTypes.JSON, allowNull: true },
        status: { type: DataTypes.ENUM(...MAIL_STATUSES), allowNull: false, defaultValue: 'pending' },
        attempts: { type: DataTypes.TINYINT.UNSIGNED, allowNull: false, defaultValue: 0 },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: false },
        lockedUntil: { type: DataTypes.DATE, allowNull: true },
        lastError: { type: DataTypes.TEXT, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, modelName: 'MailMessage' /* the bundler minifies class names */, tableName: 'mail_outbox' },
    );
  }
}
